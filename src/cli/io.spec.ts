import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCircuit, loadLayout, loadOverrides, printProblems, problemLine, writeJsonFile, writeTextFile } from './io.ts';

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

describe('files that are not what they should be', () => {
  const circuitText = readFileSync(join(LAYOUTS, 'bench-buffer.circuit.json'), 'utf8');
  const layoutText = readFileSync(join(LAYOUTS, 'bench-buffer.hand.layout.json'), 'utf8');
  const binary = Buffer.from(Array.from({ length: 256 }, (_, i) => (i * 37) % 256));

  it('an empty file is named as empty, for a circuit and for a layout', async () => {
    for (const r of [await loadCircuit(file('empty.json', '')), await loadCircuit(file('blank.cir', ' \n\n')), await loadLayout(file('empty.layout.json', ''))])
      expect(!r.ok && r.problems[0]).toMatchObject({ code: 'io.empty', line: 1 });
  });
  it('binary data is not read as text, whatever the extension', async () => {
    for (const name of ['junk.json', 'junk.cir', 'junk.bin']) {
      writeFileSync(join(dir, name), binary);
      const r = await loadCircuit(join(dir, name));
      expect(!r.ok && r.problems.map((p) => p.code)).toEqual(['io.not-text']);
    }
    expect(await loadLayout(join(dir, 'junk.json'))).toMatchObject({ ok: false, problems: [{ code: 'io.not-text' }] });
  });
  it('a layout given as the circuit, or a circuit as the layout, is one problem at "format"', async () => {
    const c = await loadCircuit(file('is-a-layout.json', layoutText));
    expect(!c.ok && c.problems).toEqual([expect.objectContaining({ code: 'io.wrong-document', path: ['format'], line: 2 })]);
    expect(!c.ok && c.problems[0]!.message).toMatch(/layout document .* not a circuit/);
    const l = await loadLayout(file('is-a-circuit.json', circuitText));
    expect(!l.ok && l.problems).toEqual([expect.objectContaining({ code: 'io.wrong-document', line: 2 })]);
    expect(!l.ok && l.problems[0]!.hint).toMatch(/circuit file goes first/);
  });
  it('a byte-order mark before the JSON is not an error', async () => {
    const r = await loadCircuit(file('bom.json', `\uFEFF${circuitText}`));
    expect(r.ok).toBe(true);
  });
  it('a layout with a JSON slip names its line and column', async () => {
    const r = await loadLayout(file('slip.json', '{\n  "format": "kerfline.layout",\n  "board": oops\n}'));
    expect(!r.ok && r.problems[0]).toMatchObject({ code: 'layout.json-syntax', line: 3, column: 12 });
  });
  it('a negative hole says holes count from 0, at its path and line', async () => {
    const l = JSON.parse(layoutText) as { parts: { pins: { at: number[] }[] }[] };
    l.parts[0]!.pins[0]!.at = [-2, 1];
    const r = await loadLayout(file('negative.json', JSON.stringify(l, null, 2)));
    expect(!r.ok && r.problems).toEqual([expect.objectContaining({ path: ['parts', 0, 'pins', 0, 'at', 0], line: expect.any(Number) })]);
    expect(!r.ok && problemLine(r.problems[0]!, 'n.json')).toMatch(/^n\.json:\d+:\d+: parts\[0\]\.pins\[0\]\.at\[0\]: hole columns and rows count from 0 .* \(fix: give at least 0\)$/);
  });
  it('a file that cannot be written is a problem, not an exception', async () => {
    const r = await writeTextFile(dir, 'x');
    expect(!r.ok && r.problems[0]).toMatchObject({ code: 'io.write' });
    expect(!r.ok && r.problems[0]!.message).toContain('it is a folder');
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
  it('lets no control character from a file reach the terminal', () => {
    expect(problemLine({ code: 'x.y', severity: 'error', path: [], line: 2, message: 'ref "\u001b[2J\u009bX\u0007" is bad' }, 'f')).toBe('f:2:1: ref " [2J X " is bad');
  });
  it('gives the JSON path after the line when both are known', () => {
    expect(problemLine({ code: 'x.y', severity: 'error', path: ['parts', 0, 'pins', 0, 'at', 1], line: 9, column: 5, message: 'bad' }, 'l.json')).toBe('l.json:9:5: parts[0].pins[0].at[1]: bad');
  });
});
