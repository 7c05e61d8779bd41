/**
 * Reading the netlist off a board, so a hand-drawn layout can be checked.
 *
 * `extractNetlist(layout, circuit?)` → the connectivity classes of the placed pins (each
 * class with at least one pin), in reading order of their first pin. With a circuit, a class
 * that is exactly one circuit net (the same pins, no others) takes that net's name and
 * `matched: true`; other classes are named N1, N2 … (skipping circuit net names), and
 * `diff` says how the board differs from the circuit. `expectedNetlist(circuit, layout?)`
 * → the circuit's nets at package level in name order (op-amp sections read through the layout's
 * packing). `diffNetlists(expected, found)` compares any two netlists by their pins.
 */
import { holeIndex, onBoard } from '../board/index.ts';
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import { readExpected } from './expect.ts';
import { buildStage } from './stage.ts';
import type { ExtractedNet, ExtractedNetlist, NamedNet, NetlistDiff, PinRef } from './types.ts';
import { byReading } from './words.ts';

const key = (p: PinRef) => `${p.ref}\u0000${p.pin}`;

export function expectedNetlist(circuit: Circuit, layout?: Pick<Layout, 'parts' | 'packing' | 'spares'>): NamedNet[] {
  const e = readExpected(circuit, layout ?? { parts: [] });
  return [...e.nets.entries()].sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0)).map(([name, pins]) => ({ name, pins: pins.map((p) => ({ ...p })) }));
}

export function extractNetlist(layout: Layout, circuit?: Circuit): ExtractedNetlist {
  const stage = buildStage(layout.board, layout.cuts, layout.links, layout.wires);
  const cls = stage.joins.cls;
  const seen = new Set<string>();
  const groups = new Map<number, { pins: PinRef[]; holes: [number, number][] }>();
  for (const part of layout.parts)
    for (const pp of part.pins) {
      const pin = { ref: part.ref, pin: pp.pin };
      if (!onBoard(layout.board, pp.at) || seen.has(key(pin))) continue;
      seen.add(key(pin));
      const c = cls[holeIndex(layout.board, pp.at)]!;
      const g = groups.get(c) ?? groups.set(c, { pins: [], holes: [] }).get(c)!;
      g.pins.push(pin);
      g.holes.push([pp.at[0], pp.at[1]]);
    }
  const ordered = [...groups.values()].map((g) => {
    const idx = g.holes.map((_, i) => i).sort((a, b) => byReading(g.holes[a]!, g.holes[b]!));
    return { pins: idx.map((i) => g.pins[i]!), holes: idx.map((i) => g.holes[i]!) };
  });
  ordered.sort((a, b) => byReading(a.holes[0]!, b.holes[0]!));

  const expected = circuit ? expectedNetlist(circuit, layout) : [];
  const netOf = new Map<string, string>();
  const placedCount = new Map<string, number>();
  for (const n of expected) for (const p of n.pins) netOf.set(key(p), n.name);
  for (const k of seen) {
    const n = netOf.get(k);
    if (n !== undefined) placedCount.set(n, (placedCount.get(n) ?? 0) + 1);
  }
  const taken = new Set(expected.map((n) => n.name));
  let counter = 0;
  const fresh = () => {
    let name: string;
    do name = `N${++counter}`;
    while (taken.has(name));
    return name;
  };
  const nets: ExtractedNet[] = ordered.map((g) => {
    const names = new Set(g.pins.map((p) => netOf.get(key(p))));
    const only = names.size === 1 ? [...names][0] : undefined;
    const matched = only !== undefined && placedCount.get(only) === g.pins.length;
    return { name: matched ? only : fresh(), matched, pins: g.pins, holes: g.holes };
  });
  const out: ExtractedNetlist = { nets };
  if (circuit) out.diff = diffNetlists(expected, nets);
  return out;
}

export function diffNetlists(expected: NamedNet[], found: NamedNet[]): NetlistDiff {
  const foundOf = new Map<string, string>();
  const rank = new Map<string, number>();
  found.forEach((f, i) => {
    rank.set(f.name, i);
    for (const p of f.pins) foundOf.set(key(p), f.name);
  });
  const netOf = new Map<string, string>();
  for (const n of expected) for (const p of n.pins) netOf.set(key(p), n.name);
  const diff: NetlistDiff = { same: true, split: [], merged: [], missing: [], extra: [] };
  for (const n of expected) {
    const groups = new Map<string, PinRef[]>();
    const missing: PinRef[] = [];
    for (const p of n.pins) {
      const f = foundOf.get(key(p));
      if (f === undefined) missing.push(p);
      else (groups.get(f) ?? groups.set(f, []).get(f)!).push(p);
    }
    if (groups.size > 1)
      diff.split.push({ net: n.name, groups: [...groups].sort((a, b) => rank.get(a[0])! - rank.get(b[0])!).map(([name, pins]) => ({ name, pins })) });
    if (missing.length) diff.missing.push({ net: n.name, pins: missing });
  }
  for (const f of found) {
    const nets = [...new Set(f.pins.map((p) => netOf.get(key(p))).filter((n): n is string => n !== undefined))];
    if (nets.length > 1) diff.merged.push({ name: f.name, nets, pins: f.pins });
    const stray = f.pins.filter((p) => !netOf.has(key(p)));
    if (stray.length && f.pins.length > 1) diff.extra.push({ name: f.name, pins: stray });
  }
  diff.same = !diff.split.length && !diff.merged.length && !diff.missing.length && !diff.extra.length;
  return diff;
}
