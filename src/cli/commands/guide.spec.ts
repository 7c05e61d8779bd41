import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildGuide, guideHtml } from '../../lib/guide/index.ts';
import { benchBufferLayout } from '../../lib/render/fixture.ts';
import { loadCircuit, loadLayout } from '../io.ts';
import { run } from './guide.ts';

/** Every demo layout in layouts/ with the circuit of the same name (.circuit.json, else .cir). */
function demos(): { layout: string; circuit: string }[] {
  return readdirSync('layouts')
    .filter((f) => f.endsWith('.layout.json'))
    .sort()
    .map((f) => {
      const name = f.replace(/(\.hand)?\.layout\.json$/, '');
      const circuit = [`layouts/${name}.circuit.json`, `layouts/${name}.cir`].find((p) => existsSync(p)) ?? `layouts/${name}.circuit.json`;
      return { layout: `layouts/${f}`, circuit };
    });
}

let dir = '';
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'kerfline-guide-'));
  vi.spyOn(process.stdout, 'write').mockImplementation(() => true);
  vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
});
afterEach(() => {
  vi.restoreAllMocks();
  rmSync(dir, { recursive: true, force: true });
});

describe('guide for every demo layout', () => {
  it('finds at least one demo layout', () => {
    expect(demos().length).toBeGreaterThan(0);
  });

  for (const d of demos())
    it(`builds the guide for ${d.layout}`, async () => {
      const c = await loadCircuit(d.circuit);
      const l = await loadLayout(d.layout);
      expect(c.ok && l.ok).toBe(true);
      if (!c.ok || !l.ok) return;
      const g = buildGuide(c.value.circuit, l.value);
      if (!g.ok) throw new Error(g.problems.map((p) => `${p.code}: ${p.message}`).join('\n'));
      expect(g.value.parts.reduce((s, p) => s + p.count, 0)).toBe(l.value.parts.length);
      expect(guideHtml(g.value, { paper: 'letter' })).toContain('<!doctype html>');
    });
});

describe('kerfline guide', () => {
  it('writes the HTML guide for a demo', async () => {
    const d = demos()[0]!;
    const out = join(dir, 'sub', 'guide.html');
    expect(await run([d.circuit, d.layout, '--out', out, '--paper', 'letter'])).toBe(0);
    expect(readFileSync(out, 'utf8')).toContain('size: letter portrait');
  });

  it('an --out that cannot be written, or a layout given as the circuit: exit 2 with the reason', async () => {
    const d = demos()[0]!;
    expect(await run([d.circuit, d.layout, '--out', dir])).toBe(2);
    expect(await run([d.layout, d.layout, '--out', join(dir, 'g.html')])).toBe(2);
    const said = vi.mocked(process.stderr.write).mock.calls.map((c) => String(c[0])).join('');
    expect(said).toContain(`cannot write ${dir}: it is a folder`);
    expect(said).toMatch(/format: this is a layout document .*not a circuit/);
    expect(said).not.toMatch(/internal error|\n\s+at .+:\d+:\d+/);
    expect(existsSync(join(dir, 'g.html'))).toBe(false);
  });

  it('refuses bad usage with exit 2 and a faulty layout with exit 1', async () => {
    expect(await run(['layouts/bench-buffer.circuit.json'])).toBe(2);
    expect(await run(['a', 'b', '--out', join(dir, 'g.html'), '--paper', 'a3'])).toBe(2);
    expect(await run(['layouts/missing.json', 'layouts/missing.layout.json', '--out', join(dir, 'g.html')])).toBe(2);
    // the hand-built bench-buffer layout without its first link: IN is open
    const layout = benchBufferLayout();
    layout.links = layout.links.slice(1);
    const bad = join(dir, 'bad.layout.json');
    writeFileSync(bad, JSON.stringify(layout));
    expect(await run(['layouts/bench-buffer.circuit.json', bad, '--out', join(dir, 'g.html')])).toBe(1);
    expect(existsSync(join(dir, 'g.html'))).toBe(false);
  });
});
