/**
 * `hasExit(st, net, root, loose, relays = false): boolean` — whether a component of a net
 * has any hole a link could land in or a copper-side wire could leave from. With `loose`,
 * other nets' links and wires count as free (they could be ripped up), so `false` means the
 * island is shut in by pins, bodies and foreign copper for good and rip-up cannot help. With
 * `relays`, a hole where the net could start a relay island (claims.ts) counts as a way out.
 */
import { gapSegOf } from './claims.ts';
import { find, isMulti, segmentHoles, type RouteState } from './state.ts';

export function hasExit(st: RouteState, net: number, root: number, loose: boolean, relays = false): boolean {
  const { cols, rows } = st.copper;
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) if (find(st, s) === root) segmentHoles(st, s, holes);
  for (const h of holes) {
    if (canLand(st, h, net, loose, relays)) return true;
    const x = h % cols;
    const y = (h - x) / cols;
    for (const [nx, ny] of [[x + 1, y], [x - 1, y], [x, y + 1], [x, y - 1]] as const) {
      if (nx < 0 || ny < 0 || nx >= cols || ny >= rows) continue;
      if (canWireInto(st, nx + ny * cols, net, loose, relays)) return true;
    }
  }
  return false;
}

function canLand(st: RouteState, h: number, net: number, loose: boolean, relays: boolean): boolean {
  if (st.pin[h] || (!st.cfg.overBodies && st.body[h])) return false;
  if (!loose && (st.leadNet[h]! >= 0 || st.linkUse[h])) return false;
  return reachable(st, h, net, relays);
}

function canWireInto(st: RouteState, h: number, net: number, loose: boolean, relays: boolean): boolean {
  if (st.pin[h] && st.leadNet[h] !== net) return false;
  if (!loose && st.leadNet[h]! >= 0 && st.leadNet[h] !== net) return false;
  const s = st.cut.segOf[h]!;
  if (s >= 0 && !isMulti(st, s) && loose) return st.owner[s] === -1 || st.owner[s] === net || !st.pin[h];
  return reachable(st, h, net, relays);
}

/** Copper at h the net owns, may claim (its gap side, its relay island, with `relays` a new one), or nobody owns. */
function reachable(st: RouteState, h: number, net: number, relays: boolean): boolean {
  const s = st.cut.segOf[h]!;
  if (s >= 0) return st.owner[s] === net || st.owner[s] === -1;
  return gapSegOf(st, h, net, -1, relays) >= 0;
}
