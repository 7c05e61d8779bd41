/**
 * The page's side of auto-place. `startPlan(request, handlers, makeWorker?)` → PlanRun with
 * `cancel()`. Replies are parsed with WorkerReplySchema and must carry the request's id;
 * anything else is ignored. Cancelling ends the worker at once (a running plan cannot read
 * messages) and calls nothing afterwards; a worker that dies reports `crashed`.
 */
import { PlanRequestSchema, WorkerReplySchema, type PlanRequest, type Progress } from './protocol.ts';
import type { Layout, Problem } from '../../lib/model/index.ts';

export interface PlanHandlers {
  progress(p: Progress): void;
  done(layout: Layout, stats: Record<string, unknown>, warnings: Problem[]): void;
  failed(problems: Problem[]): void;
  crashed(message: string): void;
}

export interface PlanRun {
  id: number;
  cancel(): void;
}

export interface WorkerLike {
  postMessage(m: unknown): void;
  terminate(): void;
  onmessage: ((e: MessageEvent) => void) | null;
  onerror: ((e: ErrorEvent) => void) | null;
}

const defaultWorker = (): WorkerLike => new Worker(new URL('../worker.ts', import.meta.url), { type: 'module', name: 'kerfline-plan' });

let nextId = 1;

export function startPlan(request: Omit<PlanRequest, 'type' | 'id'>, on: PlanHandlers, makeWorker: () => WorkerLike = defaultWorker): PlanRun {
  const id = nextId++;
  const message = PlanRequestSchema.parse({ type: 'plan', id, ...request });
  const worker = makeWorker();
  let live = true;
  const end = () => {
    live = false;
    worker.onmessage = null;
    worker.onerror = null;
    worker.terminate();
  };
  worker.onmessage = (e) => {
    if (!live) return;
    const r = WorkerReplySchema.safeParse(e.data);
    if (!r.success || r.data.id !== id) return;
    const reply = r.data;
    if (reply.type === 'progress') on.progress(reply);
    else {
      end();
      if (reply.type === 'done') on.done(reply.layout, reply.stats, reply.warnings as Problem[]);
      else if (reply.type === 'failed') on.failed(reply.problems as Problem[]);
      else on.crashed(reply.message);
    }
  };
  worker.onerror = (e) => {
    if (!live) return;
    end();
    on.crashed(e.message || 'the planning worker stopped');
  };
  worker.postMessage(message);
  return { id, cancel: end };
}
