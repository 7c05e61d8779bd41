import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { readSource, sniffFile } from './reading.ts';

const demo = readFileSync('layouts/bench-buffer.circuit.json', 'utf8');

describe('reading circuit text', () => {
  it('reads the JSON demo into a circuit and a design', () => {
    const r = readSource({ kind: 'json', text: demo });
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.circuit.parts.map((p) => p.ref)).toContain('Q1');
      expect(r.value.design.parts.length).toBe(r.value.circuit.parts.length);
    }
  });

  it('gives a line number for a JSON slip', () => {
    const broken = demo.replace('"R1", "kind"', '"R1" "kind"');
    const r = readSource({ kind: 'json', text: broken });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.line).toBe(demo.split('\n').findIndex((l) => l.includes('"R1", "kind"')) + 1);
  });

  it('reads SPICE-syntax text', () => {
    const r = readSource({ kind: 'spice', text: '* two resistors\nR1 IN MID 10k\nR2 MID 0 10k\n.end\n' });
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.circuit.parts.map((p) => p.ref).sort()).toEqual(['R1', 'R2']);
  });

  it('tells file kinds apart by format field, extension and look', () => {
    expect(sniffFile('a.json', '{ "format": "kerfline.project", "version": 1 }')).toBe('project');
    expect(sniffFile('x.txt', '{"format":"kerfline.circuit"}')).toBe('circuit');
    expect(sniffFile('b.json', '{ "format": "kerfline.layout" }')).toBe('layout');
    expect(sniffFile('c.cir', 'R1 1 2 1k')).toBe('spice');
    expect(sniffFile('noext', '* title\nR1 1 2 1k')).toBe('spice');
    expect(sniffFile('d.json', '{ "what": 1 }')).toBe('unknown-json');
  });
});
