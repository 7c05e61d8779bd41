/**
 * The project file: what the app saves and autosaves. Versioned, with named migrations
 * next to the schema (style habit 5).
 */
import { z } from 'zod';
import { CircuitSchema } from './circuit.ts';
import { LayoutSchema } from './layout.ts';
import { PlanOptionsSchema } from './options.ts';

export const SourceSchema = z.object({
  kind: z.enum(['json', 'spice']),
  text: z.string(),
  name: z.string().optional(),
});
export type Source = z.infer<typeof SourceSchema>;

export const ProjectSchema = z.object({
  format: z.literal('kerfline.project'),
  version: z.literal(1),
  /** The text the circuit came from, as the user typed it (never lost). */
  source: SourceSchema,
  circuit: CircuitSchema,
  layout: LayoutSchema.optional(),
  options: PlanOptionsSchema.default(PlanOptionsSchema.parse({})),
  /** View state: which side, zoom; free-form, never required. */
  view: z.record(z.string(), z.unknown()).optional(),
  savedAt: z.string().optional(),
});
export type Project = z.infer<typeof ProjectSchema>;

/** Named migrations: key is the version a document is migrated *from*. None yet past v1. */
export const PROJECT_MIGRATIONS: Record<number, (doc: Record<string, unknown>) => Record<string, unknown>> = {};

/** Bring an older project document up to the current version before validation. */
export function migrateProject(doc: unknown): unknown {
  if (!doc || typeof doc !== 'object') return doc;
  let cur = doc as Record<string, unknown>;
  for (let guard = 0; guard < 16; guard++) {
    const v = typeof cur.version === 'number' ? cur.version : 1;
    const step = PROJECT_MIGRATIONS[v];
    if (!step) break;
    cur = step(cur);
  }
  return cur;
}
