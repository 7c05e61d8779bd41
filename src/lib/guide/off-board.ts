/**
 * Off-board wiring: for every part whose footprint is off-board (pads, headers), each pad
 * with its hole, its net and what it goes to off the board (the part's `labels`).
 */
import { holeName, type Placed } from './placed.ts';
import type { OffBoardPart } from './types.ts';

export function offBoardList(placed: Placed[], cols: number): OffBoardPart[] {
  const out: OffBoardPart[] = [];
  for (const p of placed) {
    if (p.fp?.height !== 'offboard') continue;
    const order = p.fp.pinNames;
    const pins = [...p.lp.pins].sort((a, b) => order.indexOf(a.pin) - order.indexOf(b.pin));
    const part: OffBoardPart = {
      ref: p.lp.ref,
      pads: pins.map((q) => {
        const pad: OffBoardPart['pads'][number] = { pin: q.pin, hole: holeName(q.at, cols) };
        const net = p.dp?.nets[q.pin];
        if (net !== undefined) pad.net = net;
        const label = p.dp?.labels?.[q.pin];
        if (label !== undefined) pad.label = label;
        return pad;
      }),
    };
    const value = p.dp?.value ?? p.lp.value;
    if (value !== undefined) part.value = value;
    out.push(part);
  }
  return out;
}
