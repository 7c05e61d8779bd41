import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseValue } from './parse.ts';
import type { Quantity } from './quantity.ts';

function valueOf(text: string, q?: Quantity) {
  const r = parseValue(text, q);
  if (!r.ok) throw new Error(`${text}: ${r.problems.map((p) => p.code).join(', ')}`);
  return r.value;
}

function codeOf(text: string, q?: Quantity): string | undefined {
  const r = parseValue(text, q);
  return r.ok ? undefined : r.problems[0]?.code;
}

describe('parseValue: IEC 60062 letter-and-digit code', () => {
  // check-values.md §1b: IEC 60062 clause 4 summaries [S]
  it.each([
    ['R47', 0.47, 'resistance'],
    ['2R2', 2.2, 'resistance'],
    ['470R', 470, 'resistance'],
    ['4K7', 4700, 'resistance'],
    ['47K3', 47300, 'resistance'],
    ['1M0', 1e6, 'resistance'],
    ['4M7', 4.7e6, 'resistance'],
    ['4p7', 4.7e-12, 'capacitance'],
    ['4n7', 4.7e-9, 'capacitance'],
    ['100n', 1e-7, 'capacitance'],
    ['1u0', 1e-6, 'capacitance'],
    ['1µ0', 1e-6, 'capacitance'],
    ['2m2', 2.2e-3, 'capacitance'],
    ['p68', 0.68e-12, 'capacitance'],
  ] as const)('§1b %s = %d (%s)', (text, value, quantity) => {
    expect(valueOf(text)).toEqual({ value, quantity });
    expect(valueOf(text, quantity)).toEqual({ value, quantity });
  });

  // check-values.md §1b: resistance letters L (2016 ed.), G, T [S]
  it.each([
    ['1L5', 1.5e-3],
    ['2G2', 2.2e9],
    ['1T0', 1e12],
    ['4k7', 4700],
  ] as const)('other resistance letters: %s = %d', (text, value) => {
    expect(valueOf(text, 'resistance').value).toBe(value);
  });

  // check-values.md §1b: trailing tolerance letter; 27KK: first K multiplier, second tolerance [S]
  it('reads a trailing tolerance letter', () => {
    expect(valueOf('1R8J')).toEqual({ value: 1.8, quantity: 'resistance', tolerance: { letter: 'J', plusPct: 5, minusPct: 5 } });
    expect(valueOf('27KK')).toEqual({ value: 27000, quantity: 'resistance', tolerance: { letter: 'K', plusPct: 10, minusPct: 10 } });
    // check-values.md §1b: Z = +80/−20 % for capacitors [S]
    expect(valueOf('100nZ').tolerance).toEqual({ letter: 'Z', plusPct: 80, minusPct: 20 });
    expect(valueOf('4K7F').tolerance?.plusPct).toBe(1);
  });

  it('reads F after a capacitance code as the unit, not ±1 %', () => {
    expect(valueOf('100nF')).toEqual({ value: 1e-7, quantity: 'capacitance' });
    expect(valueOf('4n7F', 'capacitance').tolerance).toBeUndefined();
  });

  // check-values.md §1b: "M" = mega for resistance, "m" = milli for capacitance [S]
  it('applies the case rules for M and m', () => {
    expect(valueOf('1M', 'resistance').value).toBe(1e6);
    expect(valueOf('1m', 'capacitance').value).toBe(1e-3);
    expect(codeOf('1m', 'resistance')).toBe('value.ambiguous-letter');
    expect(codeOf('1M', 'capacitance')).toBe('value.ambiguous-letter');
    expect(codeOf('10M', 'inductance')).toBe('value.ambiguous-letter');
    // with the unit written, SI case rules settle it
    expect(valueOf('1mΩ').value).toBe(1e-3);
    expect(valueOf('1 MΩ').value).toBe(1e6);
    expect(codeOf('1MF', 'capacitance')).toBe('value.ambiguous-letter'); // old marks: MF = µF
  });
});

