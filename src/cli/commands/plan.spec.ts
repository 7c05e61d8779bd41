/** `kerfline plan` through its run() function, output captured. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CircuitSchema, LayoutSchema } from '../../lib/model/index.ts';
import { verifyLayout } from '../../lib/verify/index.ts';
import { layoutName, linksLine, parseArgs, run } from './plan.ts';
import { benchBufferLayout } from '../../lib/render/fixture.ts';

const circuitFile = new URL('../../../layouts/bench-buffer.circuit.json', import.meta.url).pathname;
const dir = mkdtempSync(join(tmpdir(), 'kerfline-plan-'));

async function plan(...args: string[]) {
  const text = { out: '', err: '' };
  const code = await run(args, { write: (s: string) => (text.out += s) }, { write: (s: string) => (text.err += s) });
  return { code, ...text };
}

describe('kerfline plan', () => {
  it('reads its options', () => {
    expect(parseArgs(['c.json', '--out', 'd'])).toMatchObject({ circuit: 'c.json', out: 'd', board: 'auto', seed: 1, effort: 'normal', insulated: true });
    expect(parseArgs(['c.json', '--no-insulated', '--out', 'd'])).toMatchObject({ insulated: false });
    expect(parseArgs(['c.json', '--seed', 'x', '--out', 'd']).error).toMatch(/--seed/);
    expect(parseArgs(['c.json', '--effort', 'huge', '--out', 'd']).error).toMatch(/--effort/);
    expect(parseArgs(['c.json']).error).toMatch(/--out/);
    expect(layoutName('/a/twin-lfo.circuit.json')).toBe('twin-lfo');
    expect(layoutName('deck.cir')).toBe('deck');
  });

  it('writes a layout that verifies clean and a drawing of both sides, and prints a summary', async () => {
    const r = await plan(circuitFile, '--effort', 'quick', '--seed', '3', '--out', dir);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/board\s+strip \d+ × \d+ holes/);
    expect(r.out).toMatch(/cuts\s+\d+/);
    expect(r.out).toMatch(/links\s+\d+, [\d.]+ mm in all/);
    expect(r.out).toMatch(/holes used \d+/);
    const layout = LayoutSchema.parse(JSON.parse(readFileSync(join(dir, 'bench-buffer.layout.json'), 'utf8')));
    expect(layout.meta).toMatchObject({ seed: 3, effort: 'quick' });
    const circuit = CircuitSchema.parse(JSON.parse(readFileSync(circuitFile, 'utf8')));
    expect(verifyLayout(circuit, layout).clean).toBe(true);
    const svg = readFileSync(join(dir, 'bench-buffer.svg'), 'utf8');
    expect(svg.match(/data-side="(component|copper)"/g)?.length).toBeGreaterThanOrEqual(2);
  });

  it('says in the summary how many links must be insulated wire', () => {
    const l = benchBufferLayout();
    expect(linksLine(l, 12.5)).toBe(`links      ${l.links.length}, 12.5 mm in all`);
    // One bent link (insulated) and one straight over no pin (bare); row 1 columns 10–12 hold no pin.
    const two = { ...l, links: [{ from: [2, 2], to: [5, 6] }, { from: [10, 1], to: [12, 1] }] as typeof l.links };
    expect(linksLine(two, 20)).toBe('links      2 (1 insulated wire), 20.0 mm in all');
  });

  it('exits 1 with the reason when no board of the asked size routes', async () => {
    const r = await plan(circuitFile, '--board', 'strip:4x4', '--effort', 'quick', '--out', dir);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/no placement could be routed/);
  });

  it('exits 2 with a clear message when --out cannot be written', async () => {
    // A plain file where the output folder should be: nothing can be written under it.
    const blocker = join(dir, 'not-a-folder');
    writeFileSync(blocker, 'x');
    const r = await plan(circuitFile, '--effort', 'quick', '--out', join(blocker, 'sub'));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/cannot write .*not-a-folder/);
    expect(r.err).not.toMatch(/internal error/);
  });

  it('exits 2 on bad input or usage', async () => {
    expect((await plan('nowhere.json', '--out', dir)).code).toBe(2);
    expect((await plan(circuitFile, '--board', 'round:9', '--out', dir)).code).toBe(2);
    expect((await plan(circuitFile)).code).toBe(2);
  });
});
