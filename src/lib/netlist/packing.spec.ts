import { describe, expect, it } from 'vitest';
import type { CircuitInput } from '../model/circuit.ts';
import { CircuitSchema } from '../model/circuit.ts';
import { packageSizes, prepareDesign, type Design } from './index.ts';

function sections(n: number, supply: [string, string][] = []): CircuitInput {
  return {
    format: 'kerfline.circuit',
    version: 1,
    parts: Array.from({ length: n }, (_, i) => {
      const [vp, vn] = supply[i] ?? ['VP', 'VN'];
      return { ref: `OA${i + 1}`, kind: 'opamp' as const, pins: { '+': `P${i + 1}`, '-': `M${i + 1}`, out: `O${i + 1}`, 'V+': vp, 'V-': vn } };
    }),
    nets: { GND: { role: 'ground' } },
  };
}

function design(c: CircuitInput): Design {
  const r = prepareDesign(CircuitSchema.parse(c));
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
  return r.value;
}

// exchange.md "Resolved layout document": dual DIP-8 1 out A, 2 −A, 3 +A, 4 V−, 5 +B, 6 −B,
// 7 out B, 8 V+ (industry-standard pinout, as the contract states it)
const DUAL = [
  { out: '1', '-': '2', '+': '3' },
  { '+': '5', '-': '6', out: '7' },
];
// exchange.md: quad DIP-14 1 out A, 2 −A, 3 +A, 4 V+, 5 +B, 6 −B, 7 out B, 8 out C, 9 −C,
// 10 +C, 11 V−, 12 +D, 13 −D, 14 out D
const QUAD = [
  { out: '1', '-': '2', '+': '3' },
  { '+': '5', '-': '6', out: '7' },
  { out: '8', '-': '9', '+': '10' },
  { '+': '12', '-': '13', out: '14' },
];

describe('op-amp packing', () => {
  it('package sizes: quads while more than two remain, then a dual', () => {
    expect([1, 2, 3, 4, 5, 6, 7, 8, 9].map(packageSizes)).toEqual([[2], [2], [4], [4], [4, 2], [4, 2], [4, 4], [4, 4], [4, 4, 2]]);
  });

  it('two sections fill a dual DIP-8 by the standard pinout', () => {
    const d = design(sections(2));
    const u = d.parts.find((p) => p.ref === 'U1')!;
    expect(u).toMatchObject({ kind: 'ic', package: 'DIP-8', footprint: 'dip-8' });
    DUAL.forEach((m, s) => {
      expect(d.packing![`OA${s + 1}`]).toEqual({ part: 'U1', pins: { ...m, 'V+': '8', 'V-': '4' } });
      expect(u.nets[m['+']]).toBe(`P${s + 1}`);
      expect(u.nets[m['-']]).toBe(`M${s + 1}`);
      expect(u.nets[m.out]).toBe(`O${s + 1}`);
    });
    expect([u.nets['8'], u.nets['4']]).toEqual(['VP', 'VN']);
    expect(d.spares).toEqual({});
  });

  it('four sections fill a quad DIP-14 by the standard pinout', () => {
    const d = design(sections(4));
    const u = d.parts.find((p) => p.ref === 'U1')!;
    expect(u).toMatchObject({ package: 'DIP-14', footprint: 'dip-14' });
    QUAD.forEach((m, s) => expect(d.packing![`OA${s + 1}`]).toEqual({ part: 'U1', pins: { ...m, 'V+': '4', 'V-': '11' } }));
    expect([u.nets['4'], u.nets['11']]).toEqual(['VP', 'VN']);
    // every package pin carries a net: no pin left floating
    expect(Object.keys(u.nets).map(Number).sort((a, b) => a - b)).toEqual(Array.from({ length: 14 }, (_, i) => i + 1));
  });

  it('five sections: a quad and a dual whose spare is a follower with + on ground', () => {
    const d = design(sections(5));
    expect(d.parts.map((p) => `${p.ref}:${p.package}`)).toEqual(['U1:DIP-14', 'U2:DIP-8']);
    expect(d.packing!.OA5).toEqual({ part: 'U2', pins: { ...DUAL[0], 'V+': '8', 'V-': '4' } });
    const u2 = d.parts[1]!;
    // spare B: + (5) to ground, − (6) and out (7) joined = a follower (common practice)
    expect(u2.nets['5']).toBe('GND');
    expect(u2.nets['6']).toBe(u2.nets['7']);
    expect(d.spares).toEqual({ U2: { '5': 'GND', '6': u2.nets['6'], '7': u2.nets['7'] } });
  });

  it('sections on different supplies never share a package', () => {
    const d = design(sections(2, [['VP', 'VN'], ['V9', 'GND']]));
    expect(d.parts).toHaveLength(2);
    expect(new Set(Object.values(d.packing!).map((m) => m.part)).size).toBe(2);
  });

  it('a spare with no ground net to tie to is a problem, not a floating input', () => {
    const c = sections(1);
    c.nets = {};
    const r = prepareDesign(CircuitSchema.parse(c));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.code).toBe('packing.no-ground');
  });
});
