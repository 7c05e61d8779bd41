/**
 * One planning job, callable with or without a worker (style habit 13): validate the
 * request, prepare the design, run planLayout with progress, answer with one reply.
 *
 * Locked parts of `start` keep their holes (planLayout reads them from `context.previous`).
 * `runPlanJob(message, post, now = performance.now)`: `message` is anything (it is parsed
 * with PlanRequestSchema; garbage is answered with `crashed` when it carries an id, else
 * ignored); `post` receives every reply; progress is thinned to one per
 * PROGRESS_INTERVAL_MS, but the first and the last always go out.
 */
import { prepareDesign } from '../../lib/netlist/design.ts';
import { planLayout } from '../../lib/place/index.ts';
import { PROGRESS_INTERVAL_MS, PlanRequestSchema, type WorkerReply } from './protocol.ts';

export function runPlanJob(message: unknown, post: (reply: WorkerReply) => void, now: () => number = () => performance.now()): void {
  const parsed = PlanRequestSchema.safeParse(message);
  if (!parsed.success) {
    const id = (message as { id?: unknown } | null)?.id;
    if (typeof id === 'number' && Number.isInteger(id) && id >= 0)
      post({ type: 'crashed', id, message: `the page sent a plan request the worker cannot read: ${parsed.error.issues[0]?.message ?? 'bad shape'}` });
    return;
  }
  const { id, circuit, options, start } = parsed.data;
  try {
    const design = prepareDesign(circuit);
    if (!design.ok) {
      post({ type: 'failed', id, problems: design.problems });
      return;
    }
    const locked = start ? start.parts.filter((p) => p.locked).map((p) => p.ref) : [];
    let last = -Infinity;
    const planned = planLayout(
      design.value,
      { ...options, locked: [...new Set([...options.locked, ...locked])] },
      {
        onProgress(p) {
          const t = now();
          if (t - last < PROGRESS_INTERVAL_MS && p.fraction < 1) return;
          last = t;
          post({ type: 'progress', id, phase: p.phase, fraction: Math.min(1, Math.max(0, p.fraction)), cost: p.cost, best: p.best });
        },
      },
      start ? { circuit, previous: start } : { circuit },
    );
    if (!planned.ok) {
      post({ type: 'failed', id, problems: planned.problems });
      return;
    }
    post({
      type: 'done',
      id,
      layout: planned.value.layout,
      stats: { ...(planned.value.stats as unknown as Record<string, unknown>) },
      warnings: [...design.warnings, ...planned.warnings],
    });
  } catch (e) {
    post({ type: 'crashed', id, message: e instanceof Error ? e.message : String(e) });
  }
}
