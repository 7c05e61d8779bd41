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
    expect(r.out).toMatch(/cuts: +1\n/);
    expect(r.out).toMatch(/links: 4 \(total 45\.7 mm\)/);
    expect(r.out).toMatch(/verified clean/);
    const layout = LayoutSchema.parse(JSON.parse(readFileSync(out, 'utf8')));
    expect(layout.links).toHaveLength(4);
    expect(layout.cuts).toEqual([{ between: [[2, 1], [3, 1]] }]);
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
});
