/**
 * Test-only: an independent check of a routed layout, written from exchange.md's "What
 * correct means" without any router code. Conductors minus cuts, joined by links and
 * copper-side wires; then every net in one component, no component with two nets, an
 * unconnected pin alone, one lead per hole, nothing in a cut hole, links straight, apart
 * from each other and from leads, never ending under a body and (unless allowed) never
 * passing over one. Returns fault lines.
 */
import { conductorsOf } from '../../board/index.ts';
import type { Layout } from '../../model/index.ts';
import type { Design } from '../../netlist/index.ts';
import { fitPose, getFootprint, poseBody, type Offset } from '../../parts/index.ts';

export function checkRouted(design: Design, layout: Layout, opts: { linksOverBodies?: boolean } = {}): string[] {
  const { cols, rows } = layout.board;
  const key = (x: number, y: number) => x + y * cols;
  const parent = Array.from({ length: cols * rows }, (_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const join = (a: number, b: number) => {
    parent[find(a)] = find(b);
  };
  const faults: string[] = [];
  const cutAt = new Set(layout.cuts.flatMap((c) => ('at' in c ? [key(c.at[0], c.at[1])] : [])));
  const cutBetween = new Set(layout.cuts.flatMap((c) => ('between' in c ? [`${key(...c.between[0])}-${key(...c.between[1])}`, `${key(...c.between[1])}-${key(...c.between[0])}`] : [])));
  for (const cond of conductorsOf(layout.board))
    for (let i = 1; i < cond.length; i++) {
      const a = key(...cond[i - 1]!);
      const b = key(...cond[i]!);
      if (!cutAt.has(a) && !cutAt.has(b) && !cutBetween.has(`${a}-${b}`)) join(a, b);
    }
  const straight = (s: { from: [number, number]; to: [number, number] }): number[] | undefined => {
    const [x0, y0] = s.from;
    const [x1, y1] = s.to;
    if (x0 !== x1 && y0 !== y1) return undefined;
    const out: number[] = [];
    const n = Math.abs(x1 - x0) + Math.abs(y1 - y0);
    for (let k = 0; k <= n; k++) out.push(key(x0 + Math.sign(x1 - x0) * k, y0 + Math.sign(y1 - y0) * k));
    return out;
  };
  const lead = new Map<number, string>();
  const addLead = (h: number, what: string) => {
    if (lead.has(h)) faults.push(`two leads in hole ${h}: ${lead.get(h)} and ${what}`);
    lead.set(h, what);
    if (cutAt.has(h)) faults.push(`${what} sits in a cut hole ${h}`);
  };
  const pinNet = new Map<number, string>();
  const body = new Set<number>();
  for (const lp of layout.parts) {
    const dp = design.parts.find((p) => p.ref === lp.ref);
    if (!dp) {
      faults.push(`extra part ${lp.ref}`);
      continue;
    }
    const at: Record<string, Offset> = {};
    for (const pp of lp.pins) {
      const h = key(pp.at[0], pp.at[1]);
      addLead(h, `${lp.ref}.${pp.pin}`);
      pinNet.set(h, dp.nets[pp.pin] ?? `~${lp.ref}.${pp.pin}`);
      at[pp.pin] = pp.at;
    }
    const fp = getFootprint(lp.footprint, dp.pinNames);
    const pose = fp && fitPose(fp, at, dp.span);
    if (!fp || !pose) faults.push(`${lp.ref} geometry`);
    else for (const [x, y] of poseBody(fp, pose)) body.add(key(x, y));
  }
  if (design.parts.length !== layout.parts.length) faults.push('part count differs');
  const linkCells = new Set<number>();
  layout.links.forEach((l, i) => {
    const cells = straight(l);
    if (!cells || cells.length < 2) {
      faults.push(`link ${i} not straight`);
      return;
    }
    for (const c of cells) {
      if (linkCells.has(c)) faults.push(`link ${i} crosses another link at ${c}`);
      linkCells.add(c);
      if (!opts.linksOverBodies && body.has(c)) faults.push(`link ${i} over a body at ${c}`);
    }
    for (const c of cells.slice(1, -1)) if (lead.has(c)) faults.push(`link ${i} passes over lead ${lead.get(c)}`);
    if (body.has(cells[0]!) || body.has(cells[cells.length - 1]!)) faults.push(`link ${i} ends under a body`);
    addLead(cells[0]!, `link ${i}`);
    addLead(cells[cells.length - 1]!, `link ${i}`);
    join(cells[0]!, cells[cells.length - 1]!);
  });
  layout.wires.forEach((w, i) => {
    const cells = straight(w);
    if (!cells) {
      faults.push(`wire ${i} not straight`);
      return;
    }
    for (const c of cells) join(cells[0]!, c);
  });
  const netRoot = new Map<string, number>();
  const rootNet = new Map<number, string>();
  for (const [h, net] of pinNet) {
    const r = find(h);
    const prev = netRoot.get(net);
    if (prev !== undefined && prev !== r) faults.push(`open: net ${net}`);
    netRoot.set(net, r);
    const other = rootNet.get(r);
    if (other !== undefined && other !== net) faults.push(`short: ${other} with ${net}`);
    rootNet.set(r, net);
  }
  return [...new Set(faults)];
}
