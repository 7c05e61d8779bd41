/** Options shared by the CLI, the app and the worker (schemas first, style habit 5). */
import { z } from 'zod';
import { BoardKindSchema, CutStyleSchema, HoleSchema } from './layout.ts';

export const EffortSchema = z.enum(['quick', 'normal', 'thorough']);
export type Effort = z.infer<typeof EffortSchema>;

export const EdgeSchema = z.enum(['left', 'right', 'top', 'bottom']);
export type Edge = z.infer<typeof EdgeSchema>;

/** A rectangle of holes kept free (mounting holes, a heatsink): inclusive corners. */
export const KeepOutSchema = z.object({ from: HoleSchema, to: HoleSchema });
export type KeepOut = z.infer<typeof KeepOutSchema>;

export const BoardChoiceSchema = z.union([
  z.literal('auto'),
  z.object({
    kind: BoardKindSchema,
    cols: z.number().int().min(2).max(400),
    rows: z.number().int().min(2).max(400),
    /** For bus boards: the pattern generator, e.g. "breadboard". */
    pattern: z.string().optional(),
  }),
]);
export type BoardChoice = z.infer<typeof BoardChoiceSchema>;

export const PlanOptionsSchema = z.object({
  board: BoardChoiceSchema.default('auto'),
  /** Board kind used when board is "auto". */
  autoKind: BoardKindSchema.default('strip'),
  cutStyle: CutStyleSchema.default('either'),
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
  effort: EffortSchema.default('normal'),
  padsEdge: EdgeSchema.default('left'),
  supplyAtEdges: z.boolean().default(true),
  /** Parts whose placement the placer must keep. */
  locked: z.array(z.string()).default([]),
  keepOut: z.array(KeepOutSchema).default([]),
  /** Allow links to pass over part bodies (a link under a resistor, say). */
  linksOverBodies: z.boolean().default(false),
  /** Allow insulated wire links as a last resort (each one flagged); false: bare straight links only. */
  insulatedLinks: z.boolean().default(true),
});
export type PlanOptions = z.infer<typeof PlanOptionsSchema>;
export type PlanOptionsInput = z.input<typeof PlanOptionsSchema>;

export const RouteOptionsSchema = z.object({
  cutStyle: CutStyleSchema.default('either'),
  linksOverBodies: z.boolean().default(false),
  /** Last resort for a net no straight link joins: an insulated wire link in any direction (reported as a warning). */
  insulatedLinks: z.boolean().default(false),
});
export type RouteOptions = z.infer<typeof RouteOptionsSchema>;
export type RouteOptionsInput = z.input<typeof RouteOptionsSchema>;
