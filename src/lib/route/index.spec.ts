import { describe, expect, it } from 'vitest';
import * as route from './index.ts';

describe('route module surface', () => {
  it('exports exactly its public names', () => {
    expect(Object.keys(route).sort()).toEqual(['routeLayout', 'segmentLengthMm']);
  });
});
