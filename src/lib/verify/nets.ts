/**
 * Net faults. A net whose placed pins lie in more than one connectivity class is open
 * (`verify.open`): the islands are listed, with the cheapest repair — the nearest pair of
 * free holes on two islands that one link would join. A class holding pins of two nets, or
 * an unconnected pin together with any other pin, is a short (`verify.short`), told as the
 * shortest path of copper, links and wires between the two, so the builder sees where to cut.
 */
import { holeAt } from '../board/index.ts';
import type { Hole, Problem } from '../model/problem.ts';
import { breakHint, pathTo, stepsText, traceFrom } from './paths.ts';
import { classHoles, type Stage } from './stage.ts';
import { at, listText, pinText, problem } from './words.ts';

/** A placed circuit pin as the net checks see it. */
export interface PinEntry {
  ref: string;
  pin: string;
  hole: number;
  /** The net, or a unique label for an unconnected pin. */
  label: string;
  net?: string;
}

export function openLabel(ref: string, pin: string): string {
  return `${pinText(ref, pin)} (unconnected)`;
}

function entryText(e: PinEntry, cols: number): string {
  return `${pinText(e.ref, e.pin)} at ${at(holeAt({ cols }, e.hole), cols)}`;
}

/** Reading order of the holes (dense indices run row by row), then ref and pin: a total order. */
const byHole = (a: PinEntry, b: PinEntry): number => a.hole - b.hole || (a.ref < b.ref ? -1 : a.ref > b.ref ? 1 : a.pin < b.pin ? -1 : a.pin > b.pin ? 1 : 0);

export function shortFault(entries: PinEntry[] | undefined, stage: Stage): Problem | undefined {
  if (!entries || entries.length < 2) return undefined;
  if (entries.every((e) => e.net !== undefined && e.net === entries[0]!.net)) return undefined;
  const cols = stage.copper.cols;
  const labels = [...new Set(entries.map((e) => e.label))].sort((a, b) => {
    const na = entries.some((e) => e.net === a);
    const nb = entries.some((e) => e.net === b);
    return na !== nb ? (na ? -1 : 1) : a < b ? -1 : a > b ? 1 : 0;
  });
  if (labels.length < 2) return undefined;
  const sorted = [...entries].sort(byHole);
  const first = labels[0]!;
  const sources = sorted.filter((e) => e.label === first);
  const trace = traceFrom(stage, sources.map((e) => e.hole));
  const parts: string[] = [];
  const holes = new Map<number, Hole>();
  const pins: { ref: string; pin: string }[] = [];
  const paths: { from: string; to: string; holes: Hole[] }[] = [];
  let hint = '';
  for (const other of labels.slice(1)) {
    let best: PinEntry | undefined;
    let bestLen = Infinity;
    for (const e of sorted) {
      if (e.label !== other) continue;
      let len = 0;
      for (let h = e.hole; trace.parent[h]! >= 0; h = trace.parent[h]!) len++;
      if (len < bestLen) [best, bestLen] = [e, len];
    }
    if (!best) continue;
    const steps = pathTo(stage, trace, best.hole);
    let src = best.hole;
    while (trace.parent[src]! >= 0) src = trace.parent[src]!;
    const from = sources.find((e) => e.hole === src) ?? sources[0]!;
    parts.push(`${from.label} (${entryText(from, cols)}) reaches ${other} (${entryText(best, cols)}) by ${stepsText(steps, cols)}`);
    const list: Hole[] = [holeAt({ cols }, from.hole), ...steps.flatMap((s) => [s.from, s.to]), holeAt({ cols }, best.hole)];
    paths.push({ from: from.label, to: other, holes: list });
    for (const h of list) holes.set(h[0] + h[1] * cols, h);
    pins.push({ ref: from.ref, pin: from.pin }, { ref: best.ref, pin: best.pin });
    if (!hint) hint = breakHint(steps, cols);
  }
  const nets = labels.filter((l) => entries.some((e) => e.net === l));
  const what = nets.length === labels.length ? `nets ${listText(nets)} are joined` : `${listText(labels)} share copper`;
  return problem('verify.short', 'error', ['nets', nets[0] ?? first], `short: ${what}. ${parts.join('; ')}`, {
    hint,
    nets,
    holes: [...holes.values()],
    pins,
    refs: [...new Set(pins.map((p) => p.ref))],
    data: { paths },
  });
}

