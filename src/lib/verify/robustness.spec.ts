/**
 * Bad input never throws: any layout the schema accepts, however wrong for its circuit,
 * gets a report (and a probe checklist and a netlist), with faults marked as errors.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LayoutSchema, type Layout } from '../model/index.ts';
import { extractNetlist } from './extract.ts';
import { probeChecklist } from './probe.ts';
import { circuit, divider } from './spec-kit.ts';
import { createVerifier } from './verifier.ts';

const withSections = circuit(
  [
    ...divider().circuit.parts,
    { ref: 'A1', kind: 'opamp', pins: { '+': 'MID', '-': 'OUT', out: 'OUT', 'V+': 'VCC', 'V-': 'GND' } },
    { ref: 'Q1', kind: 'npn', pins: { C: 'VCC', B: 'MID' } },
    { ref: 'U9', kind: 'ic', package: 'DIP-8', pins: { '1': 'OUT' } },
  ],
  { GND: { role: 'ground' } },
);

const hole = fc.tuple(fc.integer({ min: 0, max: 14 }), fc.integer({ min: 0, max: 9 }));
const pinName = fc.constantFrom('1', '2', '3', '8', '+', '-', 'A', 'K', 'C', 'B', 'E', 'W', 'x', 'constructor');
const arbLayout: fc.Arbitrary<Layout> = fc
  .record({
    board: fc.record({ kind: fc.constantFrom('strip', 'pads', 'bus'), cols: fc.integer({ min: 1, max: 12 }), rows: fc.integer({ min: 1, max: 8 }) }),
    conductors: fc.option(fc.array(fc.array(hole, { minLength: 1, maxLength: 5 }), { maxLength: 6 }), { nil: undefined }),
    parts: fc.array(
      fc.record({
        ref: fc.constantFrom('R1', 'R2', 'C1', 'J1', 'Q1', 'U1', 'U9', 'Z9', 'A1'),
        footprint: fc.constantFrom('upright', 'axial-small', 'ecap-2.54', 'pads-3', 'to92-EBC', 'to92-CBE', 'dip-8', 'dip-14', 'nonsense'),
        pins: fc.array(fc.record({ pin: pinName, at: hole }), { maxLength: 9 }),
      }),
      { maxLength: 9 },
    ),
    cuts: fc.array(fc.oneof(fc.record({ at: hole }), fc.record({ between: fc.tuple(hole, hole) })), { maxLength: 6 }),
    links: fc.array(fc.record({ from: hole, to: hole }), { maxLength: 4 }),
    wires: fc.array(fc.record({ from: hole, to: hole }), { maxLength: 4 }),
    packing: fc.option(fc.dictionary(fc.constantFrom('A1', 'R1', 'B7'), fc.record({ part: fc.constantFrom('U1', 'R1', 'U7'), pins: fc.dictionary(fc.constantFrom('+', '-', 'out', 'V+', 'V-', 'q'), pinName) })), { nil: undefined }),
    spares: fc.option(fc.dictionary(fc.constantFrom('U1', 'U9', 'J9'), fc.dictionary(pinName, fc.constantFrom('GND', 'S'))), { nil: undefined }),
  })
  .map((r) =>
    LayoutSchema.parse({
      format: 'kerfline.layout',
      version: 1,
      board: r.conductors ? { ...r.board, conductors: r.conductors } : r.board,
      parts: r.parts,
      cuts: r.cuts,
      links: r.links,
      wires: r.wires,
      ...(r.packing ? { packing: r.packing } : {}),
      ...(r.spares ? { spares: r.spares } : {}),
    }),
  );

describe('bad layouts', () => {
  it('always get a report, never an exception', () => {
    fc.assert(
      fc.property(arbLayout, fc.array(fc.nat(), { maxLength: 3 }), (l, moved) => {
        const v = createVerifier(withSections);
        const r = v.check(l);
        expect(r.clean).toBe(r.faults.length === 0);
        for (const f of r.faults) expect(f.severity).toBe('error');
        for (const w of r.warnings) expect(w.severity).not.toBe('error');
        const refs = moved.flatMap((k) => (l.parts.length ? [l.parts[k % l.parts.length]!.ref] : []));
        expect(v.recheck(l, refs)).toEqual(r);
        expect(() => probeChecklist(withSections, l)).not.toThrow();
        expect(() => extractNetlist(l, withSections)).not.toThrow();
      }),
      { numRuns: 400 },
    );
  });
});
