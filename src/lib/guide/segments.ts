/**
 * Links (component side) and copper-side wires as bench lists: both end holes named from
 * both sides, the span in mm, and the length of wire to cut — the span plus
 * `LEAD_ALLOWANCE_MM` at each end to pass through the board and bend over (common practice).
 * A link that must be insulated wire (the scene's flag, render/insulated.ts: bent, over a pin,
 * or two otherwise bare links that cross) is marked, and cut to its row-plus-column span
 * (laid along the grid).
 */
import type { Layout, Segment } from '../model/layout.ts';
import type { Scene } from '../render/index.ts';
import { holeName } from './placed.ts';
import type { SegmentItem } from './types.ts';

export const LEAD_ALLOWANCE_MM = 5;

function item(kind: 'link' | 'wire', s: Segment, i: number, layout: Layout, net: string | undefined, allowance: number, insulated = false): SegmentItem {
  const [dx, dy] = [Math.abs(s.to[0] - s.from[0]), Math.abs(s.to[1] - s.from[1])];
  const span = Math.hypot(dx, dy) * layout.board.pitchMm;
  // An insulated link is laid along the grid, not across it: cut it to the row-plus-column span.
  const laid = insulated ? (dx + dy) * layout.board.pitchMm : span;
  const out: SegmentItem = {
    id: `${kind === 'link' ? 'L' : 'W'}${i + 1}`,
    from: holeName(s.from, layout.board.cols),
    to: holeName(s.to, layout.board.cols),
    lengthMm: Math.round(span * 100) / 100,
    cutMm: Math.ceil(laid + 2 * allowance),
  };
  if (net !== undefined) out.net = net;
  if (insulated) out.insulated = true;
  return out;
}

/** Nets, and which links must be insulated wire, are read off the scene (drawScene worked them out already). */
export function linkList(layout: Layout, scene: Scene): SegmentItem[] {
  return layout.links.map((l, i) => item('link', l, i, layout, scene.links[i]?.net, LEAD_ALLOWANCE_MM, scene.links[i]?.insulated ?? false));
}

/** Copper-side wires lie on the pads: only their ends are bent, so a smaller allowance. */
export function wireList(layout: Layout, scene: Scene): SegmentItem[] {
  return layout.wires.map((w, i) => item('wire', w, i, layout, scene.wires[i]?.net, LEAD_ALLOWANCE_MM / 2));
}
