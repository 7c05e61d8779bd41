import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { colourBands } from './bands.ts';
import { BAND_COLOURS } from './colours.ts';
import { decodeBands, type BandDecoding, type BandReading } from './decode-bands.ts';
import { E_SERIES } from './series.ts';

function reading(colours: string[], direction: 'either' | 'as-given' = 'either'): BandDecoding {
  const r = decodeBands(colours, { direction });
  if (!r.ok) throw new Error(r.problems.map((p) => p.code).join());
  return r.value;
}

function single(d: BandDecoding): BandReading {
  if (d.kind !== 'value') throw new Error('ambiguous');
  return d.reading;
}

// check-values.md §1a worked examples [D from the IEC 60062 colour table, S].
const FOUR_BAND: [string, number][] = [
  ['brown black gold gold', 1.0],
  ['red red gold gold', 2.2],
  ['yellow violet silver gold', 0.47],
  ['brown black black gold', 10],
  ['red red brown gold', 220],
  ['yellow violet red gold', 4700],
  ['brown black yellow gold', 100e3],
  ['brown black green gold', 1e6],
  ['brown black blue gold', 10e6],
];
const FIVE_BAND: [string, number][] = [
  ['brown black black silver brown', 1.0],
  ['brown black black gold brown', 10.0],
  ['brown black black brown brown', 1000],
  ['yellow violet black brown brown', 4700],
  ['brown red brown red brown', 12.1e3],
  ['yellow white white red brown', 49.9e3],
  ['brown black black orange brown', 100e3],
];

describe('colour code table', () => {
  // check-values.md §1a: digits 0–9 black…white, multipliers ×1…×1G, gold ×0.1, silver ×0.01 [S]
  it('has the IEC digits and multipliers', () => {
    const names = ['black', 'brown', 'red', 'orange', 'yellow', 'green', 'blue', 'violet', 'grey', 'white'];
    names.forEach((name, i) => {
      const c = BAND_COLOURS.find((b) => b.name === name);
      expect(c?.digit).toBe(i);
      expect(c?.multiplierExp).toBe(i);
    });
    expect(BAND_COLOURS.find((b) => b.name === 'gold')?.multiplierExp).toBe(-1);
    expect(BAND_COLOURS.find((b) => b.name === 'silver')?.multiplierExp).toBe(-2);
  });

  // check-values.md §1a: undisputed tolerances only; §13.1 lists the disputed ones
  it.each([
    ['brown', 1, 'F'],
    ['red', 2, 'G'],
    ['green', 0.5, 'D'],
    ['blue', 0.25, 'C'],
    ['violet', 0.1, 'B'],
    ['gold', 5, 'J'],
    ['silver', 10, 'K'],
  ] as const)('%s tolerance is ±%d %% (%s)', (name, pct, letter) => {
    expect(BAND_COLOURS.find((b) => b.name === name)?.tolerance).toEqual({ pct, letter });
  });

  it('keeps orange, yellow and grey tolerances as disputed data, not a single answer', () => {
    for (const name of ['orange', 'yellow', 'grey']) {
      const c = BAND_COLOURS.find((b) => b.name === name);
      expect(c?.tolerance).toBeUndefined();
      expect(c?.disputed?.length).toBeGreaterThan(0);
    }
  });
});