describe('parseValue: SI and SPICE forms', () => {
  it.each([
    ['4.7k', 4700, 'resistance'],
    ['4.7 kΩ', 4700, 'resistance'],
    ['4.7 k\u2126', 4700, 'resistance'], // ohm sign U+2126
    ['4.7 k\u03A9', 4700, 'resistance'], // Greek capital omega U+03A9
    ['4.7kohm', 4700, 'resistance'],
    ['10 Ohms', 10, 'resistance'],
    ['100nF', 1e-7, 'capacitance'],
    ['10uF', 1e-5, 'capacitance'],
    ['10 µF', 1e-5, 'capacitance'], // micro sign U+00B5
    ['10 \u03BCF', 1e-5, 'capacitance'], // Greek small mu U+03BC
    ['10uf', 1e-5, 'capacitance'],
    ['2.2M', 2.2e6, 'resistance'],
    ['1meg', 1e6, 'resistance'],
    ['2.2MEG', 2.2e6, 'resistance'],
    ['10u', 1e-5, 'capacitance'],
    ['100n', 1e-7, 'capacitance'],
    ['10MOhm', 1e7, 'resistance'], // a value, not SPICE: MΩ here (compare spice.spec.ts)
    ['4u7H', 4.7e-6, 'inductance'],
    ['10mH', 1e-2, 'inductance'],
    ['3V3', 3.3, 'voltage'],
    ['-12V', -12, 'voltage'],
    ['1.5 kV', 1500, 'voltage'],
  ] as const)('%s = %d (%s)', (text, value, quantity) => {
    expect(valueOf(text)).toEqual({ value, quantity });
  });

  it('leaves a bare number without a quantity unless hinted', () => {
    expect(valueOf('0.47')).toEqual({ value: 0.47 });
    expect(valueOf('1e3')).toEqual({ value: 1000 });
    expect(valueOf('.5')).toEqual({ value: 0.5 });
    expect(valueOf('220', 'resistance')).toEqual({ value: 220, quantity: 'resistance' });
  });

  it('warns when a capacitance has no multiplier', () => {
    const r = parseValue('0.47', 'capacitance');
    expect(r.ok && r.value.value).toBe(0.47);
    expect(r.warnings.map((w) => w.code)).toEqual(['value.no-unit']);
    expect(parseValue('0.47u', 'capacitance').warnings).toEqual([]);
  });
});

describe('parseValue: refusals', () => {
  it.each([
    ['', undefined, 'value.empty'],
    ['   ', undefined, 'value.empty'],
    ['4,7k', undefined, 'value.syntax'],
    ['k', undefined, 'value.syntax'],
    ['4k7x', undefined, 'value.syntax'],
    ['4.7k7', undefined, 'value.syntax'],
    ['4.7kJ', undefined, 'value.syntax'], // tolerance letters belong to the letter code only
    ['1 0k', undefined, 'value.syntax'],
    ['4k7', 'capacitance', 'value.quantity-mismatch'],
    ['100nF', 'resistance', 'value.quantity-mismatch'],
    ['10 kΩ', 'capacitance', 'value.quantity-mismatch'],
    ['3V3', 'resistance', 'value.quantity-mismatch'],
    ['-4k7', undefined, 'value.out-of-range'],
    ['0', 'capacitance', 'value.out-of-range'],
    ['1e99999', undefined, 'value.syntax'], // exponents beyond 4 digits are not read
    ['1e9999', undefined, 'value.out-of-range'],
    ['1e400', undefined, 'value.out-of-range'],
  ] as const)('%j (%s) → %s', (text, q, code) => {
    expect(codeOf(text, q)).toBe(code);
  });

  it('names the text as written and gives a hint', () => {
    const r = parseValue('4k7', 'capacitance');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems[0]?.message).toContain('"4k7"');
      expect(r.problems[0]?.hint).toBeTruthy();
      expect(r.problems[0]?.severity).toBe('error');
    }
  });

  it('allows zero for a resistance (a 0R link)', () => {
    expect(valueOf('0R')).toEqual({ value: 0, quantity: 'resistance' });
  });
});

describe('parseValue: properties', () => {
  it('never throws on arbitrary text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 24 }), fc.constantFrom(undefined, 'resistance', 'capacitance', 'inductance', 'voltage' as const), (s, q) => {
        const r = parseValue(s, q);
        expect(typeof r.ok).toBe('boolean');
        if (r.ok) expect(Number.isFinite(r.value.value)).toBe(true);
      }),
      { numRuns: 10_000 },
    );
  });

  it('never throws on value-like text', () => {
    const alphabet = fc.constantFrom(...'0123456789.,+-eERrKkMmGgTLpPnNuUµμFfHhVvJZΩΩ ohmeg'.split(''));
    fc.assert(
      fc.property(fc.string({ unit: alphabet, maxLength: 10 }), (s) => {
        const r = parseValue(s);
        if (r.ok) expect(Number.isFinite(r.value.value)).toBe(true);
        else expect(r.problems.length).toBeGreaterThan(0);
      }),
      { numRuns: 10_000 },
    );
  });
});
