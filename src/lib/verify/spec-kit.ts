/**
 * Small builders for the verifier's tests: circuits and layouts written tersely, checked
 * against the schemas so defaults are filled in as a real document would have them.
 */
import { CircuitSchema, LayoutSchema, type Circuit, type CircuitInput, type Layout, type LayoutInput } from '../model/index.ts';
import type { VerifyReport } from './types.ts';

export type XY = [number, number];

export function circuit(parts: CircuitInput['parts'], nets: CircuitInput['nets'] = {}): Circuit {
  return CircuitSchema.parse({ format: 'kerfline.circuit', version: 1, title: 'test', parts, nets });
}

export function layout(board: LayoutInput['board'], parts: { ref: string; footprint: string; pins: Record<string, XY> }[], extra: Partial<LayoutInput> = {}): Layout {
  return LayoutSchema.parse({
    format: 'kerfline.layout',
    version: 1,
    board,
    parts: parts.map((p) => ({ ref: p.ref, footprint: p.footprint, pins: Object.entries(p.pins).map(([pin, at]) => ({ pin, at })) })),
    ...extra,
  });
}

export function codes(r: VerifyReport): string[] {
  return r.faults.map((f) => f.code);
}

export function warningCodes(r: VerifyReport): string[] {
  return r.warnings.map((f) => f.code);
}

/** A small clean strip-board job: supply, a divider and a reservoir capacitor, three pads. */
export function divider(): { circuit: Circuit; layout: Layout } {
  const c = circuit(
    [
      { ref: 'R1', kind: 'resistor', value: '10k', footprint: 'upright', pins: { '1': 'VCC', '2': 'MID' } },
      { ref: 'R2', kind: 'resistor', value: '10k', footprint: 'upright', pins: { '1': 'MID', '2': 'GND' } },
      { ref: 'C1', kind: 'capacitor', value: '10u', polarized: true, pins: { '+': 'MID', '-': 'GND' } },
      { ref: 'J1', kind: 'pads', count: 3, pins: { '1': 'VCC', '2': 'MID', '3': 'GND' } },
    ],
    { GND: { role: 'ground' } },
  );
  const l = layout({ kind: 'strip', cols: 10, rows: 4 }, [
    { ref: 'J1', footprint: 'pads-3', pins: { '1': [0, 0], '2': [0, 1], '3': [0, 2] } },
    { ref: 'R1', footprint: 'upright', pins: { '1': [2, 0], '2': [2, 1] } },
    { ref: 'R2', footprint: 'upright', pins: { '1': [4, 1], '2': [4, 2] } },
    { ref: 'C1', footprint: 'ecap-2.54', pins: { '+': [6, 1], '-': [6, 2] } },
  ]);
  return { circuit: c, layout: l };
}
