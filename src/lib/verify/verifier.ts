/**
 * The verifier with memory. `createVerifier(circuit)` → `{ check(layout), recheck(layout,
 * changedRefs) }`. `check` verifies from the documents alone; `recheck` reuses the board
 * stage (copper, classes), the per-part results and the per-hole, per-pair, per-class and
 * per-net faults, and redoes only what the changed parts' old and new holes touch. Anything
 * else that changed (board, cuts, links, wires, packing, parts added, removed or reordered,
 * a package's footprint) falls back to a full check, and parts that changed without being
 * named are found by comparing pins, so `recheck` always answers what `check` would.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Cut, Layout, LayoutPart, Segment } from '../model/layout.ts';
import type { Problem } from '../model/problem.ts';
import { readExpected, type Expected } from './expect.ts';
import { HoleLists } from './hole-lists.ts';
import { leadFaults } from './leads.ts';
import { openFault, openLabel, shortFault, type PinEntry } from './nets.ts';
import { linkEndInBody, linkOverBody, pairOverlap } from './overlap.ts';
import { placePart, type PlacedPart } from './part-check.ts';
import { buildStage, type Lead, type Stage } from './stage.ts';
import type { Verifier, VerifyReport } from './types.ts';
import { canonical, problem } from './words.ts';

interface State {
  stage: Stage;
  expected: Expected;
  /** Packing and spares as text, and a snapshot of each part (ref, footprint, pins) to spot unnamed changes; kept for recheck only. */
  packKey?: string;
  snap?: string[];
  /** Circuit parts the layout does not place. */
  missing: Problem[];
  refs: string[];
  parts: PlacedPart[];
  /** hole → leads: pins (`a` part index, `b` pin index) and link ends (`a` −1 − link, `b` 0 start, 1 end). */
  leads: HoleLists;
  /** hole → parts whose body covers it (`a` part index). */
  bodyAt: HoleLists;
  /** net → its counted, placed pins. */
  netPins: Map<string, PinEntry[]>;
  /** class → counted pins in it. */
  classPins: Map<number, PinEntry[]>;
  leadF: Map<number, Problem[]>;
  /** Faults keyed by pairKey of (part, part), (link end, part) and (link, part). */
  pairF: Map<number, Problem>;
  linkBodyF: Map<number, Problem>;
  linkOverW: Map<number, Problem>;
  openF: Map<string, Problem>;
  shortF: Map<number, Problem>;
}

const snapOf = (p: LayoutPart) => `${p.ref}\u0000${p.footprint}\u0000${p.pins.map((q) => `${q.pin}\u0001${q.at[0]},${q.at[1]}`).join('\u0002')}`;

export function createVerifier(circuit: Circuit): Verifier {
  let state: State | undefined;
  const check = (layout: Layout): VerifyReport => {
    // the stage keeps its own copy of the copper documents: a caller may edit its layout in place
    const stage = state && sameStage(state.stage, layout) ? state.stage : buildStage(...copperDocs(layout));
    state = build(circuit, layout, stage, true);
    return report(state);
  };
  const recheck = (layout: Layout, changedRefs: string[]): VerifyReport => {
    const s = state;
    if (!s || !sameStage(s.stage, layout) || packKey(layout) !== s.packKey || layout.parts.length !== s.refs.length || layout.parts.some((p, i) => p.ref !== s.refs[i]))
      return check(layout);
    const named = new Set(changedRefs);
    const changed: number[] = [];
    layout.parts.forEach((p, i) => {
      if (named.has(p.ref) || snapOf(p) !== s.snap![i]) changed.push(i);
    });
    if (changed.some((i) => s.expected.parts.get(s.refs[i]!)?.packed)) return check(layout);
    update(s, layout, changed);
    return report(s);
  };
  return { check, recheck };
}

/** One full check with nothing kept (what verifyLayout does). */
export function checkOnce(circuit: Circuit, layout: Layout): VerifyReport {
  return report(build(circuit, layout, buildStage(layout.board, layout.cuts, layout.links, layout.wires), false));
}

