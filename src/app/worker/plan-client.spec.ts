import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, PlanOptionsSchema } from '../../lib/model/index.ts';
import { startPlan, type PlanHandlers, type WorkerLike } from './plan-client.ts';
import { smallLayout } from '../state/fixtures.ts';

const circuit = CircuitSchema.parse(JSON.parse(readFileSync('layouts/bench-buffer.circuit.json', 'utf8')));
const options = PlanOptionsSchema.parse({});

/** A worker stand-in: records what it got, lets the test answer. */
function fakeWorker() {
  const w = {
    sent: [] as unknown[],
    terminated: false,
    onmessage: null as WorkerLike['onmessage'],
    onerror: null as WorkerLike['onerror'],
    postMessage(m: unknown) {
      w.sent.push(m);
    },
    terminate() {
      w.terminated = true;
    },
    reply(data: unknown) {
      w.onmessage?.({ data } as MessageEvent);
    },
  };
  return w;
}

function recorder() {
  const log: string[] = [];
  const on: PlanHandlers = {
    progress: (p) => log.push(`progress ${p.fraction}`),
    done: (l) => log.push(`done ${l.parts.length}`),
    failed: (ps) => log.push(`failed ${ps[0]!.code}`),
    crashed: (m) => log.push(`crashed ${m}`),
  };
  return { log, on };
}

describe('auto-place client', () => {
  it('sends a valid request and passes on progress and the result', () => {
    const w = fakeWorker();
    const { log, on } = recorder();
    const run = startPlan({ circuit, options }, on, () => w);
    expect((w.sent[0] as { type: string }).type).toBe('plan');
    w.reply({ type: 'progress', id: run.id, phase: 'anneal', fraction: 0.5, cost: 10, best: 9 });
    w.reply({ type: 'done', id: run.id, layout: smallLayout(), stats: {}, warnings: [] });
    expect(log).toEqual(['progress 0.5', 'done 3']);
    expect(w.terminated).toBe(true);
  });

  it('ignores replies with another id or a bad shape', () => {
    const w = fakeWorker();
    const { log, on } = recorder();
    const run = startPlan({ circuit, options }, on, () => w);
    w.reply({ type: 'progress', id: run.id + 100, phase: 'x', fraction: 0.1, cost: 1, best: 1 });
    w.reply({ type: 'progress', id: run.id, phase: 'x', fraction: 7, cost: 1, best: 1 });
    w.reply({ type: 'done', id: run.id, layout: { format: 'nope' }, stats: {}, warnings: [] });
    w.reply('<script>');
    expect(log).toEqual([]);
  });

  it('hears nothing after cancel', () => {
    const w = fakeWorker();
    const { log, on } = recorder();
    const run = startPlan({ circuit, options }, on, () => w);
    run.cancel();
    w.reply({ type: 'done', id: run.id, layout: smallLayout(), stats: {}, warnings: [] });
    expect(log).toEqual([]);
    expect(w.terminated).toBe(true);
  });

  it('reports a dying worker once', () => {
    const w = fakeWorker();
    const { log, on } = recorder();
    startPlan({ circuit, options }, on, () => w);
    w.onerror?.({ message: 'boom' } as ErrorEvent);
    w.onerror?.({ message: 'again' } as ErrorEvent);
    expect(log).toEqual(['crashed boom']);
  });
});
