import { describe, expect, it } from 'vitest';
import * as render from './index.ts';

describe('render module surface', () => {
  it('exports exactly the public names', () => {
    expect(Object.keys(render).sort()).toEqual(['THEME', 'drawScene', 'drawSvg', 'escapeXml', 'insulatedLinks', 'insulatedNotes', 'lineHoles', 'paintScene', 'sceneSvgMarkup', 'svgMarkup']);
  });
});
