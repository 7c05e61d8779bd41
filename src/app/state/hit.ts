/**
 * What lies under a hole: `occupancy(layout, pinOrders?)` → Occupancy, a map from hole
 * index (col + row × cols) to the part whose lead or body is there. Leads win over bodies
 * (a lead hole is where a click most likely means that part); among bodies the part listed
 * later wins, as it is drawn on top. `pinOrders` gives each ref's pin order for two-lead
 * footprints (see edits.ts); parts whose pins do not fit their footprint count by leads only.
 */
import type { Layout } from '../../lib/model/index.ts';
import { fitPose, getFootprint, poseBody, type Offset } from '../../lib/parts/index.ts';

export interface Occupancy {
  cols: number;
  rows: number;
  /** hole index → ref */
  at: Map<number, string>;
  /** hole index → ref and pin, for lead holes only */
  leads: Map<number, { ref: string; pin: string }>;
}

export function occupancy(layout: Layout, pinOrders?: ReadonlyMap<string, readonly string[]>): Occupancy {
  const { cols, rows } = layout.board;
  const at = new Map<number, string>();
  const leads = new Map<number, { ref: string; pin: string }>();
  const inside = (h: readonly number[]) => h[0]! >= 0 && h[1]! >= 0 && h[0]! < cols && h[1]! < rows;
  for (const part of layout.parts) {
    const fp = getFootprint(part.footprint, pinOrders?.get(part.ref) ?? part.pins.map((p) => p.pin));
    const pose = fp && fitPose(fp, Object.fromEntries(part.pins.map((p) => [p.pin, [p.at[0], p.at[1]] as Offset])));
    if (fp && pose) for (const h of poseBody(fp, pose)) if (inside(h)) at.set(h[0] + h[1] * cols, part.ref);
  }
  for (const part of layout.parts)
    for (const p of part.pins)
      if (inside(p.at)) {
        const i = p.at[0] + p.at[1] * cols;
        at.set(i, part.ref);
        leads.set(i, { ref: part.ref, pin: p.pin });
      }
  return { cols, rows, at, leads };
}

export function partAt(occ: Occupancy, hole: readonly [number, number]): string | undefined {
  if (hole[0] < 0 || hole[1] < 0 || hole[0] >= occ.cols || hole[1] >= occ.rows) return undefined;
  return occ.at.get(hole[0] + hole[1] * occ.cols);
}

export function leadAt(occ: Occupancy, hole: readonly [number, number]): { ref: string; pin: string } | undefined {
  if (hole[0] < 0 || hole[1] < 0 || hole[0] >= occ.cols || hole[1] >= occ.rows) return undefined;
  return occ.leads.get(hole[0] + hole[1] * occ.cols);
}
