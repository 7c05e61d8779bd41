/**
 * Test support (not exported from the module): a complete hand-made strip-board layout of
 * layouts/bench-buffer.circuit.json, 14 × 8 holes, with a drilled and a scored cut and
 * three links. Worked by hand, strip by strip (component side, rows top to bottom):
 *   A GND (J1.4, R2.2, R3.2)      B OUT (J1.3, link to G)     C IN (J1.2, link to G)
 *   D V+ (J1.1, R1.1, Q1.C)       E BASE (R2.1, Q1.B, link)   F OUT_E (R3.1, Q1.E, C2.+)
 *   G IN left of the drilled cut at G7 (C1.1, link to C) | OUT right of it (C2.−, link to B)
 *   H BASE (C1.2, R1.2, link to E), its unused tail scored off between H10 and H11.
 */
import type { Layout } from '../model/layout.ts';

export function benchBufferLayout(): Layout {
  return {
    format: 'kerfline.layout',
    version: 1,
    board: { kind: 'strip', cols: 14, rows: 8, pitchMm: 2.54 },
    parts: [
      { ref: 'J1', footprint: 'pads-4', pins: [{ pin: '1', at: [0, 3] }, { pin: '2', at: [0, 2] }, { pin: '3', at: [0, 1] }, { pin: '4', at: [0, 0] }] },
      { ref: 'C1', footprint: 'radial-2.54', pins: [{ pin: '1', at: [2, 6] }, { pin: '2', at: [2, 7] }] },
      { ref: 'R2', footprint: 'axial-small', pins: [{ pin: '1', at: [3, 4] }, { pin: '2', at: [3, 0] }] },
      { ref: 'R3', footprint: 'axial-small', pins: [{ pin: '1', at: [5, 5] }, { pin: '2', at: [5, 0] }] },
      { ref: 'R1', footprint: 'axial-small', pins: [{ pin: '1', at: [7, 3] }, { pin: '2', at: [7, 7] }] },
      { ref: 'Q1', footprint: 'to92-CBE', pins: [{ pin: 'C', at: [9, 3] }, { pin: 'B', at: [9, 4] }, { pin: 'E', at: [9, 5] }] },
      { ref: 'C2', footprint: 'ecap-2.54', pins: [{ pin: '+', at: [11, 5] }, { pin: '-', at: [11, 6] }] },
    ],
    cuts: [{ at: [6, 6] }, { between: [[9, 7], [10, 7]] }],
    links: [
      { from: [1, 2], to: [1, 6] },
      { from: [12, 1], to: [12, 6] },
      { from: [8, 4], to: [8, 7] },
    ],
    wires: [],
  };
}
