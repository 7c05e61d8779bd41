/**
 * Numbers and value text for the SPICE importer, through the values module.
 *
 * `spiceNumber(text, quantity?)` → `{ value, letterCode }` or undefined;
 * `valueText(value, quantity)` → the IEC 60062 letter form shown to the builder ("4k7").
 *
 * SPICE3 suffix rules come first (check-values §10: M is milli, MEG mega, letters after a
 * suffix ignored). Text SPICE3 would misread — the letter-code form "4k7", a µ sign, an Ω —
 * is read as the writer meant by the values module's parseValue, and flagged
 * `letterCode: true` so the importer can say so.
 */
import { formatValue, parseSpiceNumber, parseValue, type Quantity } from '../values/index.ts';

export function spiceNumber(text: string, quantity?: Quantity): { value: number; letterCode: boolean } | undefined {
  const n = parseSpiceNumber(text);
  if (n !== undefined) return { value: n, letterCode: false };
  if (!quantity) return undefined;
  const r = parseValue(text, quantity);
  return r.ok ? { value: r.value.value, letterCode: true } : undefined;
}

export function valueText(value: number, quantity: 'resistance' | 'capacitance' | 'inductance'): string {
  return formatValue(value, quantity);
}
