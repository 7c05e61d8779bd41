import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitPose, getFootprint, posePins, poseBody, rotate, type Offset } from './index.ts';

const PITCH_MM = 2.54; // check-values.md §3 and §8: 0.1 in hole pitch

function pinMap(name: string, pins?: string[], rotation = 0, span?: number): Record<string, Offset> {
  const fp = getFootprint(name, pins)!;
  const pose = span === undefined ? { anchor: [10, 10] as Offset, rotation } : { anchor: [10, 10] as Offset, rotation, span };
  return Object.fromEntries(posePins(fp, pose).map((p) => [p.pin, p.at]));
}

describe('DIP footprints (JEDEC MS-001 300-mil, check-values.md §3)', () => {
  it('keeps 2.54 mm lead pitch and 7.62 mm row spacing', () => {
    for (const n of [8, 14, 16, 18]) {
      const at = pinMap(`dip-${n}`);
      // lead pitch e = 2.54 mm BSC: Microchip C04-018, onsemi 646AA [C]
      for (let k = 1; k < n / 2; k++) expect((at[String(k + 1)]![1] - at[String(k)]![1]) * PITCH_MM).toBeCloseTo(2.54, 6);
      // row spacing 7.62 mm (0.300 in BSC): Freescale case 738, onsemi 646AA [C]
      expect((at[String(n)]![0] - at['1']![0]) * PITCH_MM).toBeCloseTo(7.62, 6);
      // span of one row = (N/2 − 1) · p, e.g. 7.62 mm for DIP-8, 15.24 for DIP-14 [D]
      expect((at[String(n / 2)]![1] - at['1']![1]) * PITCH_MM).toBeCloseTo((n / 2 - 1) * 2.54, 6);
    }
  });

  it('numbers counter-clockwise seen from the top, pin 1 top-left and marked', () => {
    // check-values.md §3: pin 1 top-left with the notch up; down the left side, back up the right [S]
    const fp = getFootprint('dip-8')!;
    expect(fp.marks.pin1).toBe('1');
    const at = pinMap('dip-8');
    expect(at['1']).toEqual([10, 10]);
    expect(at['4']).toEqual([10, 13]);
    expect(at['5']).toEqual([13, 13]); // pin 5 faces pin 4
    expect(at['8']).toEqual([13, 10]); // pin N faces pin 1
    // DIP-14: 14 faces 1 and 8 faces 7 [D]
    const d14 = pinMap('dip-14');
    expect(d14['14']![1]).toBe(d14['1']![1]);
    expect(d14['8']![1]).toBe(d14['7']![1]);
    // Walking 1→N visits the pins counter-clockwise: signed area (y down) is negative for CCW on screen.
    const ring = Array.from({ length: 14 }, (_, i) => d14[String(i + 1)]!);
    let area = 0;
    for (let i = 0; i < ring.length; i++) {
      const a = ring[i]!;
      const b = ring[(i + 1) % ring.length]!;
      area += a[0] * b[1] - b[0] * a[1];
    }
    expect(area).toBeLessThan(0);
  });

  it('rejects a mirrored DIP (that would be the part upside down)', () => {
    const at = pinMap('dip-8');
    const mirrored = Object.fromEntries(Object.entries(at).map(([k, v]) => [k, [30 - v[0], v[1]] as Offset]));
    expect(fitPose(getFootprint('dip-8')!, mirrored)).toBeUndefined();
  });
});

describe('TO-92 footprints (check-values.md §4)', () => {
  it('keeps the stated lead order on adjacent holes', () => {
    const at = pinMap('to92-CBE');
    expect(at['C']).toEqual([10, 10]);
    expect(at['B']).toEqual([11, 10]);
    expect(at['E']).toEqual([12, 10]);
    const fp = getFootprint('to92-CBE')!;
    expect(fitPose(fp, { C: [4, 2], B: [4, 3], E: [4, 4] })).toBeDefined(); // across three strips
    expect(fitPose(fp, { B: [4, 2], C: [4, 3], E: [4, 4] })).toBeUndefined(); // order broken
    expect(fitPose(fp, { C: [4, 2], B: [4, 3], E: [4, 5] })).toBeUndefined(); // not adjacent
  });
  it('refuses a lead order that repeats a letter', () => {
    expect(getFootprint('to92-EEB')).toBeUndefined();
  });
});

describe('two-lead footprints (check-values.md §5)', () => {
  it('a 1/4 W resistor prefers 10.16 mm = 4 holes and accepts 7.62 mm', () => {
    // maker lead-form table 10 mm → 10.16 mm (4 holes) [C]/[P]; 7.62 possible [P]
    const fp = getFootprint('axial-small', ['1', '2'])!;
    expect(fp.span!.preferred * PITCH_MM).toBeCloseTo(10.16, 6);
    expect(fitPose(fp, { '1': [0, 0], '2': [0, 3] })).toMatchObject({ span: 3 });
    expect(fitPose(fp, { '1': [0, 0], '2': [0, 3] }, { min: 4, max: 6 })).toBeUndefined();
    expect(fitPose(fp, { '1': [0, 0], '2': [1, 3] })).toBeUndefined(); // not straight
  });
  it('an electrolytic marks its + lead and has fixed spacing', () => {
    const fp = getFootprint('ecap-5.08', ['+', '-'])!;
    expect(fp.marks.plus).toBe('+');
    expect(fp.spacingMm).toBeCloseTo(5.08, 6); // 10 mm can → 5.0 mm leads → 5.08 on the grid [C]/[P]
    expect(fitPose(fp, { '+': [0, 0], '-': [3, 0] })).toBeUndefined();
  });
  it('needs two distinct pin names', () => {
    expect(getFootprint('axial-small')).toBeUndefined();
    expect(getFootprint('axial-small', ['1', '1'])).toBeUndefined();
  });
});

describe('poses', () => {
  it('four quarter turns bring an offset back', () => {
    fc.assert(
      fc.property(fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 }), (x, y) => {
        expect(rotate(rotate([x, y], 1), 3)).toEqual([x, y]);
        expect(rotate([x, y], 4)).toEqual([x, y]);
      }),
    );
  });

  it('fitPose recovers any pose of any footprint (property)', () => {
    const names = ['dip-8', 'dip-14', 'to92-EBC', 'to220-GDS', 'pads-4', 'header-2x3', 'trimmer-inline', 'trimmer-triangle', 'axial-small', 'do35', 'radial-5.08', 'ecap-2.54'];
    fc.assert(
      fc.property(fc.constantFrom(...names), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 8 }), fc.integer({ min: 0, max: 8 }), (name, rotation, ax, ay) => {
        const fp = getFootprint(name, ['A', 'K'])!;
        const span = fp.span ? fp.span.min + ((ax + ay) % (fp.span.max - fp.span.min + 1)) : undefined;
        const pose = span === undefined ? { anchor: [ax + 12, ay + 12] as Offset, rotation } : { anchor: [ax + 12, ay + 12] as Offset, rotation, span };
        const pins = Object.fromEntries(posePins(fp, pose).map((p) => [p.pin, p.at]));
        const back = fitPose(fp, pins)!;
        expect(back).toBeDefined();
        expect(Object.fromEntries(posePins(fp, back).map((p) => [p.pin, p.at]))).toEqual(pins);
        // every lead hole is covered by the body
        const body = new Set(poseBody(fp, back).map((c) => c.join(',')));
        for (const at of Object.values(pins)) expect(body.has(at.join(','))).toBe(true);
      }),
      { numRuns: 500 },
    );
  });
});
