/**
 * Netlist: reading circuits.
 *
 * - `parseCircuitText(text)` — circuit document JSON → `{ circuit, design }`, problems with
 *   JSON path, line and column.
 * - `importSpice(text, { overrides? })` — SPICE deck → `{ circuit, design, report }`; answers
 *   the deck cannot give come as `spice.ask-…` problems; overrides (SpiceOverrideSchema) or
 *   `* kerfline:` note comments in the deck supply them.
 * - `prepareDesign(circuit)` — bind footprints, pack op-amp sections (`Design`).
 * - `designFootprint(part)`, `partPinNames(part)`; packing tables for dual and quad packages.
 * Pure: no DOM, no Node; never throws on bad input.
 */
export { prepareDesign, designFootprint, partPinNames } from './design.ts';
export type { Design, DesignPart, DesignNet } from './design.ts';
export { packOpamps, packageSizes, DUAL_SECTIONS, DUAL_SUPPLY, QUAD_SECTIONS, QUAD_SUPPLY } from './packing.ts';
export type { Packed } from './packing.ts';
export { parseCircuitText } from './circuit-text.ts';
export { importSpice } from './spice.ts';
export type { SpiceReport, SpiceImport } from './spice.ts';
export type { SourceUse } from './spice-sources.ts';
export { SpiceOverrideSchema, SpiceImportOptionsSchema } from './spice-override.ts';
export type { SpiceOverride, SpiceImportOptions } from './spice-override.ts';
