/**
 * `parseSpiceNumber(text) → number | undefined`
 *
 * A number as Berkeley SPICE3 reads it (check-values.md §10 [S]): a decimal with optional
 * exponent, then an optional scale suffix, case-insensitive — T 1e12, G 1e9, MEG 1e6,
 * K 1e3, MIL 25.4e-6, M 1e-3, U 1e-6, N 1e-9, P 1e-12, F 1e-15 (MEG and MIL are tried
 * before M, so M is milli and F is femto). Letters after the number or after the suffix
 * are ignored: "10uF" is 1e-5, "10MOhm" is 0.01, "3.3V" is 3.3. As in SPICE3, an "e" with
 * no digits is an empty exponent ("1e" is 1). Our choice where SPICE3 would silently drop
 * what the writer meant: digits or non-ASCII characters after the number ("4k7", "10µ",
 * "1.2.3") give undefined, so the caller can report them or retry with `parseValue`
 * (which reads 4k7 as 4700). Undefined also for empty text, text with inner blanks or
 * SPICE field separators, no leading digits, or an infinite result.
 */
const SUFFIX: readonly (readonly [string, number])[] = [
  ['MEG', 6],
  ['MIL', 0], // scaled below: 25.4e-6 is not a power of ten
  ['T', 12],
  ['G', 9],
  ['K', 3],
  ['M', -3],
  ['U', -6],
  ['N', -9],
  ['P', -12],
  ['F', -15],
];

const NUMBER = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?)(\d*))?/;

export function parseSpiceNumber(text: string): number | undefined {
  if (typeof text !== 'string') return undefined;
  const t = text.trim();
  const m = NUMBER.exec(t);
  if (!m) return undefined;
  const [whole, sign = '', int = '', frac = '', expSign = '', expDigits = ''] = m;
  if (int === '' && frac === '') return undefined;
  const rest = t.slice(whole.length);
  // Separators (blank , = ( )) end a SPICE field; a digit or non-ASCII letter after the
  // number means the writer meant something SPICE3 would misread.
  if (/[\s,=()\d]|[^\x20-\x7e]/.test(rest)) return undefined;
  const upper = rest.toUpperCase();
  let scale = 0;
  let mil = false;
  for (const [name, exp] of SUFFIX) {
    if (upper.startsWith(name)) {
      scale = exp;
      mil = name === 'MIL';
      break;
    }
  }
  const exp = Number(`${expSign}${expDigits || '0'}`) + scale;
  let value = Number(`${sign}${int || '0'}.${frac || '0'}e${exp}`);
  if (mil) value = (value * 254) / 1e7; // 1 mil = 25.4 µm exactly; integer steps keep 5mil = 1.27e-4
  return Number.isFinite(value) ? value : undefined;
}
