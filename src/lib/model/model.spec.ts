import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CircuitSchema, LayoutSchema, ProjectSchema, formatPath, formatProblem, locateJsonPath, parseDocument, migrateProject } from './index.ts';

// A circuit using every field the exchange contract names (exchange.md "Circuit document").
const circuit = {
  format: 'kerfline.circuit',
  version: 1,
  title: 'Contract sample',
  parts: [
    { ref: 'R1', kind: 'resistor', value: '47k', pins: { '1': 'V+', '2': 'A' } },
    { ref: 'C3', kind: 'capacitor', value: '22u', polarized: true, pins: { '+': 'A', '-': 'GND' } },
    { ref: 'D1', kind: 'diode', value: 'small signal', pins: { A: 'A', K: 'B' } },
    { ref: 'Q1', kind: 'npn', value: 'general NPN', pinout: 'EBC', pins: { C: 'B', B: 'A', E: 'GND' } },
    { ref: 'U1', kind: 'ic', package: 'DIP-14', value: 'quad op amp', pins: { '1': 'B', '4': 'V+', '11': 'GND' } },
    { ref: 'J1', kind: 'pads', count: 3, value: 'to panel pot', pins: { '1': 'V+', '2': 'A', '3': 'GND' }, labels: { '1': 'lug 3', '2': 'wiper', '3': 'lug 1' } },
    { ref: 'R9', kind: 'resistor', pins: { '1': 'A', '2': 'B' }, span: { min: 3, max: 8 }, footprint: 'axial-small' },
  ],
  nets: { GND: { role: 'ground' }, 'V+': { role: 'power', volts: 12 } },
};

const layout = {
  format: 'kerfline.layout',
  version: 1,
  board: { kind: 'strip', cols: 24, rows: 18, pitchMm: 2.54 },
  parts: [{ ref: 'R1', footprint: 'axial-small', pins: [{ pin: '1', at: [3, 2] }, { pin: '2', at: [3, 6] }] }],
  cuts: [{ at: [7, 4] }, { between: [[10, 5], [11, 5]] }],
  links: [{ from: [12, 2], to: [12, 9] }],
  wires: [{ from: [5, 3], to: [5, 4] }],
};

describe('exchange documents', () => {
  it('accepts the contract samples', () => {
    expect(CircuitSchema.safeParse(circuit).success).toBe(true);
    expect(LayoutSchema.safeParse(layout).success).toBe(true);
  });
  it('defaults pitch to 2.54 mm and empty cut/link/wire lists', () => {
    const l = LayoutSchema.parse({ format: 'kerfline.layout', version: 1, board: { kind: 'pads', cols: 4, rows: 4 }, parts: [] });
    expect(l.board.pitchMm).toBe(2.54);
    expect(l.cuts).toEqual([]);
    expect(l.wires).toEqual([]);
  });
  it('rejects a cut that is both kinds at once', () => {
    const bad = { ...layout, cuts: [{ at: [1, 1], between: [[1, 1], [2, 1]] }] };
    expect(LayoutSchema.safeParse(bad).success).toBe(false);
  });
  it('a project defaults its options', () => {
    const p = ProjectSchema.parse({ format: 'kerfline.project', version: 1, source: { kind: 'json', text: '{}' }, circuit });
    expect(p.options.effort).toBe('normal');
    expect(migrateProject(p)).toBe(p);
  });
});

describe('problems name their place', () => {
  it('gives JSON path and line/column for a bad field', () => {
    const text = JSON.stringify({ ...circuit, parts: [circuit.parts[0], { ref: 'Q2', kind: 'transistor', pins: {} }] }, null, 2);
    const r = parseDocument(CircuitSchema, text, 'circuit');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const p = r.problems.find((x) => formatPath(x.path) === 'parts[1].kind')!;
    expect(p).toBeDefined();
    const line = text.split('\n')[p.line! - 1]!;
    expect(line.slice(p.column! - 1)).toMatch(/^"transistor"/);
    expect(p.hint).toMatch(/"npn"/);
    expect(formatProblem(p)).toMatch(/^error line \d+, column \d+: /);
  });
  it('gives line and column for a JSON syntax error', () => {
    const r = parseDocument(CircuitSchema, '{\n  "format": "kerfline.circuit",\n  "version" 1\n}', 'circuit');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems[0]!.code).toBe('circuit.json-syntax');
      expect(r.problems[0]!.line).toBe(3);
    }
  });
  it('formats paths readably', () => {
    expect(formatPath(['parts', 3, 'pins', 'K'])).toBe('parts[3].pins.K');
    expect(formatPath(['nets', 'V+'])).toBe('nets["V+"]');
  });
  it('locating a path never throws and lands on the value (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.array(fc.oneof(fc.string(), fc.nat(5)), { maxLength: 4 }), (value, path) => {
        const text = JSON.stringify(value, null, 1) ?? 'null';
        const pos = locateJsonPath(text, path);
        expect(pos === undefined || (pos.line >= 1 && pos.column >= 1)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
});
