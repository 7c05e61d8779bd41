/**
 * Test support: a small circuit and its placement written side by side, one entry per part
 * with each pin's net (null: unconnected) and hole. Fails loudly on a bad test circuit.
 */
import type { Board, Circuit, CircuitPart, Layout } from '../../model/index.ts';
import { prepareDesign, type Design } from '../../netlist/index.ts';

export interface HandPart extends Omit<CircuitPart, 'pins'> {
  pins: Record<string, [string | null, number, number]>;
}

export interface HandCase {
  circuit: Circuit;
  design: Design;
  placement: Layout;
}

export function handCase(board: Board, parts: HandPart[]): HandCase {
  const circuitParts: CircuitPart[] = parts.map(({ pins, ...rest }) => ({
    ...rest,
    pins: Object.fromEntries(Object.entries(pins).flatMap(([pin, [net]]) => (net === null ? [] : [[pin, net]]))),
  }));
  const circuit: Circuit = { format: 'kerfline.circuit', version: 1, title: 'hand case', parts: circuitParts, nets: {} };
  const design = prepareDesign(circuit);
  if (!design.ok) throw new Error(`hand case: ${design.problems.map((p) => p.message).join('; ')}`);
  const placement: Layout = {
    format: 'kerfline.layout',
    version: 1,
    board,
    parts: parts.map((p) => ({
      ref: p.ref,
      footprint: design.value.parts.find((d) => d.ref === p.ref)!.footprint,
      pins: Object.entries(p.pins).map(([pin, [, x, y]]) => ({ pin, at: [x, y] as [number, number] })),
    })),
    cuts: [],
    links: [],
    wires: [],
  };
  return { circuit, design: design.value, placement };
}

/** A resistor standing across strips in column x, from row y1 to row y2. */
export function resistor(ref: string, x: number, y1: number, net1: string, y2: number, net2: string): HandPart {
  return { ref, kind: 'resistor', pins: { '1': [net1, x, y1], '2': [net2, x, y2] } };
}
