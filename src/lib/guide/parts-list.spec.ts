import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import type { Design, DesignPart } from '../netlist/design.ts';
import { partsList } from './parts-list.ts';
import { placedParts } from './placed.ts';

/** Parts laid in a column, each across 4 holes (no verification needed for the list itself). */
function setup(parts: { ref: string; kind: DesignPart['kind']; value: string; footprint?: string; pins?: [string, string] }[]) {
  const design: Design = { title: 't', nets: [], parts: [] };
  const layout: Layout = { format: 'kerfline.layout', version: 1, board: { kind: 'strip', cols: 10, rows: 40, pitchMm: 2.54 }, parts: [], cuts: [], links: [], wires: [] };
  parts.forEach((p, i) => {
    const pins = p.pins ?? ['1', '2'];
    const footprint = p.footprint ?? (p.kind === 'resistor' ? 'axial-small' : 'radial-2.54');
    const span = footprint === 'axial-small' ? 4 : 1;
    design.parts.push({ ref: p.ref, kind: p.kind, value: p.value, footprint, pinNames: pins, nets: { [pins[0]]: `a${i}`, [pins[1]]: `b${i}` }, polarized: false, source: [i] });
    layout.parts.push({ ref: p.ref, footprint, pins: [{ pin: pins[0], at: [0, i] }, { pin: pins[1], at: [span, i] }] });
  });
  return partsList(placedParts(layout, design), 2.54);
}

describe('partsList', () => {
  it('writes colour bands that match the IEC 60062 worked examples', () => {
    // check-values §1a worked examples [D from the colour table]
    const list = setup([
      { ref: 'R1', kind: 'resistor', value: '220R' },
      { ref: 'R2', kind: 'resistor', value: '4k7' },
      { ref: 'R3', kind: 'resistor', value: '100k' },
      { ref: 'R4', kind: 'resistor', value: '1M' },
      { ref: 'R5', kind: 'resistor', value: '10R' },
      { ref: 'R6', kind: 'resistor', value: '49k9' },
    ]);
    const bands = Object.fromEntries(list.map((g) => [g.value, [g.bands4?.join(' '), g.bands5?.join(' ')]]));
    expect(bands['220R']![0]).toBe('red red brown gold');
    expect(bands['4k7']).toEqual(['yellow violet red gold', 'yellow violet black brown brown']);
    expect(bands['100k']).toEqual(['brown black yellow gold', 'brown black black orange brown']);
    expect(bands['1M']![0]).toBe('brown black green gold');
    expect(bands['10R']).toEqual(['brown black black gold', 'brown black black gold brown']);
    // 49.9 kΩ needs three digits: no 4-band form, 5 bands yellow white white red brown
    expect(bands['49k9']).toEqual([undefined, 'yellow white white red brown']);
    // sorted by value within a kind
    expect(list.map((g) => g.value)).toEqual(['10R', '220R', '4k7', '49k9', '100k', '1M']);
  });

  it('writes three-digit capacitor codes that match the check values', () => {
    // check-values §1c: 101 = 100 pF, 102 = 1 nF, 222 = 2.2 nF, 103 = 10 nF, 473 = 47 nF, 104 = 100 nF, 105 = 1 µF
    const list = setup([
      { ref: 'C1', kind: 'capacitor', value: '100p' },
      { ref: 'C2', kind: 'capacitor', value: '1n' },
      { ref: 'C3', kind: 'capacitor', value: '2n2' },
      { ref: 'C4', kind: 'capacitor', value: '10nF' },
      { ref: 'C5', kind: 'capacitor', value: '47n' },
      { ref: 'C6', kind: 'capacitor', value: '100n' },
      { ref: 'C7', kind: 'capacitor', value: '1u' },
    ]);
    expect(list.map((g) => [g.value, g.capCode])).toEqual([
      ['100p', '101'],
      ['1n', '102'],
      ['2n2', '222'],
      ['10n', '103'],
      ['47n', '473'],
      ['100n', '104'],
      ['1u', '105'],
    ]);
    // "10nF" was written differently from its IEC form; the list keeps both
    expect(list.find((g) => g.value === '10n')!.written).toBe('10nF');
  });

  it('groups equal values, sorts refs naturally and states the lead spacing', () => {
    const list = setup([
      { ref: 'R10', kind: 'resistor', value: '10k' },
      { ref: 'R2', kind: 'resistor', value: '10k' },
      { ref: 'D1', kind: 'diode', value: '1N4148', footprint: 'do35', pins: ['A', 'K'] },
    ]);
    expect(list).toHaveLength(2);
    expect(list[0]).toMatchObject({ value: '10k', count: 2, refs: ['R2', 'R10'], leadSpacing: '10.16 mm (4 holes)', footprint: 'axial-small' });
    expect(list[1]).toMatchObject({ value: '1N4148', kind: 'diode', polarity: 'the band marks the cathode (K)' });
    expect(list[1]!.bands4).toBeUndefined();
  });
});
