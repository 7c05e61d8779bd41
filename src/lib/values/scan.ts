/**
 * Split value text into number, multiplier letter and tail, before any meaning is given:
 * "4k7J" → int 4, letter k, frac 7, tail "J"; "4.7 kΩ" → int 4, frac 7, letter k, tail "Ω".
 * Quantity rules are applied later (parse.ts).
 */
import { isMultiplierLetter } from './letters.ts';

export interface Scan {
  negative: boolean;
  int: string;
  frac: string;
  /** Written exponent ("1e3"), 0 when none. */
  exp: number;
  /** The letter stands for the decimal point or follows the digits with no point (IEC form). */
  letterForm: boolean;
  letter?: string;
  /** What follows: unit, tolerance letter, or junk. */
  tail: string;
}

const HEAD = /^([+\-\u2212]?)(\d*)(?:\.(\d*))?(?:[eE]([+\-]?\d{1,4}))?/;

/** Fold the look-alike µ and Ω code points and the spacing variants. */
export function normalize(text: string): string {
  return text.replace(/\u03BC/g, '\u00B5').replace(/\u2126/g, '\u03A9').trim();
}

export function scanValue(text: string): Scan | undefined {
  const head = HEAD.exec(text);
  if (!head) return undefined;
  const [whole, sign = '', int = '', dotFrac, expText] = head;
  const pointed = dotFrac !== undefined || expText !== undefined;
  let frac = dotFrac ?? '';
  let rest = text.slice(whole.length).trimStart();
  let letter: string | undefined;
  const meg = /^meg/i.exec(rest);
  if (meg) letter = 'meg';
  else if (rest.length > 0 && isMultiplierLetter(rest[0] ?? '')) letter = rest[0];
  if (letter !== undefined) rest = rest.slice(letter === 'meg' ? 3 : 1);
  const letterForm = letter !== undefined && !pointed;
  if (letterForm && letter !== 'meg') {
    const digits = /^\d*/.exec(rest)?.[0] ?? '';
    frac = digits;
    rest = rest.slice(digits.length);
  }
  if (int === '' && frac === '') return undefined;
  return {
    negative: sign !== '' && sign !== '+',
    int,
    frac,
    exp: expText === undefined ? 0 : Number(expText),
    letterForm,
    ...(letter !== undefined ? { letter } : {}),
    tail: rest.trim(),
  };
}
