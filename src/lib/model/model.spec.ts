import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CircuitSchema, LayoutSchema, ProjectSchema, formatPath, formatProblem, locateJsonPath, parseDocument, migrateProject } from './index.ts';
import { jsonErrorOffset } from './json-locate.ts';

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
    // exchange.md: pitch is 2.54 mm (0.1 in) unless the board says otherwise (check-values.md §8 [S])
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
  it('places a syntax error the engine gives no position for (a stray token, a cut-off end)', () => {
    const at = (text: string) => {
      const r = parseDocument(LayoutSchema, text, 'layout');
      return r.ok ? undefined : [r.problems[0]!.line, r.problems[0]!.column];
    };
    expect(at('JP\u0001 not json')).toEqual([1, 1]);
    expect(at('{\n  "format": "kerfline.layout",\n  "board": x\n}')).toEqual([3, 12]);
    expect(at('{\n  "parts": [1, 2')).toEqual([2, 17]);
    expect(at('')).toEqual([1, 1]);
  });
  it('the syntax scanner agrees with JSON.parse on what is valid (property)', () => {
    const bits = ['{', '}', '[', ']', ',', ':', '"', ' ', 'true', 'nul', '-', '0', '1.', 'e5', '"a\\u12"', '\\', '\n'];
    const text = fc.oneof(fc.json(), fc.string(), fc.array(fc.constantFrom(...bits), { maxLength: 12 }).map((a) => a.join('')), fc.tuple(fc.json(), fc.nat(), fc.constantFrom(...bits)).map(([j, k, b]) => j.slice(0, k % (j.length + 1)) + b + j.slice(k % (j.length + 1))));
    fc.assert(
      fc.property(text, (s) => {
        let valid = true;
        try {
          JSON.parse(s);
        } catch {
          valid = false;
        }
        const off = jsonErrorOffset(s);
        expect(off === undefined).toBe(valid);
        if (off !== undefined) expect(off).toBeLessThanOrEqual(s.length);
      }),
      { numRuns: 3000 },
    );
  });
  it('formats paths readably', () => {
    expect(formatPath(['parts', 3, 'pins', 'K'])).toBe('parts[3].pins.K');
    expect(formatPath(['nets', 'V+'])).toBe('nets["V+"]');
  });
  it('locating any path never throws and answers a real place (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.array(fc.oneof(fc.string(), fc.nat(5)), { maxLength: 4 }), (value, path) => {
        const text = JSON.stringify(value, null, 1) ?? 'null';
        const pos = locateJsonPath(text, path);
        expect(pos === undefined || (pos.line >= 1 && pos.column >= 1)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
  it('a path that exists lands exactly on its value (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.array(fc.nat(), { maxLength: 5 }), fc.integer({ min: 0, max: 2 }), (value, steps, indent) => {
        // Walk into the value to pick a path that is really there.
        const path: (string | number)[] = [];
        let sub: unknown = value;
        for (const step of steps) {
          if (Array.isArray(sub) && sub.length) {
            path.push(step % sub.length);
            sub = sub[step % sub.length];
          } else if (sub && typeof sub === 'object' && Object.keys(sub).length) {
            const key = Object.keys(sub)[step % Object.keys(sub).length]!;
            path.push(key);
            sub = (sub as Record<string, unknown>)[key];
          } else break;
        }
        const text = JSON.stringify(value, null, indent);
        const pos = locateJsonPath(text, path)!;
        expect(pos).toBeDefined();
        const lines = text.split('\n');
        const offset = lines.slice(0, pos.line - 1).reduce((n, l) => n + l.length + 1, 0) + pos.column - 1;
        // Compact text holds the value's own JSON verbatim; indented text starts it there.
        const own = JSON.stringify(sub);
        if (indent === 0) expect(text.slice(offset, offset + own.length)).toBe(own);
        else expect(text[offset]).toBe(own[0]);
      }),
      { numRuns: 1000 },
    );
  });
});
