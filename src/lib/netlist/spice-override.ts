/**
 * Answers the user gives the SPICE importer: per element name, model name or subcircuit
 * name, what the part really is. Passed as `importSpice(text, { overrides })`, or written
 * in the deck as note comments (`* kerfline: [target] key=value …`, see spice-notes.ts).
 *
 * Fields: `kind` (a circuit part kind), `value` (text shown to the builder), `footprint`,
 * `package` ("DIP-8" …, for kind `ic`), `pinout` (a transistor's lead order "EBC"; for an
 * `ic` also accepted as the package pin list "3,2,8,4,1"), `pins` (the part's pin name for
 * each node of the call, in order), `labels` (pads: what each pad goes to), `polarized`
 * (a capacitor: first node is +).
 */
import { z } from 'zod';
import { PartKindSchema } from '../model/circuit.ts';

export const SpiceOverrideSchema = z
  .object({
    kind: PartKindSchema.optional(),
    value: z.string().max(64).optional(),
    footprint: z.string().min(1).optional(),
    package: z.string().min(1).optional(),
    pinout: z.string().min(1).optional(),
    pins: z.array(z.string().min(1)).optional(),
    labels: z.array(z.string().max(80)).optional(),
    polarized: z.boolean().optional(),
  })
  .strict();
export type SpiceOverride = z.infer<typeof SpiceOverrideSchema>;

export const SpiceImportOptionsSchema = z.object({
  overrides: z.record(z.string().min(1), SpiceOverrideSchema).optional(),
});
export type SpiceImportOptions = z.infer<typeof SpiceImportOptionsSchema>;

/**
 * Later answers win field by field (deck note < options; model < element). An answer that
 * names a different kind starts afresh, so a pin map meant for one kind never leaks into
 * another.
 */
export function mergeOverrides(...list: (SpiceOverride | undefined)[]): SpiceOverride {
  let out: SpiceOverride = {};
  for (const o of list) {
    if (!o) continue;
    if (o.kind && out.kind && o.kind !== out.kind) out = {};
    Object.assign(out, Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)));
  }
  return out;
}