/** Fresh copies of the board, cuts, links and wires. */
function copperDocs(l: Layout): Parameters<typeof buildStage> {
  const hole = (h: [number, number]): [number, number] => [h[0], h[1]];
  const seg = (x: Segment): Segment => ({ from: hole(x.from), to: hole(x.to) });
  const board = { ...l.board };
  if (l.board.conductors) board.conductors = l.board.conductors.map((c) => c.map(hole));
  const cuts: Cut[] = l.cuts.map((c) => ('at' in c ? { at: hole(c.at) } : { between: [hole(c.between[0]), hole(c.between[1])] }));
  return [board, cuts, l.links.map(seg), l.wires.map(seg)];
}

function packKey(layout: Layout): string {
  return JSON.stringify([layout.packing ?? null, layout.spares ?? null]);
}

function sameStage(st: Stage, layout: Layout): boolean {
  return same(st.board, layout.board) && same(st.cuts, layout.cuts) && same(st.links, layout.links) && same(st.wires, layout.wires);
}

/** Structural equality of plain JSON data. */
function same(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a)) {
    if (!Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!same(a[i], b[i])) return false;
    return true;
  }
  if (Array.isArray(b)) return false;
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  if (ka.length !== kb.length) return false;
  for (const k of ka) if (!same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k])) return false;
  return true;
}

function build(circuit: Circuit, layout: Layout, stage: Stage, keep: boolean): State {
  const expected = readExpected(circuit, layout);
  const size = stage.copper.size;
  const s: State = {
    stage,
    expected,
    missing: missingParts(expected, layout),
    refs: layout.parts.map((p) => p.ref),
    parts: [],
    leads: new HoleLists(size, 4 * layout.parts.length + 2 * stage.links.length + 16),
    bodyAt: new HoleLists(size, 8 * layout.parts.length + 16),
    netPins: new Map(),
    classPins: new Map(),
    leadF: new Map(),
    pairF: new Map(),
    linkBodyF: new Map(),
    linkOverW: new Map(),
    openF: new Map(),
    shortF: new Map(),
  };
  if (keep) {
    s.packKey = packKey(layout);
    s.snap = layout.parts.map(snapOf);
  }
  const ends = stage.linkEnds;
  for (let h = 0; h < size; h++) for (let k = ends.head[h]!; k >= 0; k = ends.next[k]!) s.leads.add(h, -1 - ends.a[k]!, ends.b[k]!);
  const firstOf = new Map<string, number>();
  layout.parts.forEach((lp, i) => {
    if (!firstOf.has(lp.ref)) firstOf.set(lp.ref, i);
    const p = placePart(lp, i, expected.parts.get(lp.ref), firstOf.get(lp.ref) !== i, layout.board, expected.sections.has(lp.ref));
    s.parts.push(p);
    addPart(s, p);
  });
  const cutAt = stage.copper.cutAt;
  const count = s.leads.count;
  for (let h = 0; h < size; h++) if (count[h]! > 1 || (count[h] && cutAt[h])) setList(s.leadF, h, leadFaults(h, leadsIn(s, h), !!cutAt[h], layout.board.cols));
  for (const p of s.parts) partPairs(s, p);
  for (const c of s.classPins.keys()) redoShort(s, c);
  for (const net of expected.nets.keys()) redoOpen(s, net);
  return s;
}

/** The leads in hole h, as leads.ts names them. */
function leadsIn(s: State, h: number): Lead[] {
  const out: Lead[] = [];
  const l = s.leads;
  for (let k = l.head[h]!; k >= 0; k = l.next[k]!) {
    const a = l.a[k]!;
    if (a < 0) out.push({ kind: 'link', link: -1 - a, end: l.b[k] ? 'to' : 'from' });
    else {
      const p = s.parts[a]!;
      out.push({ kind: 'pin', part: a, j: l.b[k]!, ref: p.ref, pin: p.pins[l.b[k]!]!.pin });
    }
  }
  return out;
}

function missingParts(expected: Expected, layout: Layout): Problem[] {
  const placed = new Set(layout.parts.map((p) => p.ref));
  const out: Problem[] = [];
  for (const e of expected.parts.values())
    if (!placed.has(e.ref))
      out.push(
        problem('verify.missing-part', 'error', [...e.path], e.packed ? `package ${e.ref}, which the packing fills with op-amp sections, is not on the board` : `${e.ref} (${e.describe}) is in the circuit but not on the board`, {
          hint: `place ${e.ref} on the board`,
          refs: [e.ref],
        }),
      );
  return out;
}

