/**
 * `colourBands(ohms, count: 4 | 5) → Result<string[]>`
 *
 * The colour bands of a resistor (IEC 60062, check-values.md §1a): 4 bands = two digits,
 * multiplier, gold tolerance (±5 %); 5 bands = three digits, multiplier, brown tolerance
 * (±1 %). Gold (×0.1) and silver (×0.01) multipliers cover values below 10 Ω, so 4 bands
 * reach 0.1 Ω … 99 GΩ and 5 bands 1 Ω … 999 GΩ. Zero gives the single black band of a
 * zero-ohm link [P]. Fails with `value.bands-precision` when the value needs more digits
 * than the bands hold (the hint names the nearest value that fits), `value.bands-range`
 * outside the multipliers, `value.out-of-range` for negative or non-finite values.
 */
import { fail, ok, type Result } from '../model/problem.ts';
import { digitColour, multiplierColour } from './colours.ts';
import { scaled, toDecimal } from './decimal.ts';
import { formatValue } from './format.ts';
import { valueProblem } from './problem.ts';

const TOLERANCE_BAND = { 4: 'gold', 5: 'brown' } as const;

export function colourBands(ohms: number, count: 4 | 5): Result<string[]> {
  const text = String(ohms);
  if (count !== 4 && count !== 5) {
    return fail([valueProblem('value.bands-count', text, `${count} bands cannot be written; use 4 or 5`, 'ask for 4 or 5 bands')]);
  }
  if (!Number.isFinite(ohms) || ohms < 0) {
    return fail([valueProblem('value.out-of-range', text, `${text} Ω is not a resistance`, 'give a value of zero or more')]);
  }
  if (ohms === 0) return ok(['black']);
  const n = count - 2;
  const d = toDecimal(ohms);
  const name = formatValue(ohms, 'resistance');
  if (d.digits.length > n) {
    const fits = scaled(Math.round(Number(`${d.digits.slice(0, n)}.${d.digits.slice(n)}`)), d.exp - n + 1);
    return fail([
      valueProblem(
        'value.bands-precision',
        text,
        `${name} needs ${d.digits.length} significant digits; ${count} bands hold ${n}`,
        `use ${formatValue(fits, 'resistance')}${count === 4 ? ' or 5 bands' : ''}`,
      ),
    ]);
  }
  const exp = d.exp - n + 1;
  const mult = multiplierColour(exp);
  if (mult === undefined || exp < -2) {
    return fail([
      valueProblem('value.bands-range', text, `${name} is outside the ${count}-band multipliers (silver ×0.01 … white ×1G)`, 'mark the value in text instead'),
    ]);
  }
  const digits = [...d.digits.padEnd(n, '0')].map((c) => digitColour(Number(c)));
  return ok([...digits, mult, TOLERANCE_BAND[count]]);
}
