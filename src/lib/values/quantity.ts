/**
 * The four quantities a part value can hold, and the unit symbol of each (SI). Ω is stored
 * as U+03A9; U+2126 (ohm sign) is folded to it on input.
 */
export const QUANTITIES = ['resistance', 'capacitance', 'inductance', 'voltage'] as const;
export type Quantity = (typeof QUANTITIES)[number];

export const UNIT_SYMBOL: Readonly<Record<Quantity, string>> = {
  resistance: 'Ω',
  capacitance: 'F',
  inductance: 'H',
  voltage: 'V',
};

export function isQuantity(q: unknown): q is Quantity {
  return typeof q === 'string' && (QUANTITIES as readonly string[]).includes(q);
}
