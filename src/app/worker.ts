/**
 * The planning worker: auto-place runs here so the page never freezes. It only translates
 * messages (see worker/protocol.ts); the job itself is worker/plan-job.ts.
 */
import { runPlanJob } from './worker/plan-job.ts';
import type { WorkerReply } from './worker/protocol.ts';

const scope = self as unknown as { onmessage: ((e: MessageEvent) => void) | null; postMessage(m: WorkerReply): void };
scope.onmessage = (e) => runPlanJob(e.data, (reply) => scope.postMessage(reply));
