import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { capacitorCode, parseCapacitorCode } from './cap-code.ts';
import { E_SERIES } from './series.ts';

// check-values.md §1c: three-digit capacitor code, every row of the table [S]
const ROWS: [string, number][] = [
  ['47', 47e-12],
  ['220', 22e-12],
  ['101', 100e-12],
  ['221', 220e-12],
  ['102', 1e-9],
  ['222', 2.2e-9],
  ['479', 4.7e-12],
  ['103', 10e-9],
  ['473', 47e-9],
  ['104', 100e-9],
  ['224', 220e-9],
  ['474', 470e-9],
  ['105', 1e-6],
  ['339', 3.3e-12],
];

describe('parseCapacitorCode', () => {
  it.each(ROWS)('§1c %s = %d F', (mark, farads) => {
    expect(parseCapacitorCode(mark)).toMatchObject({ ok: true, value: { farads } });
  });

  // check-values.md §1c: 473J = 47 nF ±5 % (tolerance letter as in §1b) [S]
  it('reads a tolerance letter', () => {
    expect(parseCapacitorCode('473J')).toMatchObject({ ok: true, value: { farads: 47e-9, tolerance: { letter: 'J', plusPct: 5 } } });
    expect(parseCapacitorCode('104 Z')).toMatchObject({ ok: true, value: { tolerance: { plusPct: 80, minusPct: 20 } } });
  });

  it.each(['', '4', '1042', '10x', '104Q', 'abc', '4n7'])('refuses %j', (mark) => {
    expect(parseCapacitorCode(mark).ok).toBe(false);
  });

  it('never throws', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 8 }), (s) => {
        expect(typeof parseCapacitorCode(s).ok).toBe('boolean');
      }),
      { numRuns: 10_000 },
    );
  });
});

describe('capacitorCode', () => {
  // Our rule (cap-code.ts): always three digits. Every §1c row but the bare "47" is written
  // as listed; 47 pF is written "470", which reads back as 47 pF like the bare mark.
  it.each(ROWS)('%s row: writes the three-digit form', (mark, farads) => {
    const want = mark.length === 2 ? `${mark}0` : mark;
    expect(capacitorCode(farads)).toBe(want);
  });

  it('has no code for values that need three digits or lie out of range', () => {
    expect(capacitorCode(4.75e-9)).toBeUndefined();
    expect(capacitorCode(0.047e-12)).toBeUndefined();
    expect(capacitorCode(1e-2)).toBeUndefined();
    expect(capacitorCode(0)).toBeUndefined();
    expect(capacitorCode(Number.NaN)).toBeUndefined();
  });

  it('round-trips every E24 value from 0.1 pF to 910 µF', () => {
    fc.assert(
      fc.property(fc.constantFrom(...E_SERIES.E24), fc.integer({ min: -14, max: -5 }), (s, e) => {
        const farads = Number(`${s}e${e}`);
        const code = capacitorCode(farads);
        expect(code).toMatch(/^\d{3}$/);
        expect(parseCapacitorCode(code ?? '')).toMatchObject({ ok: true, value: { farads } });
      }),
      { numRuns: 500 },
    );
  });
});
