import { describe, expect, it } from 'vitest';
import { parseCircuitText } from './index.ts';

const GOOD = `{
  "format": "kerfline.circuit",
  "version": 1,
  "title": "two resistors",
  "parts": [
    { "ref": "R1", "kind": "resistor", "value": "10k", "pins": { "1": "A", "2": "B" } },
    { "ref": "R2", "kind": "resistor", "value": "1k", "pins": { "1": "B", "2": "GND" } }
  ],
  "nets": { "GND": { "role": "ground" } }
}`;

describe('parseCircuitText', () => {
  it('reads a circuit and its design; warnings carry path and line', () => {
    const r = parseCircuitText(GOOD);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.design.parts.map((p) => p.footprint)).toEqual(['axial-small', 'axial-small']);
    const single = r.warnings.find((w) => w.code === 'net.single-pin')!;
    expect(single.nets).toEqual(['A']);
    // net A is not described under "nets": it is placed where R1's pin 1 names it
    expect(single).toMatchObject({ path: ['nets', 'A'], line: 6, column: GOOD.split('\n')[5]!.indexOf('"A"') + 1 });
  });

  it('a JSON syntax error names line and column', () => {
    const r = parseCircuitText('{\n  "format": "kerfline.circuit",\n  "version": 1\n  "parts": []\n}');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems[0]).toMatchObject({ code: 'circuit.json-syntax', line: 4 });
  });

  it('reports every schema and kind problem in one pass, with path, line and column', () => {
    const text = `{
  "format": "kerfline.circuit",
  "version": 1,
  "parts": [
    { "ref": "R1", "kind": "resistor", "pins": { "1": "A", "3": "B" } },
    { "ref": "Q1", "kind": "transistor", "pins": {} },
    { "ref": "R1", "kind": "resistor", "pins": { "1": "A", "2": "B" } },
    { "ref": "C1", "kind": "capacitor", "value": 100, "pins": { "1": "A", "2": "B" } }
  ]
}`;
    const r = parseCircuitText(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const byCode = (code: string) => r.problems.filter((p) => p.code === code);
    // schema: bad kind on part 1 (line 6) and a number for a value on part 3 (line 8)
    expect(byCode('circuit.invalid_value')[0]).toMatchObject({ path: ['parts', 1, 'kind'], line: 6 });
    expect(byCode('circuit.invalid_type')[0]).toMatchObject({ path: ['parts', 3, 'value'], line: 8 });
    // kind rules on the well-formed parts, in the same pass
    expect(byCode('part.unknown-pin')[0]).toMatchObject({ path: ['parts', 0, 'pins', '3'], line: 5 });
    expect(byCode('part.open-lead')[0]!.path).toEqual(['parts', 0, 'pins']);
    expect(byCode('circuit.duplicate-ref')[0]).toMatchObject({ path: ['parts', 2, 'ref'], line: 7 });
    expect(r.problems.every((p) => p.line !== undefined && p.column !== undefined)).toBe(true);
  });

  it('problems from design binding (packing) are placed too', () => {
    const text = JSON.stringify({ format: 'kerfline.circuit', version: 1, parts: [{ ref: 'A1', kind: 'opamp', pins: { '+': 'a', '-': 'b', out: 'b', 'V+': 'p', 'V-': 'n' } }] }, null, 2);
    const r = parseCircuitText(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toMatchObject({ code: 'packing.no-ground', path: ['nets'], line: 1 });
  });

  it('never throws on non-string input', () => {
    expect(parseCircuitText(undefined as unknown as string).ok).toBe(false);
  });
});
