/**
 * The circuit document (input contract, ../shared/design/exchange.md "Circuit document").
 * Structural rules live here; per-kind pin rules live with the part kinds (src/lib/parts).
 */
import { z } from 'zod';

export const PART_KINDS = [
  'resistor',
  'capacitor',
  'inductor',
  'diode',
  'led',
  'zener',
  'npn',
  'pnp',
  'nmos',
  'pmos',
  'jfet-n',
  'jfet-p',
  'ic',
  'opamp',
  'trimmer',
  'pads',
  'header',
] as const;
export const PartKindSchema = z.enum(PART_KINDS);
export type PartKind = z.infer<typeof PartKindSchema>;

export const NetNameSchema = z.string().min(1, 'a net name cannot be empty').max(64);
export const RefSchema = z
  .string()
  .min(1, 'a reference cannot be empty')
  .max(32)
  .regex(/^[A-Za-z][A-Za-z0-9_.\-]*$/, 'a reference starts with a letter and holds letters, digits, _ . or -');

export const SpanSchema = z
  .object({ min: z.number().int().min(1).max(40), max: z.number().int().min(1).max(40) })
  .refine((s) => s.min <= s.max, { message: 'span.min must not exceed span.max' });

export const CircuitPartSchema = z.object({
  ref: RefSchema,
  kind: PartKindSchema,
  value: z.string().max(64).optional(),
  polarized: z.boolean().optional(),
  /** Lead order left to right seen from the flat face, e.g. "EBC" or "SGD". */
  pinout: z.string().regex(/^[A-Za-z]{3}$/, 'pinout is three pin letters such as "EBC"').optional(),
  /** IC package, e.g. "DIP-14". */
  package: z.string().regex(/^DIP-(4|6|8|14|16|18|20|24|28)$/i, 'package is DIP-N, e.g. "DIP-14"').optional(),
  count: z.number().int().min(1).max(64).optional(),
  /** Rows of a header part (2 for a 2×N header). */
  rowsOfPins: z.number().int().min(1).max(2).optional(),
  pins: z.record(z.string().min(1), NetNameSchema),
  labels: z.record(z.string(), z.string().max(80)).optional(),
  footprint: z.string().min(1).optional(),
  span: SpanSchema.optional(),
  /** Preferred board edge for pads parts. */
  edge: z.enum(['left', 'right', 'top', 'bottom']).optional(),
  note: z.string().max(200).optional(),
});
export type CircuitPart = z.infer<typeof CircuitPartSchema>;

export const NetRoleSchema = z.enum(['ground', 'power', 'signal', 'input', 'output']);
export const NetInfoSchema = z.object({
  role: NetRoleSchema.optional(),
  volts: z.number().optional(),
  note: z.string().max(200).optional(),
});
export type NetInfo = z.infer<typeof NetInfoSchema>;

export const CircuitSchema = z.object({
  format: z.literal('kerfline.circuit'),
  version: z.literal(1),
  title: z.string().max(200).default('Untitled circuit'),
  parts: z.array(CircuitPartSchema),
  nets: z.record(NetNameSchema, NetInfoSchema).default({}),
});
export type Circuit = z.infer<typeof CircuitSchema>;
export type CircuitInput = z.input<typeof CircuitSchema>;
