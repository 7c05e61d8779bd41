import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { run } from './check.ts';

const LAYOUTS = join(__dirname, '..', '..', '..', 'layouts');
const dir = mkdtempSync(join(tmpdir(), 'kerfline-check-'));

async function capture(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  vi.spyOn(process.stdout, 'write').mockImplementation((s: string | Uint8Array) => ((out += String(s)), true));
  vi.spyOn(process.stderr, 'write').mockImplementation((s: string | Uint8Array) => ((err += String(s)), true));
  const code = await run(args);
  vi.restoreAllMocks();
  return { code, out, err };
}
afterEach(() => vi.restoreAllMocks());

describe('kerfline check', () => {
  it('prints title, parts, nets, packing and spares; exit 0', async () => {
    const r = await capture([join(LAYOUTS, 'four-mixer.circuit.json')]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^Four-channel mixer with soft clipping\n/);
    expect(r.out).toMatch(/^ {2}R1 +resistor +100k +axial-small$/m);
    expect(r.out).toMatch(/^ {2}VPOS \(power, \+12 V\): /m);
    expect(r.out).toMatch(/^ {2}U2A → U2: \+=3 -=2 out=1 V\+=8 V-=4$/m);
    expect(r.out).toMatch(/^ {2}U2: pin 5→GND, pin 6→U2_SPARE_B, pin 7→U2_SPARE_B$/m);
  });
  it('--json prints a machine-readable summary', async () => {
    const r = await capture([join(LAYOUTS, 'twin-lfo.cir'), '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { ok: boolean; source: string; parts: { ref: string }[]; packing: Record<string, unknown>; nets: { name: string; pins: string[] }[] };
    expect(j).toMatchObject({ ok: true, source: 'spice' });
    expect(Object.keys(j.packing)).toEqual(['U1A', 'U1B', 'U1C', 'U1D']);
    expect(j.nets.find((n) => n.name === 'OUT1')!.pins.sort()).toEqual(['J1.1', 'R9.2']);
  });
  it('exit 2 with one line per problem for unreadable input', async () => {
    const f = join(dir, 'bad.cir');
    writeFileSync(f, 'title\nQ1 c b e QZ\nXU1 a b c FOO\n.end\n');
    const r = await capture([f]);
    expect(r.code).toBe(2);
    const lines = r.err.trim().split('\n');
    expect(lines[0]).toMatch(new RegExp(`^${f.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}:2:10: .*NPN or PNP\\? \\(fix: .*\\)$`));
    expect(lines[1]).toMatch(/:3:11: .*which package and pin map\?/);
    expect(r.err).toMatch(/2 question\(s\) to answer/);
  });
  it('exit 2 for a JSON document with a bad field, naming line and column', async () => {
    const f = join(dir, 'bad.json');
    writeFileSync(f, '{\n  "format": "kerfline.circuit",\n  "version": 1,\n  "parts": [ { "ref": "R1", "kind": "resistr", "pins": {} } ]\n}\n');
    const r = await capture([f]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/bad\.json:4:\d+: .*\(fix: use one of: "resistor"/);
  });
  it('exit 2 and one clear line for binary data, an empty file, a layout and a deck with nothing to place', async () => {
    const junk = join(dir, 'junk.cir');
    writeFileSync(junk, Buffer.from(Array.from({ length: 300 }, (_, i) => (i * 89 + 7) % 256)));
    const empty = join(dir, 'empty.json');
    writeFileSync(empty, '');
    const simOnly = join(dir, 'sim.cir');
    writeFileSync(simOnly, 'only a model\nE1 a 0 b 0 10\n.end\n');
    const cases: [string, RegExp][] = [
      [junk, /junk\.cir: not a text file: it holds binary data \(fix: give a circuit document/],
      [empty, /empty\.json:1:1: the file is empty \(fix: /],
      [join(LAYOUTS, 'bench-buffer.hand.layout.json'), /:2:\d+: format: this is a layout document .*not a circuit \(fix: .*circuit file goes first/],
      [simOnly, /sim\.cir:1:1: no element of the netlist can go on a board/],
    ];
    for (const [f, want] of cases) {
      const r = await capture([f]);
      expect([f, r.code]).toEqual([f, 2]);
      expect(r.err.split('\n')[0]).toMatch(want);
      expect(r.err).not.toMatch(/internal error|\n\s+at .+:\d+:\d+/);
    }
  });
  it('exit 2 on usage errors', async () => {
    expect((await capture([])).code).toBe(2);
    expect((await capture(['a.json', '--frob'])).code).toBe(2);
  });
});
