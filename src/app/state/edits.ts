/**
 * Part edits on a layout document: move, turn, lock. Each returns a fresh layout (the
 * input is never mutated, so the edit history can share snapshots) and leaves cuts, links
 * and wires as they were: the caller re-routes afterwards.
 *
 * - `movePart(layout, ref, [dx, dy])` shifts every pin of `ref`, then pulls the part back
 *   inside the board if the shift pushed a pin off it.
 * - `turnPart(layout, ref, pinOrder?)` turns `ref` a quarter turn clockwise about its
 *   middle, to the next turn its footprint allows; a part whose pins no longer fit its
 *   footprint (hand-edited file) stays put and the result says why.
 * - `toggleLock(layout, ref)` flips `locked` (auto-place keeps locked parts where they are).
 * `pinOrder` is the design part's pin order (two-lead footprints take names from the part);
 * by default the order the layout lists the pins in.
 */
import type { Board, Layout, LayoutPart } from '../../lib/model/index.ts';
import { fitPose, getFootprint, posePins, type Footprint, type Offset } from '../../lib/parts/index.ts';

export type EditResult = { ok: true; layout: Layout } | { ok: false; why: string };

function replacePart(layout: Layout, ref: string, change: (p: LayoutPart) => LayoutPart): Layout {
  return { ...layout, parts: layout.parts.map((p) => (p.ref === ref ? change(p) : p)) };
}

/** The shift that brings every hole inside the board (0 when already inside). */
export function shiftInside(board: Pick<Board, 'cols' | 'rows'>, holes: readonly Offset[]): Offset {
  if (holes.length === 0) return [0, 0];
  const xs = holes.map((h) => h[0]);
  const ys = holes.map((h) => h[1]);
  const fix = (lo: number, hi: number, size: number): number => (lo < 0 ? -lo : hi > size - 1 ? Math.max(size - 1 - hi, -lo) : 0);
  return [fix(Math.min(...xs), Math.max(...xs), board.cols), fix(Math.min(...ys), Math.max(...ys), board.rows)];
}

export function movePart(layout: Layout, ref: string, delta: Offset): EditResult {
  const part = layout.parts.find((p) => p.ref === ref);
  if (!part) return { ok: false, why: `no part ${ref} on the board` };
  const moved = part.pins.map((p) => [p.at[0] + delta[0], p.at[1] + delta[1]] as Offset);
  const back = shiftInside(layout.board, moved);
  return {
    ok: true,
    layout: replacePart(layout, ref, (p) => ({ ...p, pins: p.pins.map((pin, i) => ({ pin: pin.pin, at: [moved[i]![0] + back[0], moved[i]![1] + back[1]] })) })),
  };
}

function footprintOf(part: LayoutPart, pinOrder?: readonly string[]): Footprint | undefined {
  return getFootprint(part.footprint, pinOrder ?? part.pins.map((p) => p.pin));
}

export function turnPart(layout: Layout, ref: string, pinOrder?: readonly string[]): EditResult {
  const part = layout.parts.find((p) => p.ref === ref);
  if (!part) return { ok: false, why: `no part ${ref} on the board` };
  const fp = footprintOf(part, pinOrder);
  if (!fp) return { ok: false, why: `${ref}: footprint ${part.footprint} is not in the library` };
  const pose = fitPose(fp, Object.fromEntries(part.pins.map((p) => [p.pin, [p.at[0], p.at[1]] as Offset])));
  if (!pose) return { ok: false, why: `${ref}: its pins do not keep the shape of ${part.footprint}, so it cannot be turned` };
  const turns = [...fp.rotations].sort((a, b) => a - b);
  const next = turns.find((r) => r > pose.rotation) ?? turns[0]!;
  if (next === pose.rotation) return { ok: false, why: `${ref}: ${part.footprint} has only one allowed turn` };
  const placed = posePins(fp, { ...pose, rotation: next });
  // Keep the middle of the pins where it was, so the part turns in place.
  const mid = (list: readonly Offset[], k: 0 | 1) => list.reduce((s, h) => s + h[k], 0) / list.length;
  const oldAt = part.pins.map((p) => p.at as Offset);
  const newAt = placed.map((p) => p.at);
  const dx = Math.round(mid(oldAt, 0) - mid(newAt, 0));
  const dy = Math.round(mid(oldAt, 1) - mid(newAt, 1));
  const shifted = newAt.map((h) => [h[0] + dx, h[1] + dy] as Offset);
  const back = shiftInside(layout.board, shifted);
  const pins = placed.map((p, i) => ({ pin: p.pin, at: [shifted[i]![0] + back[0], shifted[i]![1] + back[1]] as [number, number] }));
  return { ok: true, layout: replacePart(layout, ref, (p) => ({ ...p, pins, rotation: next })) };
}

export function toggleLock(layout: Layout, ref: string): EditResult {
  if (!layout.parts.some((p) => p.ref === ref)) return { ok: false, why: `no part ${ref} on the board` };
  return {
    ok: true,
    layout: replacePart(layout, ref, (p) => {
      const { locked, ...rest } = p;
      return locked ? rest : { ...rest, locked: true };
    }),
  };
}
