/**
 * The cut list as the builder works it: board turned over, copper side up. Cuts are grouped
 * by row (top to bottom) and ordered by copper-side column, left to right; each names the
 * hole as read from the copper side (columns mirrored) with the component-side label beside.
 */
import type { Scene } from '../render/index.ts';
import { rowLabel } from '../board/labels.ts';
import type { CutItem, CutRow } from './types.ts';

export function cutList(copperScene: Scene): CutRow[] {
  const rows = new Map<number, { x: number; item: CutItem }[]>();
  for (const c of copperScene.cuts) {
    const row = Math.min(...c.holes.map((h) => h[1]));
    const x = c.style === 'drilled' ? c.x : (c.x1 + c.x2) / 2;
    const entry = { x, item: { id: `X${c.index + 1}`, style: c.style, copper: c.sideLabel, component: c.label } };
    (rows.get(row) ?? rows.set(row, []).get(row)!).push(entry);
  }
  return [...rows.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([row, list]) => ({ row: rowLabel(row), items: list.sort((a, b) => a.x - b.x).map((e) => e.item) }));
}
