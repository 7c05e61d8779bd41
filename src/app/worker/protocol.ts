/**
 * Messages between the page and the planning worker (style habit 13). Both sides parse
 * every message with these schemas and drop what does not match, so a stale or garbled
 * message can never reach the planner or the screen.
 *
 * page → worker: `plan` { id, circuit, options, start? } — place, route and verify the circuit;
 *   `start` carries the current layout so locked parts keep their holes.
 * worker → page: `progress` { id, phase, fraction, cost, best } at most every
 *   PROGRESS_INTERVAL_MS; then exactly one of `done` { id, layout, stats, warnings },
 *   `failed` { id, problems } (the circuit cannot be laid out) or `crashed` { id, message } (a bug).
 * Cancelling is the page's job: it ends the worker (a running plan cannot read messages)
 * and keeps the layout it had.
 */
import { z } from 'zod';
import { CircuitSchema, HoleSchema, LayoutSchema, PlanOptionsSchema } from '../../lib/model/index.ts';

/** Progress messages closer together than this are dropped: the bar cannot show them. */
export const PROGRESS_INTERVAL_MS = 50;

export const ProblemSchema = z.object({
  code: z.string(),
  severity: z.enum(['error', 'warning', 'note']),
  path: z.array(z.union([z.string(), z.number()])),
  line: z.number().optional(),
  column: z.number().optional(),
  message: z.string(),
  hint: z.string().optional(),
  refs: z.array(z.string()).optional(),
  nets: z.array(z.string()).optional(),
  holes: z.array(HoleSchema).optional(),
  pins: z.array(z.object({ ref: z.string(), pin: z.string() })).optional(),
  data: z.record(z.string(), z.unknown()).optional(),
});

export const PlanRequestSchema = z.object({
  type: z.literal('plan'),
  id: z.number().int().nonnegative(),
  circuit: CircuitSchema,
  options: PlanOptionsSchema,
  start: LayoutSchema.optional(),
});
export type PlanRequest = z.infer<typeof PlanRequestSchema>;

export const ProgressSchema = z.object({
  type: z.literal('progress'),
  id: z.number().int(),
  phase: z.string(),
  fraction: z.number().min(0).max(1),
  cost: z.number(),
  best: z.number(),
});
export type Progress = z.infer<typeof ProgressSchema>;

export const DoneSchema = z.object({
  type: z.literal('done'),
  id: z.number().int(),
  layout: LayoutSchema,
  stats: z.record(z.string(), z.unknown()),
  warnings: z.array(ProblemSchema),
});

export const FailedSchema = z.object({ type: z.literal('failed'), id: z.number().int(), problems: z.array(ProblemSchema).min(1) });
export const CrashedSchema = z.object({ type: z.literal('crashed'), id: z.number().int(), message: z.string() });

export const WorkerReplySchema = z.discriminatedUnion('type', [ProgressSchema, DoneSchema, FailedSchema, CrashedSchema]);
export type WorkerReply = z.infer<typeof WorkerReplySchema>;
