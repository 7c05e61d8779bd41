/**
 * `parseValue(text, quantity?) → Result<ParsedValue>`
 *
 * Reads a part value in any of the usual forms: IEC 60062 letter-and-digit code ("4k7",
 * "R47", "47K3", "4n7", "p68", "2m2", with an optional tolerance letter: "1R8J", "27KK"),
 * plain SI ("4.7k", "4.7 kΩ", "100nF", "10 µF", "2.2M", "0.47", "1e3") and the SPICE mega
 * "1meg". Both µ code points and both Ω code points are read. The `quantity` hint decides
 * which letters are allowed; without it the quantity comes from a written unit (Ω/ohm, F,
 * H, V), else from the letter (L R K M G T → resistance; p n u µ m F → capacitance; H →
 * inductance; V → voltage), else stays undefined (a bare number). Case rules: M is mega
 * and m is milli, so "1m" for a resistance (without Ω) and "1M" for a capacitance are
 * refused as ambiguous rather than guessed. A bare number for a capacitance or inductance
 * reads in farads/henries and warns (`value.no-unit`). Negative values are for voltage
 * only; zero is allowed for resistance (a 0R link) and voltage. The value is built from
 * the decimal text, so "4k7" is exactly 4700 and "100n" exactly 1e-7. Never throws.
 * Problem codes: value.empty, value.syntax, value.ambiguous-letter, value.quantity-mismatch,
 * value.out-of-range; warning value.no-unit.
 */
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { fromDecimal } from './decimal.ts';
import { impliedQuantity, letterExponent, unitLetterQuantity } from './letters.ts';
import { valueProblem, quoted } from './problem.ts';
import type { Quantity } from './quantity.ts';
import { normalize, scanValue, type Scan } from './scan.ts';
import { toleranceOfLetter, type Tolerance } from './tolerance.ts';

export interface ParsedValue {
  /** In base SI units: ohms, farads, henries, volts. */
  value: number;
  quantity?: Quantity;
  /** From a trailing IEC tolerance letter ("1R8J" → ±5 %). */
  tolerance?: Tolerance;
}

const UNIT_WORD: readonly (readonly [RegExp, Quantity])[] = [
  [/^(?:Ω|ohms?)$/i, 'resistance'],
  [/^[Ff]$/, 'capacitance'],
  [/^[Hh]$/, 'inductance'],
  [/^[Vv]$/, 'voltage'],
];

const SYNTAX_HINT = 'write it like 4k7, 4.7k, 4.7 kΩ, 100n, 100nF or 10 µF';

function unitOf(tail: string): Quantity | undefined {
  for (const [re, q] of UNIT_WORD) if (re.test(tail)) return q;
  return undefined;
}

/** Split the tail into a unit or a tolerance letter; undefined when it is neither. */
function readTail(s: Scan, before: Quantity | undefined): { unit?: Quantity; tolerance?: Tolerance } | undefined {
  if (s.tail === '') return {};
  const tol = s.letterForm ? toleranceOfLetter(s.tail) : undefined;
  // "4K7F" is 4k7 ±1 %; "100nF" is 100 nF: F is the tolerance only after a resistance code.
  if (tol && (s.tail !== 'F' || before === 'resistance')) return { tolerance: tol };
  const unit = unitOf(s.tail);
  if (unit) return { unit };
  return undefined;
}

export function parseValue(text: string, quantity?: Quantity): Result<ParsedValue> {
  if (typeof text !== 'string' || text.trim() === '') {
    return fail([valueProblem('value.empty', String(text ?? ''), 'the value is empty', SYNTAX_HINT)]);
  }
  const t = normalize(text);
  const q = quoted(t);
  const s = scanValue(t);
  const syntax = () => fail<ParsedValue>([valueProblem('value.syntax', t, `${q} is not a value`, SYNTAX_HINT)]);
  if (!s) return syntax();

  const letterQ = s.letter !== undefined ? (unitLetterQuantity(s.letter) ?? impliedQuantity(s.letter)) : undefined;
  const tail = readTail(s, quantity ?? letterQ);
  if (!tail) return syntax();
  const fixed = tail.unit ?? (s.letter !== undefined ? unitLetterQuantity(s.letter) : undefined);
  if (quantity && fixed && fixed !== quantity) return fail([mismatch(t, quantity, fixed)]);
  const qty = quantity ?? fixed ?? letterQ;

  let letterExp = 0;
  if (s.letter !== undefined && qty) {
    const e = letterExponent(qty, s.letter, tail.unit !== undefined);
    if (e === 'ambiguous') return fail([ambiguous(t, qty, s.letter)]);
    if (e === undefined) return fail([mismatch(t, qty, impliedQuantity(s.letter))]);
    letterExp = e;
  }
  const magnitude = fromDecimal(s.int, s.frac, s.exp + letterExp);
  if (!Number.isFinite(magnitude)) {
    return fail([valueProblem('value.out-of-range', t, `${q} is too large to be a value`, 'check the exponent')]);
  }
  const value = s.negative ? -magnitude : magnitude;
  const range = rangeProblem(t, value, qty);
  if (range) return fail([range]);

  const warnings: Problem[] = [];
  if ((qty === 'capacitance' || qty === 'inductance') && s.letter === undefined && tail.unit === undefined) {
    const unit = qty === 'capacitance' ? 'F' : 'H';
    warnings.push(
      valueProblem(
        'value.no-unit',
        t,
        `${q} has no multiplier, so it reads as ${t} ${unit}`,
        `add the multiplier, e.g. ${t}u or ${t}n, if ${unit === 'F' ? 'farads were' : 'henries were'} not meant`,
        'warning',
      ),
    );
  }
  return ok(
    { value, ...(qty ? { quantity: qty } : {}), ...(tail.tolerance ? { tolerance: tail.tolerance } : {}) },
    warnings,
  );
}

function rangeProblem(t: string, value: number, qty: Quantity | undefined): Problem | undefined {
  if (qty === 'voltage') return undefined;
  if (value < 0 || Object.is(value, -0)) {
    return valueProblem('value.out-of-range', t, `${quoted(t)} is negative, which only a voltage can be`, 'drop the sign');
  }
  if (value === 0 && (qty === 'capacitance' || qty === 'inductance')) {
    return valueProblem('value.out-of-range', t, `${quoted(t)} is zero, which no ${qty === 'capacitance' ? 'capacitor' : 'inductor'} is`, 'give the marked value');
  }
  return undefined;
}

const LETTERS_OF: Readonly<Record<Quantity, string>> = {
  resistance: 'R, k, M, G (or Ω)',
  capacitance: 'p, n, u/µ, m (or F)',
  inductance: 'n, u/µ, m (or H)',
  voltage: 'm, V, k (3V3, 12V, 500m)',
};

function mismatch(t: string, wanted: Quantity, found: Quantity | undefined): Problem {
  const as = found ? `reads as a ${found}` : 'uses a letter that does not fit';
  return valueProblem(
    'value.quantity-mismatch',
    t,
    `${quoted(t)} ${as}, but a ${wanted} was expected`,
    `a ${wanted} is written with ${LETTERS_OF[wanted]}`,
  );
}

function ambiguous(t: string, qty: Quantity, letter: string): Problem {
  const hint =
    letter === 'm'
      ? 'write M for megohms (1M) or mΩ / L for milliohms (1 mΩ, 1L0)'
      : `write m for milli${qty === 'capacitance' ? 'farads' : 'henries'} or u/µ for micro (old marks used M for micro)`;
  return valueProblem('value.ambiguous-letter', t, `${quoted(t)}: "${letter}" is ambiguous for a ${qty}`, hint);
}
