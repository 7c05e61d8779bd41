/**
 * `routeLayout(design, placement, options?)` — see index.ts for the API reference.
 *
 * Phases: read the placement (pins, nets, bodies) → split conductors into segments, gaps and
 * tails (the cuts a placement forces) → copper-side wires for lone-hole islands, with rip-up
 * (wiring.ts) → links between strip islands by spanning tree (links.ts) → a maze search with
 * links, wires and free strips as relays for any net still in pieces, with rip-up, and as a
 * last resort relay islands: a run of holes inside a gap between two other nets, or in the
 * tail of another net's strip, parted off by an extra cut (join.ts) → only with the
 * `insulatedLinks` option, insulated wire links in any direction for nets still in pieces,
 * ripping up other nets' links that cover an island's only landing holes (insulated.ts) →
 * place each cut inside what the links left of its gap, two around a relay island (cuts.ts).
 * Every phase walks holes, segments and nets in index order, so the output depends on the
 * input only.
 */
import { fail, ok, RouteOptionsSchema, type CutStyle, type Hole, type Layout, type Problem, type Result, type RouteOptionsInput } from '../model/index.ts';
import type { Design } from '../netlist/index.ts';
import { buildCopper } from './copper.ts';
import { placeCuts } from './cuts.ts';
import { linkIslands } from './links.ts';
import { joinRest } from './join.ts';
import { insulatedLinks } from './insulated.ts';
import { newScratch } from './search.ts';
import { readPlacement } from './placement.ts';
import { drilledCutProblem, insulatedProblem, unroutableProblem } from './problems.ts';
import { wireRuns } from './runs.ts';
import { splitSegments } from './segments.ts';
import { cloneState, newState } from './state.ts';
import { wireIslands } from './wiring.ts';

export interface RouteStats {
  cuts: number;
  links: number;
  linkLengthMm: number;
  wires: number;
  wireLengthMm: number;
}

export interface Routed {
  layout: Layout;
  stats: RouteStats;
}

/** Length in mm of a link or wire: pitch × holes spanned, row plus column (a bent insulated link is laid along the grid). */
export function segmentLengthMm(seg: { from: Hole; to: Hole }, pitchMm: number): number {
  return round2((Math.abs(seg.from[0] - seg.to[0]) + Math.abs(seg.from[1] - seg.to[1])) * pitchMm);
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}

export function routeLayout(design: Design, placement: Layout, options?: RouteOptionsInput): Result<Routed> {
  const parsed = RouteOptionsSchema.safeParse(options ?? {});
  if (!parsed.success)
    return fail(
      parsed.error.issues.map(
        (i): Problem => ({ code: 'route.bad-options', severity: 'error', path: ['options', ...i.path.map(String)], message: i.message, hint: 'cutStyle is "hole", "between" or "either"; linksOverBodies and insulatedLinks are true or false' }),
      ),
    );
  const style: CutStyle = options?.cutStyle ?? placement.board.cutStyle ?? 'either';
  const board = placement.board;
  const copper = buildCopper(board);
  if (!copper.ok) return fail(copper.problems);
  const placed = readPlacement(design, placement);
  if (!placed.ok) return fail(placed.problems);
  const cut = splitSegments(copper.value, placed.value.leadNet);
  let st = newState(copper.value, cut, placed.value, { drilled: style === 'hole', overBodies: parsed.data.linksOverBodies });

  if (style === 'hole') {
    const cramped: Problem[] = [];
    for (let g = 0; g < cut.gapCount; g++)
      if (cut.gapLow[g]! >= 0 && cut.gapHigh[g]! >= 0 && cut.gapJ[g]! - cut.gapI[g]! < 2) {
        const start = copper.value.condStart[cut.gapCond[g]!]!;
        cramped.push(drilledCutProblem(st, placed.value, copper.value.condHoles[start + cut.gapI[g]!]!, copper.value.condHoles[start + cut.gapJ[g]!]!));
      }
    if (cramped.length) return fail(cramped);
  }

  const scratch = newScratch(st);
  st = wireIslands(st, scratch);
  const base = cloneState(st);
  linkIslands(st);
  const joined = joinRest(base, st, scratch);
  st = joined.st;
  let failed = joined.failed;
  let insulated: number[] = [];
  if (parsed.data.insulatedLinks && failed.length) ({ st, left: failed, links: insulated } = insulatedLinks(base, st, scratch, failed));
  const unroutable = failed.map((n) => unroutableProblem(st, placed.value, n));
  if (unroutable.length) return fail(unroutable);
  const warnings: Problem[] = [];
  for (let i = 0; i < insulated.length; i += 3) warnings.push(insulatedProblem(st, placed.value, insulated[i]!, insulated[i + 1]!, insulated[i + 2]!));

  const { cols } = copper.value;
  const hole = (i: number): Hole => [i % cols, Math.floor(i / cols)];
  const links: { from: Hole; to: Hole }[] = [];
  for (let i = 0; i < st.links.length; i += 3) {
    const a = Math.min(st.links[i]!, st.links[i + 1]!);
    const b = Math.max(st.links[i]!, st.links[i + 1]!);
    links.push({ from: hole(a), to: hole(b) });
  }
  links.sort((p, q) => p.from[1] - q.from[1] || p.from[0] - q.from[0] || p.to[1] - q.to[1] || p.to[0] - q.to[0]);
  const wires = wireRuns(st).map((r) => ({ from: hole(r.from), to: hole(r.to) }));
  const cuts = placeCuts(st, style);

  const layout: Layout = {
    format: 'kerfline.layout',
    version: 1,
    board: structuredClone(board),
    parts: structuredClone(placement.parts),
    cuts,
    links,
    wires,
  };
  const packing = placement.packing ?? design.packing;
  const spares = placement.spares ?? design.spares;
  if (packing) layout.packing = structuredClone(packing);
  if (spares) layout.spares = structuredClone(spares);
  if (placement.meta) layout.meta = structuredClone(placement.meta);
  const pitch = board.pitchMm;
  const stats: RouteStats = {
    cuts: cuts.length,
    links: links.length,
    linkLengthMm: round2(links.reduce((t, l) => t + segmentLengthMm(l, pitch), 0)),
    wires: wires.length,
    wireLengthMm: round2(wires.reduce((t, w) => t + segmentLengthMm(w, pitch), 0)),
  };
  return ok({ layout, stats }, warnings);
}
