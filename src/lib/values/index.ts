/**
 * Values: reading, writing and checking component values.
 *
 * - `parseValue(text, quantity?)` — IEC 60062 letter code, SI and SPICE-mega forms → SI number.
 * - `parseSpiceNumber(text)` — SPICE3 number rules (M = milli, MEG, MIL, F = femto).
 * - `formatValue(value, quantity)` — "4k7", "100n", "2R2"; `formatSi(value, unit)` — "4.7 kΩ".
 * - `E_SERIES`, `nearestPreferred`, `isPreferred`, `offSeriesWarning` — IEC 60063 series.
 * - `colourBands(ohms, 4 | 5)`, `decodeBands(colours)` — resistor colour code.
 * - `capacitorCode(farads)`, `parseCapacitorCode(text)` — three-digit capacitor mark.
 * Pure: no DOM, no Node, no clock; never throws on bad input.
 */
export { QUANTITIES, UNIT_SYMBOL, isQuantity } from './quantity.ts';
export type { Quantity } from './quantity.ts';
export { TOLERANCE_LETTERS } from './tolerance.ts';
export type { Tolerance } from './tolerance.ts';
export { parseValue } from './parse.ts';
export type { ParsedValue } from './parse.ts';
export { parseSpiceNumber } from './spice.ts';
export { formatValue, formatSi } from './format.ts';
export { SERIES_NAMES, E_SERIES, nearestPreferred, isPreferred } from './series.ts';
export type { SeriesName } from './series.ts';
export { offSeriesWarning } from './off-series.ts';
export { BAND_COLOURS } from './colours.ts';
export type { BandColour, ToleranceReading } from './colours.ts';
export { colourBands } from './bands.ts';
export { decodeBands } from './decode-bands.ts';
export type { BandReading, BandDecoding, DecodeOptions } from './decode-bands.ts';
export { capacitorCode, parseCapacitorCode } from './cap-code.ts';