function update(s: State, layout: Layout, changed: number[]): void {
  const cls = s.stage.joins.cls;
  const cols = layout.board.cols;
  const leadHoles = new Set<number>();
  const classes = new Set<number>();
  const nets = new Set<string>();
  const changedSet = new Set(changed);
  for (const i of changed) {
    const old = s.parts[i]!;
    dropPairs(s, old);
    removePart(s, old);
    for (const p of old.pins) if (p.hole >= 0) leadHoles.add(p.hole);
    for (const h of old.body) classes.add(cls[h]!);
    for (const p of old.pins) {
      if (p.hole >= 0) classes.add(cls[p.hole]!);
      if (p.net !== undefined) nets.add(p.net);
    }
  }
  for (const i of changed) {
    const ref = layout.parts[i]!.ref;
    const p = placePart(layout.parts[i]!, i, s.expected.parts.get(ref), s.refs.indexOf(ref) !== i, layout.board, s.expected.sections.has(ref));
    s.parts[i] = p;
    s.snap![i] = snapOf(layout.parts[i]!);
    addPart(s, p);
    for (const q of p.pins) if (q.hole >= 0) leadHoles.add(q.hole);
    for (const h of p.body) classes.add(cls[h]!);
    for (const q of p.pins) {
      if (q.hole >= 0) classes.add(cls[q.hole]!);
      if (q.net !== undefined) nets.add(q.net);
    }
  }
  for (const i of changed) partPairs(s, s.parts[i]!, changedSet);
  const cutAt = s.stage.copper.cutAt;
  for (const h of leadHoles) setList(s.leadF, h, leadFaults(h, leadsIn(s, h), !!cutAt[h], cols));
  for (const c of classes) {
    redoShort(s, c);
    for (const e of s.classPins.get(c) ?? []) if (e.net !== undefined) nets.add(e.net);
  }
  for (const net of nets) redoOpen(s, net);
}

function addPart(s: State, p: PlacedPart): void {
  const cls = s.stage.joins.cls;
  for (const q of p.pins) {
    if (q.hole < 0) continue;
    s.leads.add(q.hole, p.index, q.j);
    if (q.role === 'none') continue;
    const e: PinEntry = { ref: p.ref, pin: q.pin, hole: q.hole, label: q.net ?? openLabel(p.ref, q.pin) };
    if (q.net !== undefined) {
      e.net = q.net;
      push(s.netPins, q.net, e);
    }
    push(s.classPins, cls[q.hole]!, e);
  }
  for (const h of p.body) s.bodyAt.add(h, p.index, 0);
}

function removePart(s: State, p: PlacedPart): void {
  const cls = s.stage.joins.cls;
  for (const q of p.pins) {
    if (q.hole < 0) continue;
    s.leads.remove(q.hole, p.index, q.j);
    if (q.role === 'none') continue;
    if (q.net !== undefined) pull(s.netPins, q.net, (e) => e.ref === p.ref && e.pin === q.pin);
    pull(s.classPins, cls[q.hole]!, (e) => e.ref === p.ref && e.pin === q.pin);
  }
  for (const h of p.body) s.bodyAt.remove(h, p.index, 0);
}

/** Forget the pair, link-end and link-over results involving part p. */
function dropPairs(s: State, p: PlacedPart): void {
  const { bodyAt } = s;
  const ends = s.stage.linkEnds;
  const over = s.stage.joins.linkOver;
  for (const h of p.body) {
    for (let k = bodyAt.head[h]!; k >= 0; k = bodyAt.next[k]!) if (bodyAt.a[k] !== p.index) s.pairF.delete(pairKey(p.index, bodyAt.a[k]!));
    for (let k = ends.head[h]!; k >= 0; k = ends.next[k]!) s.linkBodyF.delete(key2(2 * ends.a[k]! + ends.b[k]!, p.index));
    for (let k = over.head[h]!; k >= 0; k = over.next[k]!) s.linkOverW.delete(key2(over.a[k]!, p.index));
  }
}

