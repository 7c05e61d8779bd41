import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, LayoutSchema, PlanOptionsSchema } from '../../lib/model/index.ts';
import { verifyLayout } from '../../lib/verify/index.ts';
import { runPlanJob } from './plan-job.ts';
import { PROGRESS_INTERVAL_MS, WorkerReplySchema, type WorkerReply } from './protocol.ts';

const circuit = CircuitSchema.parse(JSON.parse(readFileSync('layouts/bench-buffer.circuit.json', 'utf8')));

function run(message: unknown, clock = () => 0): WorkerReply[] {
  const out: WorkerReply[] = [];
  runPlanJob(message, (r) => out.push(r), clock);
  return out;
}

describe('the planning job behind the worker', () => {
  it('answers a plan request with progress and one verified layout', () => {
    let t = 0;
    const replies = run({ type: 'plan', id: 3, circuit, options: PlanOptionsSchema.parse({ effort: 'quick' }) }, () => (t += 7));
    for (const r of replies) expect(WorkerReplySchema.safeParse(r).success).toBe(true);
    const done = replies.at(-1)!;
    expect(done.type).toBe('done');
    if (done.type !== 'done') return;
    expect(done.id).toBe(3);
    expect(verifyLayout(circuit, done.layout).clean).toBe(true);
    const progress = replies.filter((r) => r.type === 'progress');
    expect(progress.length).toBeGreaterThan(0);
    // Thinned: with the clock moving 7 ms a call, at most one message per interval.
    expect(progress.length).toBeLessThanOrEqual(Math.ceil((t / PROGRESS_INTERVAL_MS) * 2) + 2);
  });

  it('keeps the holes of parts locked in the starting layout', () => {
    // The planner's committed output for the demo, with one part locked by the user.
    const start = LayoutSchema.parse(JSON.parse(readFileSync('layouts/bench-buffer.layout.json', 'utf8')));
    const ref = start.parts[0]!.ref;
    start.parts[0] = { ...start.parts[0]!, locked: true };
    const done = run({ type: 'plan', id: 6, circuit, options: PlanOptionsSchema.parse({ effort: 'quick', seed: 9 }), start }).at(-1)!;
    expect(done.type).toBe('done');
    if (done.type === 'done') expect(done.layout.parts.find((p) => p.ref === ref)!.pins).toEqual(start.parts[0]!.pins);
  });

  it('turns a circuit that cannot be designed into a failed reply', () => {
    const bad = { ...circuit, parts: [{ ref: 'U1', kind: 'ic', pins: { '1': 'A' } }] };
    const [reply] = run({ type: 'plan', id: 4, circuit: bad, options: PlanOptionsSchema.parse({}) });
    expect(reply?.type).toBe('failed');
    if (reply?.type === 'failed') expect(reply.problems[0]!.code).toBe('part.no-package');
  });

  it('answers an unreadable request with an id as crashed, and ignores one without', () => {
    expect(run({ type: 'plan', id: 5, circuit: { nope: true } })[0]?.type).toBe('crashed');
    expect(run('<script>')).toEqual([]);
    expect(run({ type: 'plan', id: -1 })).toEqual([]);
  });
});
