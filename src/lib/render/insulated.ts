/**
 * `insulatedLinks(layout): boolean[]` — which links of a layout must be insulated wire,
 * read off the geometry alone (the exchange document has no flag for it): a bare link is
 * straight (one row or column) and passes over no pin; a link that is bent or crosses a pin
 * is insulated (the router's last resort, or a hand-made one). Two links that would be bare
 * but cross or share a hole would touch: both are insulated. A bare link crossing an
 * insulated one stays bare (the sleeve parts them). The drawing sleeves them and the bench
 * guide lists them as such. Holes off the board count for nothing (the verifier reports
 * them). One pass over the links' holes with a count per hole: cheap enough for every edit.
 * `lineHoles(from, to)`: the holes a straight run passes over, ends included (both ends only
 * when it is not straight).
 * `insulatedNotes(layout)`: a `layout.insulated-link` warning per such link, for any layout
 * (planned, hand-edited or opened), naming its holes from both sides.
 */
import { holeLabelBoth } from '../board/labels.ts';
import type { Layout, Segment } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';

export function lineHoles(from: Hole, to: Hole): Hole[] {
  if (from[0] !== to[0] && from[1] !== to[1]) return [from, to];
  const n = Math.max(Math.abs(to[0] - from[0]), Math.abs(to[1] - from[1]));
  const dx = Math.sign(to[0] - from[0]);
  const dy = Math.sign(to[1] - from[1]);
  return Array.from({ length: n + 1 }, (_, k) => [from[0] + k * dx, from[1] + k * dy] as Hole);
}

export function insulatedLinks(layout: Pick<Layout, 'parts' | 'links' | 'board'>): boolean[] {
  const { cols, rows } = layout.board;
  const on = (x: number, y: number) => x >= 0 && x < cols && y >= 0 && y < rows;
  const pins = new Uint8Array(cols * rows);
  for (const p of layout.parts) for (const q of p.pins) if (on(q.at[0], q.at[1])) pins[q.at[0] + q.at[1] * cols] = 1;
  /** Whether `test` holds for a hole on the board along a straight link (ends included when `ends`). */
  const along = (l: Segment, ends: boolean, test: (i: number) => boolean): boolean => {
    const n = Math.max(Math.abs(l.to[0] - l.from[0]), Math.abs(l.to[1] - l.from[1]));
    const dx = Math.sign(l.to[0] - l.from[0]);
    const dy = Math.sign(l.to[1] - l.from[1]);
    for (let k = ends ? 0 : 1; k <= (ends ? n : n - 1); k++) {
      const [x, y] = [l.from[0] + k * dx, l.from[1] + k * dy];
      if (on(x, y) && test(x + y * cols)) return true;
    }
    return false;
  };
  const self = layout.links.map((l) => (l.from[0] !== l.to[0] && l.from[1] !== l.to[1]) || along(l, false, (i) => pins[i] === 1));
  // How many would-be bare links lie over each hole: a second one means they touch.
  const bare = new Uint16Array(cols * rows);
  layout.links.forEach((l, i) => {
    if (!self[i]) along(l, true, (h) => (bare[h]!++, false));
  });
  return layout.links.map((l, i) => self[i]! || along(l, true, (h) => bare[h]! > 1));
}

export function insulatedNotes(layout: Pick<Layout, 'parts' | 'links' | 'board'>): Problem[] {
  const out: Problem[] = [];
  insulatedLinks(layout).forEach((yes, i) => {
    if (!yes) return;
    const l = layout.links[i]!;
    const [a, b] = [holeLabelBoth(l.from, layout.board.cols), holeLabelBoth(l.to, layout.board.cols)];
    out.push({
      code: 'layout.insulated-link',
      severity: 'warning',
      path: ['links', i],
      message: `link ${i + 1} from ${a} to ${b} must be insulated wire: it is bent, or passes over a pin or another link`,
      hint: 'use sleeved hook-up wire and fit it after the parts it lies over',
      holes: [l.from, l.to],
    });
  });
  return out;
}