/** Overlaps of p with other parts, link ends under p, links over p. */
function partPairs(s: State, p: PlacedPart, changed?: Set<number>): void {
  const cols = s.stage.copper.cols;
  const { bodyAt } = s;
  const ends = s.stage.linkEnds;
  const linkOver = s.stage.joins.linkOver;
  let over: Map<number, number[]> | undefined;
  let others: Set<number> | undefined;
  for (const h of p.body) {
    if (bodyAt.count[h]! > 1)
      for (let k = bodyAt.head[h]!; k >= 0; k = bodyAt.next[k]!) if (bodyAt.a[k] !== p.index) (others ??= new Set()).add(bodyAt.a[k]!);
    for (let k = ends.head[h]!; k >= 0; k = ends.next[k]!) {
      const link = ends.a[k]!;
      const end = ends.b[k]!;
      const f = linkEndInBody(link, end ? 'to' : 'from', h, p, cols);
      if (f) s.linkBodyF.set(key2(2 * link + end, p.index), f);
    }
    for (let k = linkOver.head[h]!; k >= 0; k = linkOver.next[k]!) push((over ??= new Map()), linkOver.a[k]!, h);
  }
  if (others)
    for (const q of others) {
      // in a full build each pair is met twice; the lower index does the work
      if (!changed && q < p.index) continue;
      const [a, b] = q < p.index ? [s.parts[q]!, p] : [p, s.parts[q]!];
      const f = pairOverlap(a, b, cols);
      if (f) s.pairF.set(pairKey(a.index, b.index), f);
    }
  if (over) for (const [k, cells] of over) s.linkOverW.set(key2(k, p.index), linkOverBody(k, s.stage.links[k]!, cells, p, cols));
}

function redoShort(s: State, c: number): void {
  const f = shortFault(s.classPins.get(c), s.stage);
  if (f) s.shortF.set(c, f);
  else s.shortF.delete(c);
}

function redoOpen(s: State, net: string): void {
  const placed = s.netPins.get(net) ?? [];
  const cls = s.stage.joins.cls;
  if (placed.length < 2 || placed.every((e) => cls[e.hole] === cls[placed[0]!.hole])) {
    s.openF.delete(net);
    return;
  }
  const cutAt = s.stage.copper.cutAt;
  const isFree = (h: number) => !s.leads.count[h] && !cutAt[h] && !s.bodyAt.count[h];
  const pure = (c: number) => (s.classPins.get(c) ?? []).every((e) => e.net === net);
  const f = openFault(net, placed, s.stage, isFree, pure);
  if (f) s.openF.set(net, f);
  else s.openF.delete(net);
}

function report(s: State): VerifyReport {
  const faults = canonical([
    ...s.expected.faults,
    ...s.missing,
    ...s.stage.copper.faults,
    ...s.stage.joins.faults,
    ...s.parts.flatMap((p) => p.faults),
    ...[...s.leadF.values()].flat(),
    ...s.pairF.values(),
    ...s.linkBodyF.values(),
    ...s.openF.values(),
    ...s.shortF.values(),
  ]);
  const warnings = canonical([...s.expected.warnings, ...s.stage.joins.warnings, ...s.parts.flatMap((p) => p.warnings), ...s.linkOverW.values()]);
  return { clean: faults.length === 0, faults, warnings };
}

/** One number for two indices below 2^26 (parts, links, link ends): exact in a double. */
const key2 = (a: number, b: number) => a * 67108864 + b;
const pairKey = (a: number, b: number) => (a < b ? key2(a, b) : key2(b, a));

function push<K, V>(m: Map<K, V[]>, k: K, v: V): void {
  const l = m.get(k);
  if (l) l.push(v);
  else m.set(k, [v]);
}

function pull<K, V>(m: Map<K, V[]>, k: K, match: (v: V) => boolean): void {
  const l = m.get(k);
  if (!l) return;
  const i = l.findIndex(match);
  if (i >= 0) l.splice(i, 1);
  if (!l.length) m.delete(k);
}

function setList<K>(m: Map<K, Problem[]>, k: K, v: Problem[]): void {
  if (v.length) m.set(k, v);
  else m.delete(k);
}
