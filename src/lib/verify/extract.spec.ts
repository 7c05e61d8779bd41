import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import { diffNetlists, expectedNetlist, extractNetlist } from './extract.ts';
import { circuit, divider } from './spec-kit.ts';

const edit = (l: Layout, f: (l: Layout) => void): Layout => {
  const copy = structuredClone(l);
  f(copy);
  return copy;
};
const pins = (list: { ref: string; pin: string }[]) => list.map((p) => `${p.ref}.${p.pin}`);

describe('extractNetlist', () => {
  const { circuit: c, layout: l } = divider();

  it('names each class after the circuit net it matches, in reading order', () => {
    const got = extractNetlist(l, c);
    expect(got.nets.map((n) => [n.name, n.matched, pins(n.pins)])).toEqual([
      ['VCC', true, ['J1.1', 'R1.1']],
      ['MID', true, ['J1.2', 'R1.2', 'R2.1', 'C1.+']],
      ['GND', true, ['J1.3', 'R2.2', 'C1.-']],
    ]);
    expect(got.diff?.same).toBe(true);
  });

  it('without a circuit the classes are N1, N2 … from the top left', () => {
    expect(extractNetlist(l).nets.map((n) => n.name)).toEqual(['N1', 'N2', 'N3']);
    expect(extractNetlist(l).diff).toBeUndefined();
  });

  it('a cut splits a net: the pieces get fresh names and the diff says split', () => {
    const got = extractNetlist(edit(l, (d) => d.cuts.push({ between: [[1, 1], [2, 1]] })), c);
    expect(got.nets.map((n) => n.name)).toEqual(['VCC', 'N1', 'N2', 'GND']);
    expect(got.diff?.split).toEqual([
      {
        net: 'MID',
        groups: [
          { name: 'N1', pins: [{ ref: 'J1', pin: '2' }] },
          { name: 'N2', pins: [{ ref: 'R1', pin: '2' }, { ref: 'R2', pin: '1' }, { ref: 'C1', pin: '+' }] },
        ],
      },
    ]);
  });

  it('a solder bridge merges two nets; an unplaced part leaves its pins missing', () => {
    const got = extractNetlist(
      edit(l, (d) => {
        d.wires.push({ from: [8, 0], to: [8, 1] });
        d.parts = d.parts.filter((p) => p.ref !== 'C1');
      }),
      c,
    );
    expect(got.diff?.merged.map((m) => m.nets)).toEqual([['VCC', 'MID']]);
    expect(got.diff?.missing.map((m) => [m.net, pins(m.pins)])).toEqual([
      ['GND', ['C1.-']],
      ['MID', ['C1.+']],
    ]);
  });

  it('an unconnected lead touching a net shows as extra', () => {
    const c2 = circuit([...c.parts, { ref: 'Q1', kind: 'npn', pinout: 'EBC', pins: { C: 'VCC', B: 'MID' } }]);
    const got = extractNetlist(
      edit(l, (d) => d.parts.push({ ref: 'Q1', footprint: 'to92-EBC', pins: [{ pin: 'E', at: [8, 2] }, { pin: 'B', at: [8, 1] }, { pin: 'C', at: [8, 0] }] })),
      c2,
    );
    expect(got.diff?.extra).toEqual([{ name: 'N1', pins: [{ ref: 'Q1', pin: 'E' }] }]);
    expect(got.nets.find((n) => n.name === 'N1')!.pins).toContainEqual({ ref: 'R2', pin: '2' });
  });
});

describe('diffNetlists', () => {
  it('compares any two netlists by their pins', () => {
    const a = [{ name: 'X', pins: [{ ref: 'R1', pin: '1' }, { ref: 'R2', pin: '1' }] }];
    expect(diffNetlists(a, [{ name: 'Y', pins: [{ ref: 'R2', pin: '1' }, { ref: 'R1', pin: '1' }] }]).same).toBe(true);
    const d = diffNetlists(a, [{ name: 'Y', pins: [{ ref: 'R1', pin: '1' }] }]);
    expect(d.same).toBe(false);
    expect(d.missing).toEqual([{ net: 'X', pins: [{ ref: 'R2', pin: '1' }] }]);
  });

  it('expectedNetlist reads op-amp sections through the packing', () => {
    const c = circuit([{ ref: 'A1', kind: 'opamp', pins: { '+': 'IN', '-': 'OUT', out: 'OUT', 'V+': 'VCC', 'V-': 'GND' } }]);
    const nets = expectedNetlist(c, { parts: [{ ref: 'U1', footprint: 'dip-8', pins: [] }], packing: { A1: { part: 'U1', pins: { '+': '3', '-': '2', out: '1', 'V+': '8', 'V-': '4' } } } });
    expect(nets.map((n) => [n.name, pins(n.pins)])).toEqual([
      ['GND', ['U1.4']],
      ['IN', ['U1.3']],
      ['OUT', ['U1.1', 'U1.2']],
      ['VCC', ['U1.8']],
    ]);
  });
});
