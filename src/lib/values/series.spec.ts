import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { offSeriesWarning } from './off-series.ts';
import { E_SERIES, isPreferred, nearestPreferred, SERIES_NAMES } from './series.ts';

// check-values.md §2: IEC 60063 tables [S], as written there (×10 for E6/E12).
const E6_TABLE = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8];
const E12_TABLE = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

describe('E series data', () => {
  it('derives E12 and E6 from E24 as the §2 tables give them', () => {
    expect(E_SERIES.E12.map((s) => s / 10)).toEqual(E12_TABLE);
    expect(E_SERIES.E6.map((s) => s / 10)).toEqual(E6_TABLE);
  });

  it('has the right counts, strictly ascending within one decade', () => {
    const sizes = { E6: 6, E12: 12, E24: 24, E96: 96 };
    for (const name of SERIES_NAMES) {
      const s = E_SERIES[name];
      expect(s.length).toBe(sizes[name]);
      for (let i = 1; i < s.length; i += 1) expect(s[i]).toBeGreaterThan(s[i - 1] ?? Infinity);
      const places = name === 'E96' ? 100 : 10;
      expect(s[0]).toBe(places);
      expect(s[s.length - 1]).toBeLessThan(10 * places);
    }
  });

  // check-values.md §2 [D]: E96[i] = round(100·10^(i/96)) for all 96 entries
  it('E96 follows the formula', () => {
    E_SERIES.E96.forEach((s, i) => expect(s).toBe(Math.round(100 * 10 ** (i / 96))));
  });

  // check-values.md §2 [D]: E24 differs from round(10·10^(i/24)) at 2.7 3.0 3.3 3.6 3.9 4.3 4.7 8.2
  it('E24 departs from the formula exactly where §2 says', () => {
    const differ = E_SERIES.E24.filter((s, i) => s !== Math.round(10 * 10 ** (i / 24)));
    expect(differ).toEqual([27, 30, 33, 36, 39, 43, 47, 82]);
    const formula = E_SERIES.E24.map((_, i) => Math.round(10 * 10 ** (i / 24))).filter((f) => !E_SERIES.E24.includes(f));
    expect(formula).toEqual([26, 29, 32, 35, 38, 42, 46, 83]);
  });

  // check-values.md §2 [D]: E24 ∩ E96 (×10) = {100, 110, 130, 150, 200, 750}
  it('E24 and E96 share six values', () => {
    const shared = E_SERIES.E24.map((s) => s * 10).filter((s) => E_SERIES.E96.includes(s));
    expect(shared).toEqual([100, 110, 130, 150, 200, 750]);
  });
});

describe('nearestPreferred and isPreferred', () => {
  it.each([
    [4800, 'E24', 4700],
    [4800, 'E96', 4750], // check-values.md §2 [D]: 4.7 k is not E96, nearest 4.75 k
    [9.6, 'E24', 10], // across the decade edge
    [0.96, 'E12', 1],
    [1.04e-9, 'E6', 1e-9],
    [4.8e-12, 'E12', 4.7e-12],
    [1.3e5, 'E6', 1.5e5], // log midpoint of 1.0 and 1.5 is 1.2247
    [1.2e5, 'E6', 1e5],
    [3.3e7, 'E6', 3.3e7],
  ] as const)('%d in %s → %d', (v, s, want) => {
    expect(nearestPreferred(v, s)).toBe(want);
  });

  it('refuses values that are not finite and positive', () => {
    for (const v of [0, -1, Number.NaN, Infinity]) expect(nearestPreferred(v, 'E24')).toBeUndefined();
  });

  it('knows members', () => {
    expect(isPreferred(4700, 'E24')).toBe(true);
    expect(isPreferred(4700, 'E96')).toBe(false);
    expect(isPreferred(4750, 'E96')).toBe(true);
    expect(isPreferred(2.7e-9, 'E12')).toBe(true);
    expect(isPreferred(2.4e-9, 'E12')).toBe(false);
  });

  it('returns a member no further than half a step away (log scale)', () => {
    fc.assert(
      fc.property(fc.double({ min: -13, max: 10, noNaN: true }), fc.constantFrom(...SERIES_NAMES), (x, name) => {
        const v = 10 ** x;
        const n = nearestPreferred(v, name);
        expect(n).toBeDefined();
        expect(isPreferred(n ?? NaN, name)).toBe(true);
        // no further than half the widest gap between neighbours of the series, decade edge
        // included (E24 13 → 15 is 1.49 nominal steps of 1/24 decade, so half of it is 0.75 step)
        const sig = E_SERIES[name];
        const widest = Math.max(...sig.map((a, i) => Math.log10((sig[i + 1] ?? sig[0]! * 10) / a)));
        expect(Math.abs(Math.log10((n ?? NaN) / v))).toBeLessThanOrEqual(widest / 2 + 1e-12);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('offSeriesWarning', () => {
  it('notes a resistor in neither E24 nor E96, naming both nearest values', () => {
    const w = offSeriesWarning(4800, 'resistance');
    expect(w?.code).toBe('value.off-series');
    expect(w?.severity).toBe('note');
    expect(w?.message).toContain('4k8');
    expect(w?.message).toContain('E24 4k7');
    expect(w?.message).toContain('E96 4k75');
    expect(w?.data?.['nearest']).toEqual({ E24: 4700, E96: 4750 });
  });

  it('is silent for stock values, links and voltages', () => {
    expect(offSeriesWarning(4750, 'resistance')).toBeUndefined(); // E96
    expect(offSeriesWarning(4700, 'resistance')).toBeUndefined(); // E24
    expect(offSeriesWarning(0, 'resistance')).toBeUndefined();
    expect(offSeriesWarning(3.3, 'voltage')).toBeUndefined();
    expect(offSeriesWarning(1e-7, 'capacitance')).toBeUndefined();
  });

  it('notes an odd capacitor against E24', () => {
    expect(offSeriesWarning(4.4e-9, 'capacitance')?.data?.['nearest']).toEqual({ E24: 4.3e-9 });
  });
});
