/**
 * `linkShortfall(state): number` — on a board whose strips run along the rows, how many
 * links a greedy link plan cannot place: the nets' segments are joined by straight links
 * (column or row), shortest first, each link landing in free holes of its two segments and
 * crossing only free holes, no two links sharing a hole. The count of joins still missing
 * is the estimate of what a router would fail to route. It is rebuilt from scratch over
 * the parts' box and a margin of MARGIN holes (O(holes) per call), so the placer uses it
 * for small designs and to polish a placement on its final board.
 */
import type { PlaceState } from './state.ts';

interface Plan {
  a: number[];
  b: number[];
  ra: number[];
  rb: number[];
}

/** Holes round the parts' box that links may still use. */
const MARGIN = 2;

export function linkShortfall(s: PlaceState): number {
  return linkPlan(s).missing;
}

/** The nets the greedy link plan leaves in pieces, and how many joins are missing. */
export function linkPlan(s: PlaceState): { missing: number; nets: number[] } {
  if (!s.map.alongRows) return { missing: 0, nets: [] };
  const box = s.bounds();
  if (!box) return { missing: 0, nets: [] };
  const t = s.tally;
  const { W, H } = s;
  const X0 = Math.max(0, box.x0 - MARGIN);
  const X1 = Math.min(W - 1, box.x1 + MARGIN);
  const Y0 = Math.max(0, box.y0 - MARGIN);
  const Y1 = Math.min(H - 1, box.y1 + MARGIN);
  const runNet: number[] = [];
  const need = new Uint8Array(s.problem.nets.length);
  // Per row, the runs in order with the holes they may use (gaps count for both sides).
  const rowRuns: { id: number; lo: number; hi: number }[][] = [];
  for (let y = 0; y < H; y++) {
    if (y < Y0 || y > Y1) {
      rowRuns.push([]);
      continue;
    }
    const c = s.map.cond[y * W]!;
    const list: { id: number; lo: number; hi: number }[] = [];
    const runs = t.runs[c]!;
    for (let i = 0; i < runs.length; i++) {
      const net = runs[i]!;
      if (t.segs[net]! > 1) need[net] = 1;
      list.push({ id: runNet.length, lo: t.runLo[c]![i]!, hi: t.runHi[c]![i]! });
      runNet.push(net);
    }
    rowRuns.push(list);
  }
  const parent = runNet.map((_, i) => i);
  const find = (a: number): number => {
    while (parent[a] !== a) a = parent[a] = parent[parent[a]!]!;
    return a;
  };
  const plan: Plan = { a: [], b: [], ra: [], rb: [] };
  const lastStretch = new Int32Array(need.length).fill(-1);
  const lastHole = new Int32Array(need.length);
  const lastRun = new Int32Array(need.length);
  let stretch = 0;
  const visit = (h: number, x: number, y: number) => {
    if (s.owner[h] !== -1 || s.blocked[h]) {
      stretch++;
      return;
    }
    for (const r of rowRuns[y]!) {
      if (r.lo > x || r.hi < x) continue;
      const net = runNet[r.id]!;
      if (!need[net]) continue;
      if (lastStretch[net] === stretch && lastRun[net] !== r.id) {
        plan.a.push(lastHole[net]!);
        plan.b.push(h);
        plan.ra.push(lastRun[net]!);
        plan.rb.push(r.id);
      }
      lastStretch[net] = stretch;
      lastHole[net] = h;
      lastRun[net] = r.id;
    }
  };
  for (let x = X0; x <= X1; x++) {
    stretch++;
    for (let y = Y0; y <= Y1; y++) visit(x + y * W, x, y);
  }
  for (let y = Y0; y <= Y1; y++) {
    stretch++;
    for (let x = X0; x <= X1; x++) visit(x + y * W, x, y);
  }
  const order = plan.a.map((_, i) => i);
  const lengthOf = (i: number) => {
    const a = plan.a[i]!;
    const b = plan.b[i]!;
    return Math.abs((b % W) - (a % W)) + Math.abs(Math.floor(b / W) - Math.floor(a / W));
  };
  const lens = order.map(lengthOf);
  order.sort((i, j) => lens[i]! - lens[j]! || plan.a[i]! - plan.a[j]!);
  const claimed = new Uint8Array(W * H);
  // (claims live on the full grid; only the box is ever touched)
  for (const i of order) {
    const ra = find(plan.ra[i]!);
    const rb = find(plan.rb[i]!);
    if (ra === rb) continue;
    const a = plan.a[i]!;
    const b = plan.b[i]!;
    const step = Math.floor(a / W) === Math.floor(b / W) ? 1 : W;
    let free = true;
    for (let h = a; h <= b && free; h += step) if (claimed[h]) free = false;
    if (!free) continue;
    for (let h = a; h <= b; h += step) claimed[h] = 1;
    parent[ra] = rb;
  }
  // Joins still missing: per net, components − 1.
  const roots = new Map<number, Set<number>>();
  runNet.forEach((net, id) => {
    if (!need[net]) return;
    let set = roots.get(net);
    if (!set) roots.set(net, (set = new Set()));
    set.add(find(id));
  });
  let missing = 0;
  const nets: number[] = [];
  for (const [net, set] of roots) {
    missing += set.size - 1;
    if (set.size > 1) nets.push(net);
  }
  return { missing, nets };
}
