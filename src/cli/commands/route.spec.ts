/** `kerfline route` through its run() function, output captured. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LayoutSchema } from '../../lib/model/index.ts';
import { run } from './route.ts';

const root = new URL('../../../layouts/', import.meta.url);
const circuitFile = new URL('bench-buffer.circuit.json', root).pathname;
const placementFile = new URL('bench-buffer.placement.json', root).pathname;
const dir = mkdtempSync(join(tmpdir(), 'kerfline-route-'));

async function route(...args: string[]) {
  const text = { out: '', err: '' };
  const code = await run(args, { write: (s: string) => (text.out += s) }, { write: (s: string) => (text.err += s) });
  return { code, ...text };
}

describe('kerfline route', () => {
  it('writes the routed layout, prints a summary and exits 0', async () => {
    const out = join(dir, 'routed.json');
    const r = await route(circuitFile, placementFile, '--out', out);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/verified clean/);
    const layout = LayoutSchema.parse(JSON.parse(readFileSync(out, 'utf8')));
    // The summary states what the written file holds: link length = holes spanned × pitch.
    const holes = layout.links.reduce((s, l) => s + Math.abs(l.to[0] - l.from[0]) + Math.abs(l.to[1] - l.from[1]), 0);
    expect(r.out).toContain(`cuts:  ${layout.cuts.length}\n`);
    expect(r.out).toContain(`links: ${layout.links.length} (total ${(holes * layout.board.pitchMm).toFixed(1)} mm)`);
    expect(layout.links.length).toBeGreaterThan(0);
    // C1's two leads sit side by side on one strip (see the drilled-cut test below): the
    // one cut needed is the scored cut between them.
    const placement = LayoutSchema.parse(JSON.parse(readFileSync(placementFile, 'utf8')));
    const c1 = placement.parts.find((p) => p.ref === 'C1')!.pins.map((p) => p.at).sort((a, b) => a[0] - b[0]);
    expect(layout.cuts).toEqual([{ between: c1 }]);
  });

  it('exits 1 and says why when the placement cannot be routed in the cutting style asked for', async () => {
    const r = await route(circuitFile, placementFile, '--out', join(dir, 'no.json'), '--cut', 'hole');
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/drilled cut is impossible between C1\.1 .* and C1\.2/);
    expect(r.err).toMatch(/not routable as placed/);
  });

  it('exits 2 on usage errors and unreadable or mismatched input, without a stack trace', async () => {
    expect((await route(circuitFile, placementFile)).code).toBe(2);
    expect((await route(circuitFile, placementFile, '--out', join(dir, 'x.json'), '--cut', 'saw')).code).toBe(2);
    expect((await route(circuitFile, join(dir, 'missing.json'), '--out', join(dir, 'x.json'))).code).toBe(2);
    const partial = join(dir, 'partial.json');
    const doc = JSON.parse(readFileSync(placementFile, 'utf8')) as { parts: unknown[] };
    doc.parts.pop();
    writeFileSync(partial, JSON.stringify(doc));
    const r = await route(circuitFile, partial, '--out', join(dir, 'x.json'));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/part R3 is not placed/);
    expect(r.err).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });

  it('a part at a negative hole: exit 2, naming the field, its line and that holes count from 0', async () => {
    const doc = JSON.parse(readFileSync(placementFile, 'utf8')) as { parts: { pins: { at: number[] }[] }[] };
    doc.parts[0]!.pins[0]!.at = [-2, -1];
    const neg = join(dir, 'negative.json');
    writeFileSync(neg, JSON.stringify(doc, null, 2));
    const r = await route(circuitFile, neg, '--out', join(dir, 'x.json'));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/negative\.json:\d+:\d+: parts\[0\]\.pins\[0\]\.at\[0\]: hole columns and rows count from 0/);
    expect(r.err).toMatch(/parts\[0\]\.pins\[0\]\.at\[1\]/);
  });

  it('an --out that cannot be written: exit 2 with the reason, not an internal error', async () => {
    const r = await route(circuitFile, placementFile, '--out', dir);
    expect(r.code).toBe(2);
    expect(r.err).toBe(`cannot write ${dir}: it is a folder (fix: give a file name in a folder you can write to)\n`);
  });
});
