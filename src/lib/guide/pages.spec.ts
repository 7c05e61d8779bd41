import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { contentBox, linesPerPage, paginate, type Line } from './pages.ts';

describe('pages', () => {
  it('knows the text area of A4 and Letter', () => {
    // ISO 216 A4 210 × 297 mm; US Letter 8.5 × 11 in = 215.9 × 279.4 mm (ANSI/ASME Y14.1
    // size A, from memory); less our 12 mm margins
    expect(contentBox('a4')).toEqual({ width: 186, height: 273 });
    expect(contentBox('letter')).toEqual({ width: 191.9, height: 255.4 });
    expect(contentBox('a4', true)).toEqual({ width: 273, height: 186 });
    expect(linesPerPage('a4')).toBe(42);
    expect(linesPerPage('letter')).toBe(39);
  });

  it('keeps a heading with the line after it', () => {
    const l = (units: number, sticky = false): Line => ({ units, html: '', sticky });
    const pages = paginate([l(3), l(1, true), l(1)], 4);
    expect(pages.map((p) => p.map((x) => x.units))).toEqual([[3], [1, 1]]);
  });

  it('fills pages without exceeding them and loses no line (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.record({ units: fc.integer({ min: 1, max: 5 }), sticky: fc.boolean() }), { maxLength: 80 }), fc.integer({ min: 5, max: 40 }), (spec, per) => {
        const lines: Line[] = spec.map((s, i) => ({ units: s.units, sticky: s.sticky, html: String(i) }));
        const pages = paginate(lines, per);
        expect(pages.flat().map((x) => x.html)).toEqual(lines.map((x) => x.html));
        for (const p of pages) expect(p.reduce((s, x) => s + x.units, 0)).toBeLessThanOrEqual(per);
        expect(pages.length).toBeGreaterThanOrEqual(1);
      }),
    );
  });
});
