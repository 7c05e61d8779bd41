import { describe, expect, it } from 'vitest';
import * as guide from './index.ts';

describe('guide module surface', () => {
  it('exports exactly the public names', () => {
    expect(Object.keys(guide).sort()).toEqual(['SECTION_TITLES', 'buildGuide', 'guideHtml', 'guidePages']);
  });
});
