/** `kerfline verify` through its run() function, output captured. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from './verify.ts';

const root = new URL('../../../layouts/', import.meta.url);
const circuitFile = new URL('bench-buffer.circuit.json', root).pathname;
const layoutFile = new URL('bench-buffer.hand.layout.json', root).pathname;
const dir = mkdtempSync(join(tmpdir(), 'kerfline-verify-'));

function capture() {
  const text = { out: '', err: '' };
  return { text, out: { write: (s: string) => (text.out += s) }, err: { write: (s: string) => (text.err += s) } };
}

async function verify(...args: string[]) {
  const c = capture();
  const code = await run(args, c.out, c.err);
  return { code, ...c.text };
}

function withLayout(name: string, edit: (l: Record<string, unknown>) => void): string {
  const l = JSON.parse(readFileSync(layoutFile, 'utf8')) as Record<string, unknown>;
  edit(l);
  const file = join(dir, name);
  writeFileSync(file, JSON.stringify(l));
  return file;
}

const noStack = (s: string) => !/\n\s+at .+:\d+:\d+/.test(s) && !/\bError:/.test(s);

describe('kerfline verify', () => {
  it('exits 0 on a clean layout and says so', async () => {
    const r = await verify(circuitFile, layoutFile);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/clean: no faults/);
    expect(r.err).toBe('');
  });

  it('exits 1 with one block per fault: what, where from both sides, how to fix', async () => {
    const file = withLayout('open.json', (l) => ((l.links as unknown[]).length = 1));
    const r = await verify(circuitFile, file);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/^FAULT verify\.open: open: net OUT lies on 2 separate islands/m);
    expect(r.out).toMatch(/^ {2}where: .*\(copper [A-Z]+\d+\)/m);
    expect(r.out).toMatch(/^ {2}fix: {3}add a link from /m);
    expect(r.out).toMatch(/1 fault, /);
  });

  it('--json prints { clean, faults, warnings }', async () => {
    const r = await verify(circuitFile, layoutFile, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, unknown>;
    expect(Object.keys(j)).toEqual(['clean', 'faults', 'warnings']);
    expect(j.clean).toBe(true);
    expect(j.faults).toEqual([]);
    const bad = await verify(circuitFile, withLayout('short.json', (l) => ((l.wires as unknown[]) = [{ from: [13, 0], to: [13, 1] }])), '--json');
    expect(bad.code).toBe(1);
    const faults = (JSON.parse(bad.out) as { faults: { code: string; holes: number[][] }[] }).faults;
    expect(faults.map((f) => f.code)).toContain('verify.short');
  });

  it('a malformed layout: schema paths, exit 2, no stack trace', async () => {
    const file = withLayout('bad.json', (l) => {
      (l.board as Record<string, unknown>).cols = 'wide';
      (l.parts as Record<string, unknown>[])[1]!.pins = [{ pin: 'C', at: [2, -3] }];
    });
    const r = await verify(circuitFile, file);
    expect(r.code).toBe(2);
    expect(r.err).toContain('board.cols');
    expect(r.err).toContain('parts[1].pins[0].at[1]');
    expect(r.err).toMatch(/bad\.json:\d+:\d+: /);
    expect(noStack(r.err + r.out)).toBe(true);
    const j = await verify(circuitFile, file, '--json');
    expect(j.code).toBe(2);
    expect((JSON.parse(j.out) as { errors: { path: unknown[] }[] }).errors.map((e) => e.path)).toContainEqual(['board', 'cols']);
  });

  it('binary data, an empty file or a circuit where the layout belongs: exit 2, one line naming it', async () => {
    const junk = join(dir, 'junk.json');
    writeFileSync(junk, Buffer.from(Array.from({ length: 300 }, (_, i) => (i * 89 + 7) % 256)));
    const empty = join(dir, 'empty.json');
    writeFileSync(empty, ' \n');
    const cases: [string, RegExp][] = [
      [junk, /^.*junk\.json: not a text file/],
      [empty, /^.*empty\.json:1:1: the file is empty/],
      [circuitFile, /^.*bench-buffer\.circuit\.json:2:\d+: format: this is a circuit document .*not a layout/],
    ];
    for (const [f, want] of cases) {
      const r = await verify(circuitFile, f);
      expect(r.code).toBe(2);
      expect(r.err.trim().split('\n')).toHaveLength(1);
      expect(r.err).toMatch(want);
      expect(noStack(r.err)).toBe(true);
    }
  });

  it('broken JSON, a missing file or a usage error: exit 2, no stack trace', async () => {
    const broken = join(dir, 'broken.json');
    writeFileSync(broken, '{ "format": "kerfline.layout", ');
    for (const args of [[circuitFile, broken], [circuitFile, join(dir, 'nope.json')], [circuitFile], [circuitFile, layoutFile, '--fast']]) {
      const r = await verify(...args);
      expect(r.code).toBe(2);
      expect(r.err.length).toBeGreaterThan(0);
      expect(noStack(r.err)).toBe(true);
    }
  });
});
