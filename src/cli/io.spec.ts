import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCircuit, loadLayout, loadOverrides, printProblems, problemLine, writeJsonFile } from './io.ts';

const dir = mkdtempSync(join(tmpdir(), 'kerfline-io-'));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
const LAYOUTS = join(__dirname, '..', '..', 'layouts');

describe('loadCircuit', () => {
  it('reads a circuit document by its .json extension', async () => {
    const r = await loadCircuit(join(LAYOUTS, 'bench-buffer.circuit.json'));
    expect(r.ok && r.value.source).toBe('json');
  });
  it('reads a SPICE deck by its .cir extension, with the import report', async () => {
    const r = await loadCircuit(join(LAYOUTS, 'twin-lfo.cir'));
    expect(r.ok && r.value.source).toBe('spice');
    expect(r.ok && r.value.report?.packing?.U1A?.part).toBe('U1');
  });
  it('guesses an unknown extension from the text and says so', async () => {
    const r = await loadCircuit(file('deck.txt', 'title\nR1 a 0 1k\nR2 a 0 2k\n.end\n'));
    expect(r.ok && r.value.source).toBe('spice');
    expect(r.ok && r.value.warnings.some((w) => w.code === 'io.guessed-format')).toBe(true);
  });
  it('a missing file is a problem, not an exception', async () => {
    const r = await loadCircuit(join(dir, 'nope.json'));
    expect(!r.ok && r.problems[0]!.code).toBe('io.read');
  });
  it('passes overrides to the SPICE importer', async () => {
    const deck = file('q.cir', 't\nQ1 c b 0 BCX\nR1 c b 1k\n.end\n');
    expect((await loadCircuit(deck)).ok).toBe(false);
    const o = await loadOverrides(file('answers.json', '{ "BCX": { "kind": "pnp", "pinout": "CBE" } }'));
    expect(o.ok).toBe(true);
    const r = await loadCircuit(deck, o.ok ? { overrides: o.value } : {});
    expect(r.ok && r.value.circuit.parts[0]!.kind).toBe('pnp');
  });
  it('rejects an overrides file with unknown fields, naming the place', async () => {
    const o = await loadOverrides(file('bad.json', '{\n  "Q1": { "colour": "red" }\n}'));
    expect(!o.ok && o.problems[0]).toMatchObject({ line: 2 });
  });
});

describe('loadLayout and writeJsonFile', () => {
  it('writes two-space JSON with a final newline and reads a layout back', async () => {
    const p = join(dir, 'sub', 'x.layout.json');
    await writeJsonFile(p, { format: 'kerfline.layout', version: 1, board: { kind: 'strip', cols: 5, rows: 4 }, parts: [] });
    expect(readFileSync(p, 'utf8')).toMatch(/^\{\n {2}"format"[\s\S]*\}\n$/);
    const r = await loadLayout(p);
    expect(r.ok && r.value.board.pitchMm).toBe(2.54);
  });
});

describe('problem lines', () => {
  it('file:line:column: message (fix: hint), or the JSON path', () => {
    expect(problemLine({ code: 'x.y', severity: 'error', path: [], line: 3, column: 7, message: 'bad', hint: 'fix it' }, 'a.cir')).toBe('a.cir:3:7: bad (fix: fix it)');
    expect(problemLine({ code: 'x.y', severity: 'warning', path: ['parts', 2, 'pins', 'K'], message: 'odd' }, 'c.json')).toBe('c.json: parts[2].pins.K: warning: odd');
  });
  it('keeps one problem on one line even when user text holds a newline', () => {
    const out: string[] = [];
    printProblems([{ code: 'x.y', severity: 'error', path: [], line: 1, message: 'name "a\nb" is bad' }], { write: (s: string) => out.push(s) }, 'f');
    expect(out).toEqual(['f:1:1: name "a b" is bad\n']);
  });
});