describe('decodeBands: §1a worked examples', () => {
  it.each([...FOUR_BAND, ...FIVE_BAND])('%s (as given) = %d Ω', (bands, ohms) => {
    const r = single(reading(bands.split(' '), 'as-given'));
    expect(r.ohms).toBe(ohms);
    expect(r.tolerance?.pct).toBe(bands.split(' ').length === 4 ? 5 : 1);
  });

  // gold or silver never comes first, so 4-band parts read one way only [S]
  it.each(FOUR_BAND)('%s reads one way from either end', (bands, ohms) => {
    expect(single(reading(bands.split(' '))).ohms).toBe(ohms);
    expect(single(reading(bands.split(' ').reverse())).ohms).toBe(ohms);
  });

  it('reads the 3-band part as ±20 %', () => {
    // check-values.md §1a: orange orange brown = 330 Ω ±20 %; reversed (13 kΩ) is not E6
    const r = single(reading(['orange', 'orange', 'brown']));
    expect(r).toMatchObject({ ohms: 330, tolerance: { pct: 20, letter: 'M' }, reversed: false });
  });

  it('settles 5-band direction where one end is implausible', () => {
    // reversed: tolerance band would be yellow (disputed)
    expect(single(reading('yellow violet black brown brown'.split(' '))).ohms).toBe(4700);
    expect(single(reading('brown brown black violet yellow'.split(' '))).ohms).toBe(4700);
    expect(single(reading('yellow white white red brown'.split(' '))).ohms).toBe(49.9e3);
    // reversed: second band would be silver or gold
    expect(single(reading('brown black black silver brown'.split(' '))).ohms).toBe(1);
    // symmetric code: both ends say 12.1 kΩ
    expect(single(reading('brown red brown red brown'.split(' '))).ohms).toBe(12.1e3);
  });

  // check-values.md §1a direction trap [D]: reversed reads 110 Ω ±1 %, also E96
  it('calls brown-black-black-brown-brown ambiguous', () => {
    const d = reading('brown black black brown brown'.split(' '));
    expect(d.kind).toBe('ambiguous');
    if (d.kind === 'ambiguous') expect(d.readings.map((r) => r.ohms)).toEqual([1000, 110]);
  });

  // [D] same trap: reversed is brown-orange-black-black-brown = 130 Ω ±1 %, and 130 is E96
  it('calls brown-black-black-orange-brown ambiguous too (100 kΩ or 130 Ω)', () => {
    const d = reading('brown black black orange brown'.split(' '));
    expect(d.kind).toBe('ambiguous');
    if (d.kind === 'ambiguous') expect(d.readings.map((r) => r.ohms)).toEqual([100e3, 130]);
  });

  it('returns the tempco band of a 6-band part and disputed tolerances as data', () => {
    const r = single(reading('brown black black brown grey brown'.split(' '), 'as-given'));
    expect(r.ohms).toBe(1000);
    expect(r.tolerance).toBeUndefined();
    expect(r.disputedTolerance?.map((t) => t.pct)).toEqual([0.05, 0.01]);
    expect(r.tempco).toBe('brown');
  });

  it('reads names in any case and the usual spellings', () => {
    expect(single(reading(['Yellow', 'PURPLE', 'Red', 'gold'])).ohms).toBe(4700);
    expect(single(reading(['gray', 'red', 'black', 'gold'])).ohms).toBe(82);
  });

  it.each([
    [['red', 'red'], 'value.bands-count'],
    [['red', 'red', 'red', 'red', 'red', 'red', 'red'], 'value.bands-count'],
    [['red', 'mauve', 'red', 'gold'], 'value.bands-colour'],
    [['gold', 'gold', 'gold', 'gold'], 'value.bands-invalid'],
    [['black', 'red', 'red', 'gold'], 'value.bands-invalid'], // no leading-zero digit either way
  ])('%j → %s', (bands, code) => {
    const r = decodeBands(bands);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]?.code).toBe(code);
  });

  it('never throws on arbitrary input', () => {
    const names = [...BAND_COLOURS.map((c) => c.name), 'gray', 'purple', 'nope', ''];
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom(...names), fc.string()), { maxLength: 8 }), (bands) => {
        const r = decodeBands(bands);
        if (r.ok) {
          const readings = r.value.kind === 'value' ? [r.value.reading] : r.value.readings;
          for (const x of readings) expect(Number.isFinite(x.ohms)).toBe(true);
        }
      }),
      { numRuns: 10_000 },
    );
  });
});

describe('colourBands', () => {
  it.each(FOUR_BAND)('4 bands: %s = %d Ω', (bands, ohms) => {
    const r = colourBands(ohms, 4);
    expect(r.ok && r.value).toEqual(bands.split(' '));
  });

  it.each(FIVE_BAND)('5 bands: %s = %d Ω', (bands, ohms) => {
    const r = colourBands(ohms, 5);
    expect(r.ok && r.value).toEqual(bands.split(' '));
  });

  it.each([
    [4712, 4, 'value.bands-precision'],
    [4750, 4, 'value.bands-precision'],
    [0.047, 4, 'value.bands-range'], // below silver ×0.01
    [0.47, 5, 'value.bands-range'],
    [1e12, 4, 'value.bands-range'], // above white ×1G
    [-1, 4, 'value.out-of-range'],
    [Number.NaN, 5, 'value.out-of-range'],
  ] as const)('%d Ω with %d bands → %s', (ohms, count, code) => {
    const r = colourBands(ohms, count);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]?.code).toBe(code);
  });

  it('suggests a value that fits', () => {
    const r = colourBands(4712, 4);
    expect(!r.ok && r.problems[0]?.hint).toContain('4k7');
  });

  it('marks a zero-ohm link with one black band', () => {
    expect(colourBands(0, 4)).toMatchObject({ ok: true, value: ['black'] });
  });
});

describe('colourBands → decodeBands round trip', () => {
  // E24 in every decade 4 bands reach: 1.0 Ω (10 × 0.1) … 91 GΩ (91 × 1G)
  it('gives E24 values back from 4 bands, from either end', () => {
    fc.assert(
      fc.property(fc.constantFrom(...E_SERIES.E24), fc.integer({ min: -1, max: 9 }), (s, e) => {
        const ohms = Number(`${s}e${e}`);
        const bands = colourBands(ohms, 4);
        expect(bands.ok).toBe(true);
        if (!bands.ok) return;
        expect(single(reading(bands.value)).ohms).toBe(ohms);
        expect(single(reading([...bands.value].reverse())).ohms).toBe(ohms);
      }),
      { numRuns: 500 },
    );
  });

  // E96 from 1.00 Ω (100 × 0.01) to 976 GΩ (976 × 1G)
  it('gives E96 values back from 5 bands (one of the readings when ambiguous)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...E_SERIES.E96), fc.integer({ min: -2, max: 9 }), (s, e) => {
        const ohms = Number(`${s}e${e}`);
        const bands = colourBands(ohms, 5);
        expect(bands.ok).toBe(true);
        if (!bands.ok) return;
        expect(single(reading(bands.value, 'as-given'))).toMatchObject({ ohms, tolerance: { pct: 1 } });
        const either = reading(bands.value);
        const found = either.kind === 'value' ? [either.reading.ohms] : either.readings.map((r) => r.ohms);
        expect(found).toContain(ohms);
      }),
      { numRuns: 1000 },
    );
  });
});