/**
 * `isFree(hole)`: no lead, no body, copper not drilled out. `pure(class)`: the class holds
 * pins of this net only — a link to an island that is shorted to another net would spread
 * the short, so the repair is sought between pure islands only.
 */
export function openFault(net: string, placed: readonly PinEntry[], stage: Stage, isFree: (hole: number) => boolean, pure: (cls: number) => boolean): Problem | undefined {
  if (placed.length < 2) return undefined;
  const cls = stage.joins.cls;
  const c0 = cls[placed[0]!.hole]!;
  if (placed.every((e) => cls[e.hole] === c0)) return undefined;
  placed = [...placed].sort(byHole);
  const cols = stage.copper.cols;
  const groups = new Map<number, PinEntry[]>();
  for (const e of placed) (groups.get(cls[e.hole]!) ?? groups.set(cls[e.hole]!, []).get(cls[e.hole]!)!).push(e);
  if (groups.size < 2) return undefined;
  const islands = [...groups.entries()].map(([c, list]) => ({ c, pins: list.sort(byHole) })).sort((a, b) => byHole(a.pins[0]!, b.pins[0]!));
  const clean = islands.map((isl, k) => ({ c: isl.c, k })).filter((x) => pure(x.c));
  const found = clean.length > 1 ? cheapestLink(stage, clean.map((x) => x.c), isFree) : undefined;
  const fix = found && { ...found, i: clean[found.i]!.k, j: clean[found.j]!.k };
  const shorted = islands.map((isl, k) => (pure(isl.c) ? -1 : k + 1)).filter((k) => k > 0);
  const text = islands.map((isl, k) => `(${k + 1}) ${isl.pins.map((e) => entryText(e, cols)).join(', ')}`).join('; ');
  const holes: Hole[] = placed.map((e) => holeAt({ cols }, e.hole));
  let hint: string;
  if (fix) {
    const [a, b] = [holeAt({ cols }, fix.a), holeAt({ cols }, fix.b)];
    holes.push(a, b);
    const join = `island ${fix.i + 1} and island ${fix.j + 1}`;
    hint = `add a link from ${at(a, cols)} to ${at(b, cols)} to join ${join}` + (islands.length > 2 ? `; ${islands.length} islands need ${islands.length - 1} joins, so re-check after` : '');
  } else if (clean.length < 2) hint = `clear the short on island ${listText(shorted.map(String))} first (see the short), then re-check`;
  else hint = 'no free hole lies on one of the islands: move a part to free one, or join them with a copper-side wire';
  const data: Record<string, unknown> = {
    islands: islands.map((i) => ({ pins: i.pins.map((e) => ({ ref: e.ref, pin: e.pin })), holes: i.pins.map((e) => holeAt({ cols }, e.hole)) })),
  };
  if (fix) data.fix = { from: holeAt({ cols }, fix.a), to: holeAt({ cols }, fix.b) };
  return problem('verify.open', 'error', ['nets', net], `open: net ${net} lies on ${islands.length} separate islands of copper: ${text}`, {
    hint,
    nets: [net],
    holes,
    pins: placed.map((e) => ({ ref: e.ref, pin: e.pin })),
    refs: [...new Set(placed.map((e) => e.ref))],
    data,
  });
}

/** The nearest pair of free holes on two different islands (straight links win ties). */
function cheapestLink(stage: Stage, classes: number[], isFree: (hole: number) => boolean): { a: number; b: number; i: number; j: number } | undefined {
  const all = classHoles(stage);
  const cols = stage.copper.cols;
  const free = classes.map((c) => (all.get(c) ?? []).filter(isFree));
  let best: { a: number; b: number; i: number; j: number } | undefined;
  let bestCost = Infinity;
  for (let i = 0; i < free.length; i++)
    for (let j = i + 1; j < free.length; j++)
      for (const a of free[i]!) {
        const ax = a % cols;
        const ay = (a - ax) / cols;
        for (const b of free[j]!) {
          const bx = b % cols;
          const by = (b - bx) / cols;
          const dx = ax - bx;
          const dy = ay - by;
          // squared length, plus a little for a bent (diagonal) link
          const cost = (dx * dx + dy * dy) * 4 + (dx !== 0 && dy !== 0 ? 1 : 0);
          if (cost < bestCost) {
            bestCost = cost;
            best = a < b ? { a, b, i, j } : { a: b, b: a, i, j };
          }
        }
      }
  return best;
}
