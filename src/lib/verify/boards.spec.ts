/**
 * Fixtures on the other board kinds: a bus board printed in the breadboard pattern (explicit
 * conductors from breadboardBoard) and a pad board wired on the copper side.
 */
import { describe, expect, it } from 'vitest';
import { breadboardBoard } from '../board/index.ts';
import type { Layout } from '../model/index.ts';
import { circuit, codes, layout, warningCodes } from './spec-kit.ts';
import { verifyLayout } from './verify.ts';

const edit = (l: Layout, f: (l: Layout) => void): Layout => {
  const copy = structuredClone(l);
  f(copy);
  return copy;
};

describe('a bus board in the breadboard pattern', () => {
  // rails on rows 0, 1, 15, 16; groups of five per column on rows 3–7 and 9–13; rows 2, 8, 14 bare
  const c = circuit([
    { ref: 'R1', kind: 'resistor', pins: { '1': 'VCC', '2': 'MID' } },
    { ref: 'R2', kind: 'resistor', pins: { '1': 'MID', '2': 'GND' } },
    { ref: 'D1', kind: 'diode', pins: { A: 'MID', K: 'GND' } },
    { ref: 'J1', kind: 'pads', count: 1, pins: { '1': 'MID' } },
  ]);
  const board = breadboardBoard(10);
  const l = layout(
    board,
    [
      { ref: 'R1', footprint: 'axial-small', pins: { '1': [2, 1], '2': [2, 5] } },
      { ref: 'R2', footprint: 'axial-small', pins: { '1': [2, 7], '2': [2, 15] } },
      { ref: 'D1', footprint: 'do35', pins: { A: [4, 7], K: [4, 15] } },
      { ref: 'J1', footprint: 'pads-1', pins: { '1': [6, 8] } },
    ],
    {
      links: [{ from: [2, 6], to: [4, 6] }],
      wires: [
        { from: [4, 3], to: [6, 3] },
        { from: [6, 8], to: [6, 7] }, // J1 sits on the bare row; the wire solders it to column 7's group
      ],
    },
  );

  it('verifies clean: groups joined by a link and a copper-side wire, a pad on a bare row joined by wire', () => {
    expect(verifyLayout(c, l).faults).toEqual([]);
  });

  it('without the wire the pad on the bare row joins nothing: MID is open', () => {
    const r = verifyLayout(c, edit(l, (d) => d.wires.pop()));
    expect(codes(r)).toEqual(['verify.open']);
    expect(r.faults[0]!.pins).toContainEqual({ ref: 'J1', pin: '1' });
  });

  it('a cut between two holes of a rail splits it: GND is open', () => {
    const r = verifyLayout(c, edit(l, (d) => d.cuts.push({ between: [[3, 15], [4, 15]] })));
    expect(codes(r)).toEqual(['verify.open']);
    expect(r.faults[0]!.nets).toEqual(['GND']);
  });

  it('a cut between holes of two different conductors cuts nothing', () => {
    const r = verifyLayout(c, edit(l, (d) => d.cuts.push({ between: [[3, 7], [3, 9]] })));
    expect(codes(r)).toEqual(['verify.bad-cut']);
  });

  it('a link from rail to rail shorts them; the trace runs along the rails and over the link', () => {
    const r = verifyLayout(c, edit(l, (d) => d.links.push({ from: [5, 1], to: [5, 15] })));
    expect(codes(r)).toEqual(['verify.short']);
    const f = r.faults[0]!;
    expect(f.nets).toEqual(['GND', 'VCC']);
    expect(f.message).toContain('link 2');
    expect(f.hint).toContain('P5 (copper P6)'); // cut the GND rail next to D1's cathode
  });

  it('a link ending on a bare row with no wire joins nothing there', () => {
    const r = verifyLayout(c, edit(l, (d) => d.links.push({ from: [8, 8], to: [8, 5] })));
    expect(r.faults).toEqual([]);
    expect(warningCodes(r)).toContain('verify.link-dangling');
  });
});

describe('a pad board wired on the copper side', () => {
  const c = circuit([
    { ref: 'R1', kind: 'resistor', pins: { '1': 'A', '2': 'B' } },
    { ref: 'R2', kind: 'resistor', pins: { '1': 'A', '2': 'B' } },
  ]);
  const l = layout({ kind: 'pads', cols: 6, rows: 3 }, [
    { ref: 'R1', footprint: 'axial-small', pins: { '1': [0, 0], '2': [3, 0] } },
    { ref: 'R2', footprint: 'axial-small', pins: { '1': [0, 2], '2': [3, 2] } },
  ], {
    wires: [
      { from: [0, 0], to: [0, 2] },
      { from: [3, 2], to: [3, 0] },
    ],
  });

  it('every pad is its own conductor until a wire joins it', () => {
    expect(verifyLayout(c, l).faults).toEqual([]);
    const r = verifyLayout(c, edit(l, (d) => d.wires.pop()));
    expect(codes(r)).toEqual(['verify.open']);
    expect(r.faults[0]!.nets).toEqual(['B']);
  });

  it('a wire along the row under R1 joins both its leads: a short', () => {
    const r = verifyLayout(c, edit(l, (d) => d.wires.push({ from: [0, 0], to: [3, 0] })));
    expect(codes(r)).toEqual(['verify.short']);
  });
});
