/** Small hand-made layouts for the app's unit tests (not shipped in the bundle). */
import type { Layout } from '../../lib/model/index.ts';

/** A 12×10 strip board: R1 across four holes on row B, Q1 (TO-92, CBE) on row E, U1 a DIP-8. */
export function smallLayout(): Layout {
  return {
    format: 'kerfline.layout',
    version: 1,
    board: { kind: 'strip', cols: 12, rows: 10, pitchMm: 2.54 },
    parts: [
      { ref: 'R1', footprint: 'axial-small', pins: [{ pin: '1', at: [1, 1] }, { pin: '2', at: [5, 1] }] },
      { ref: 'Q1', footprint: 'to92-CBE', pins: [{ pin: 'C', at: [2, 4] }, { pin: 'B', at: [3, 4] }, { pin: 'E', at: [4, 4] }] },
      {
        ref: 'U1',
        footprint: 'dip-8',
        pins: [1, 2, 3, 4, 5, 6, 7, 8].map((n) => ({ pin: String(n), at: (n <= 4 ? [7, 5 + n] : [10, 14 - n]) as [number, number] })),
      },
    ],
    cuts: [{ at: [3, 1] }],
    links: [],
    wires: [],
  };
}
