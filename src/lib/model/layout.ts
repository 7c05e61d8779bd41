/**
 * The resolved layout document (output contract, ../shared/design/exchange.md).
 * Coordinates are 0-based [col, row] seen from the component side, origin top-left.
 */
import { z } from 'zod';

/** A hole [column, row]: 0-based from the top-left hole, seen from the component side. */
const HOLE_MIN = 'hole columns and rows count from 0 at the top-left hole; a negative one is off the board';
export const HoleSchema = z.tuple([z.number().int().min(0, HOLE_MIN), z.number().int().min(0, HOLE_MIN)]);

export const BOARD_KINDS = ['strip', 'pads', 'bus'] as const;
export const BoardKindSchema = z.enum(BOARD_KINDS);
export type BoardKind = z.infer<typeof BoardKindSchema>;

/** How track cuts are made: drilled at a hole, scored between holes, or whichever fits. */
export const CutStyleSchema = z.enum(['hole', 'between', 'either']);
export type CutStyle = z.infer<typeof CutStyleSchema>;

export const BoardSchema = z.object({
  kind: BoardKindSchema,
  cols: z.number().int().min(1).max(400),
  rows: z.number().int().min(1).max(400),
  pitchMm: z.number().positive().max(10).default(2.54),
  /** Explicit copper: each list is one conductor, holes in the order the copper runs. */
  conductors: z.array(z.array(HoleSchema).min(1)).optional(),
  /** Name of the pattern the conductors came from (e.g. "breadboard-30"), for people. */
  pattern: z.string().optional(),
  cutStyle: CutStyleSchema.optional(),
});
export type Board = z.infer<typeof BoardSchema>;

export const PlacedPinSchema = z.object({ pin: z.string().min(1), at: HoleSchema });

export const LayoutPartSchema = z.object({
  ref: z.string().min(1),
  footprint: z.string().min(1),
  pins: z.array(PlacedPinSchema),
  kind: z.string().optional(),
  package: z.string().optional(),
  value: z.string().optional(),
  /** Quarter turns clockwise from the footprint's base orientation (informative). */
  rotation: z.number().int().min(0).max(3).optional(),
  locked: z.boolean().optional(),
});
export type LayoutPart = z.infer<typeof LayoutPartSchema>;

export const CutSchema = z.union([
  z.object({ at: HoleSchema }).strict(),
  z.object({ between: z.tuple([HoleSchema, HoleSchema]) }).strict(),
]);
export type Cut = z.infer<typeof CutSchema>;

export const SegmentSchema = z.object({ from: HoleSchema, to: HoleSchema });
export type Segment = z.infer<typeof SegmentSchema>;

export const PackingSchema = z.record(
  z.string(),
  z.object({ part: z.string().min(1), pins: z.record(z.string(), z.string()) }),
);
export type Packing = z.infer<typeof PackingSchema>;

export const LayoutSchema = z.object({
  format: z.literal('kerfline.layout'),
  version: z.literal(1),
  board: BoardSchema,
  parts: z.array(LayoutPartSchema),
  cuts: z.array(CutSchema).default([]),
  links: z.array(SegmentSchema).default([]),
  wires: z.array(SegmentSchema).default([]),
  packing: PackingSchema.optional(),
  spares: z.record(z.string(), z.record(z.string(), z.string())).optional(),
  /** Optional provenance: which program, seed and effort made it. */
  meta: z.record(z.string(), z.unknown()).optional(),
});
export type Layout = z.infer<typeof LayoutSchema>;
export type LayoutInput = z.input<typeof LayoutSchema>;
