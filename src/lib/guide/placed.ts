/**
 * Layout parts joined to their design parts, footprints and poses: the one place the guide
 * asks the footprint contract about placed parts (spans, body cells, height classes).
 */
import type { Layout, LayoutPart } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import type { Design, DesignPart } from '../netlist/design.ts';
import { fitPose, type Footprint, type Offset, type Pose } from '../parts/footprint.ts';
import { getFootprint } from '../parts/library.ts';
import { holeLabel } from '../board/labels.ts';
import type { HoleName } from './types.ts';

export interface Placed {
  lp: LayoutPart;
  dp?: DesignPart;
  fp?: Footprint;
  pose?: Pose;
}

export function placedParts(layout: Layout, design: Design): Placed[] {
  const byRef = new Map(design.parts.map((p) => [p.ref, p]));
  return layout.parts.map((lp) => {
    const dp = byRef.get(lp.ref);
    const names = dp?.pinNames ?? lp.pins.map((p) => p.pin);
    const fp = getFootprint(lp.footprint, names);
    const pins: Record<string, Offset> = Object.fromEntries(lp.pins.map((p) => [p.pin, [p.at[0], p.at[1]] as Offset]));
    const pose = fp ? fitPose(fp, pins) : undefined;
    const out: Placed = { lp };
    if (dp) out.dp = dp;
    if (fp) out.fp = fp;
    if (pose) out.pose = pose;
    return out;
  });
}

export function holeName(h: Hole, cols: number): HoleName {
  return { hole: [h[0], h[1]], component: holeLabel(h, 'component', cols), copper: holeLabel(h, 'copper', cols) };
}

/** Natural order of references: R2 before R10. */
export function byRef(a: string, b: string): number {
  return a.localeCompare(b, 'en', { numeric: true });
}
