import { describe, expect, it } from 'vitest';
import type { CircuitPart } from '../model/index.ts';
import { checkPart, defaultFootprintName, footprintFor, leadOrder, partPinNames } from './index.ts';

const part = (p: Partial<CircuitPart> & Pick<CircuitPart, 'kind' | 'pins'>): CircuitPart => ({ ref: 'X1', ...p }) as CircuitPart;
const codes = (p: CircuitPart) => checkPart(p, ['parts', 0]).map((x) => x.code);

describe('part kinds', () => {
  it('binds every kind the exchange contract lists to a footprint', () => {
    expect(footprintFor(part({ kind: 'resistor', pins: { '1': 'a', '2': 'b' } }))!.name).toBe('axial-small');
    expect(footprintFor(part({ kind: 'capacitor', polarized: true, pins: { '+': 'a', '-': 'b' } }))!.marks.plus).toBe('+');
    expect(footprintFor(part({ kind: 'diode', pins: { A: 'a', K: 'b' } }))!.marks.cathode).toBe('K');
    expect(footprintFor(part({ kind: 'npn', pinout: 'ebc', pins: { C: 'a', B: 'b', E: 'c' } }))!.name).toBe('to92-EBC');
    expect(footprintFor(part({ kind: 'ic', package: 'DIP-14', pins: { '1': 'a' } }))!.pinNames).toHaveLength(14);
    expect(footprintFor(part({ kind: 'pads', count: 3, pins: { '1': 'a' } }))!.name).toBe('pads-3');
    expect(footprintFor(part({ kind: 'trimmer', pins: { '1': 'a', W: 'b', '3': 'c' } }))!.pinNames).toEqual(['1', 'W', '3']);
    expect(defaultFootprintName(part({ kind: 'opamp', pins: {} }))).toBeUndefined();
  });

  it('states a defaulted lead order loudly', () => {
    expect(leadOrder(part({ kind: 'npn', pins: {} }))).toEqual({ order: 'EBC', defaulted: true });
    expect(leadOrder(part({ kind: 'pnp', pinout: 'CBE', pins: {} }))).toEqual({ order: 'CBE', defaulted: false });
  });

  it('rejects a two-lead part with an open lead (exchange.md)', () => {
    expect(codes(part({ kind: 'resistor', pins: { '1': 'a' } }))).toContain('part.open-lead');
    expect(codes(part({ kind: 'npn', pins: { C: 'a', B: 'b' } }))).toEqual([]); // open lead allowed on transistors
  });

  it('names unknown pins, bad pinouts and missing packages', () => {
    expect(codes(part({ kind: 'diode', pins: { A: 'a', C: 'b' } }))).toEqual(expect.arrayContaining(['part.unknown-pin', 'part.open-lead']));
    expect(codes(part({ kind: 'npn', pinout: 'EBB', pins: { C: 'a', B: 'b', E: 'c' } }))).toContain('part.bad-pinout');
    expect(codes(part({ kind: 'ic', pins: { '1': 'a' } }))).toContain('part.no-package');
    expect(codes(part({ kind: 'resistor', footprint: 'dip-8', pins: { '1': 'a', '2': 'b' } }))).toContain('part.footprint-pins');
    expect(codes(part({ kind: 'resistor', footprint: 'nonesuch', pins: { '1': 'a', '2': 'b' } }))).toContain('part.unknown-footprint');
    expect(codes(part({ kind: 'resistor', span: { min: 20, max: 30 }, pins: { '1': 'a', '2': 'b' } }))).toContain('part.span-range');
  });

  it('lists all pins of an IC, connected or not', () => {
    expect(partPinNames(part({ kind: 'ic', package: 'DIP-8', pins: {} }))).toEqual(['1', '2', '3', '4', '5', '6', '7', '8']);
  });
});
