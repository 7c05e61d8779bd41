/**
 * Links (component side) and copper-side wires as bench lists: both end holes named from
 * both sides, the span in mm, and the length of wire to cut — the span plus
 * `LEAD_ALLOWANCE_MM` at each end to pass through the board and bend over (common practice).
 * A link that is not straight, or crosses a pin, is an insulated wire (the router's last
 * resort), as are two otherwise bare links that cross: marked, and cut to its row-plus-column
 * span (laid along the grid).
 */
import type { Layout, Segment } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import type { Scene } from '../render/index.ts';
import { holeName } from './placed.ts';
import type { SegmentItem } from './types.ts';

export const LEAD_ALLOWANCE_MM = 5;

/** Holes a straight copper-side wire passes over, ends included. */
export function wireHolesOf(from: Hole, to: Hole): Hole[] {
  if (from[0] !== to[0] && from[1] !== to[1]) return [from, to];
  const n = Math.max(Math.abs(to[0] - from[0]), Math.abs(to[1] - from[1]));
  const dx = Math.sign(to[0] - from[0]);
  const dy = Math.sign(to[1] - from[1]);
  return Array.from({ length: n + 1 }, (_, k) => [from[0] + k * dx, from[1] + k * dy] as Hole);
}

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

/**
 * Which links must be insulated wire: a bare link is straight (one row or column) and passes
 * over no pin; a link that is bent or crosses a pin is insulated (the router's last resort,
 * or a hand-made one). Two links that would be bare but cross or share a hole would touch:
 * both are insulated. A bare link crossing an insulated one stays bare (the sleeve parts them).
 */
function insulatedLinks(layout: Layout): boolean[] {
  const key = (h: Hole) => `${h[0]},${h[1]}`;
  const pins = new Set(layout.parts.flatMap((p) => p.pins.map((q) => key(q.at))));
  const self = layout.links.map((l) => (l.from[0] !== l.to[0] && l.from[1] !== l.to[1]) || wireHolesOf(l.from, l.to).slice(1, -1).some((h) => pins.has(key(h))));
  const covered = layout.links.map((l) => new Set(wireHolesOf(l.from, l.to).map(key)));
  return layout.links.map((l, i) => self[i]! || wireHolesOf(l.from, l.to).some((h) => covered.some((c, j) => j !== i && !self[j] && c.has(key(h)))));
}

/** Nets are read off the scene, which joined the copper already. */
export function linkList(layout: Layout, scene: Scene): SegmentItem[] {
  const insulated = insulatedLinks(layout);
  return layout.links.map((l, i) => item('link', l, i, layout, scene.links[i]?.net, LEAD_ALLOWANCE_MM, insulated[i]));
}

/** Copper-side wires lie on the pads: only their ends are bent, so a smaller allowance. */
export function wireList(layout: Layout, scene: Scene): SegmentItem[] {
  return layout.wires.map((w, i) => item('wire', w, i, layout, scene.wires[i]?.net, LEAD_ALLOWANCE_MM / 2));
}
