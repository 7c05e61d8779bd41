import { describe, expect, it } from 'vitest';
import { CircuitSchema, type Layout } from '../model/index.ts';
import { prepareDesign } from '../netlist/design.ts';
import { designForLayout } from './layout-design.ts';

const circuit = CircuitSchema.parse({
  format: 'kerfline.circuit',
  version: 1,
  parts: [
    { ref: 'UA', kind: 'opamp', value: 'op-amp', pins: { '+': 'IN', '-': 'FB', out: 'OUT', 'V+': 'VP', 'V-': 'GND' } },
    { ref: 'UB', kind: 'opamp', value: 'op-amp', pins: { '+': 'OUT', '-': 'B', out: 'B', 'V+': 'VP', 'V-': 'GND' } },
  ],
  nets: { GND: { role: 'ground' } },
});

describe('designForLayout', () => {
  it('reads package nets through the layout packing when it names its own packages', () => {
    const d = prepareDesign(circuit);
    if (!d.ok) throw new Error('design');
    const pins = Array.from({ length: 8 }, (_, i) => ({ pin: String(i + 1), at: (i < 4 ? [0, i] : [3, 7 - i]) as [number, number] }));
    // the layout packs UA as section B and UB as section A of a package it calls U7
    const layout: Layout = {
      format: 'kerfline.layout',
      version: 1,
      board: { kind: 'strip', cols: 6, rows: 5, pitchMm: 2.54 },
      parts: [{ ref: 'U7', footprint: 'dip-8', package: 'DIP-8', pins }],
      cuts: [],
      links: [],
      wires: [],
      packing: {
        UA: { part: 'U7', pins: { '+': '5', '-': '6', out: '7', 'V+': '8', 'V-': '4' } },
        UB: { part: 'U7', pins: { '+': '3', '-': '2', out: '1', 'V+': '8', 'V-': '4' } },
      },
    };
    const out = designForLayout(d.value, circuit, layout);
    expect(out.parts.map((p) => p.ref)).toEqual(['U7']);
    expect(out.parts[0]!.nets).toEqual({ '1': 'B', '2': 'B', '3': 'OUT', '4': 'GND', '5': 'IN', '6': 'FB', '7': 'OUT', '8': 'VP' });
    // without a packing map the design stands as prepared
    expect(designForLayout(d.value, circuit, { ...layout, packing: undefined })).toBe(d.value);
  });
});
