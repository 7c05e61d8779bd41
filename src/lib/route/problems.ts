/**
 * Problems the router reports as results (`route.unroutable`), naming the net as the user
 * wrote it, its islands (pins and their bench labels) and why it failed:
 * - `drilled-cut`: two leads of different nets sit in neighbouring holes of one conductor
 *   and the board's cutting style allows only drilled cuts;
 * - `no-landing-hole`: an island has no free hole for a link and no free neighbour for a
 *   copper-side wire;
 * - `blocked`: every straight link and every copper-side path is blocked by leads, bodies
 *   or other links (the board is too small or too crowded for this placement).
 */
import { holeLabel } from '../board/index.ts';
import type { Hole, Problem } from '../model/index.ts';
import type { Placed, PlacedPin } from './placement.ts';
import { hasExit } from './exits.ts';
import { find, type RouteState } from './state.ts';

function holeOf(st: RouteState, i: number): Hole {
  return [i % st.copper.cols, Math.floor(i / st.copper.cols)];
}

function label(st: RouteState, i: number): string {
  return holeLabel(holeOf(st, i), 'component', st.copper.cols);
}

function pinText(st: RouteState, p: PlacedPin): string {
  return `${p.ref}.${p.pin} at ${label(st, p.hole)}`;
}

/** Two leads of different nets side by side on one strip, with drilled cuts only. */
export function drilledCutProblem(st: RouteState, placed: Placed, a: number, b: number): Problem {
  const pa = placed.pins[placed.leadPin[a]!]!;
  const pb = placed.pins[placed.leadPin[b]!]!;
  const nets = [pa.net, pb.net].filter((n) => n < placed.realNets).map((n) => placed.netNames[n]!);
  return {
    code: 'route.unroutable',
    severity: 'error',
    path: ['cuts'],
    message: `a drilled cut is impossible between ${pinText(st, pa)} (${placed.netNames[pa.net]}) and ${pinText(st, pb)} (${placed.netNames[pb.net]}): the two leads are neighbours on one strip, with no free hole between them`,
    hint: 'move one of the two parts by a hole, or allow scored cuts between holes (cut style "between" or "either")',
    refs: [...new Set([pa.ref, pb.ref])],
    nets,
    holes: [holeOf(st, a), holeOf(st, b)],
    pins: [{ ref: pa.ref, pin: pa.pin }, { ref: pb.ref, pin: pb.pin }],
    data: { reason: 'drilled-cut' },
  };
}

/** A net whose islands could not all be joined. */
export function unroutableProblem(st: RouteState, placed: Placed, net: number): Problem {
  const pins = placed.pins.filter((p) => p.net === net);
  const groups = new Map<number, PlacedPin[]>();
  for (const p of pins) {
    const r = find(st, st.cut.segOf[p.hole]!);
    (groups.get(r) ?? groups.set(r, []).get(r)!).push(p);
  }
  const islands = [...groups.values()];
  const stuck = [...groups.keys()].some((r) => !hasExit(st, net, r, false, true));
  const name = placed.netNames[net]!;
  const why = stuck
    ? 'an island has no free hole for a link to land in and no free neighbouring hole for a copper-side wire'
    : `every straight link and copper-side path between its islands is blocked by leads, ${st.cfg.overBodies ? '' : 'part bodies, '}other links or other nets' copper: the board is too small or too crowded here`;
  const hint = stuck
    ? 'move a part so the island has a free hole beside it or along its strip'
    : `move the islands into a shared column with free holes, or enlarge the board${st.cfg.overBodies ? '' : ', or allow links over part bodies'}`;
  return {
    code: 'route.unroutable',
    severity: 'error',
    path: ['nets', name],
    message: `net ${name} cannot be joined: islands ${islands.map((g) => `{${g.map((p) => pinText(st, p)).join(', ')}}`).join(', ')}; ${why}`,
    hint,
    refs: [...new Set(pins.map((p) => p.ref))],
    nets: [name],
    holes: pins.map((p) => holeOf(st, p.hole)),
    pins: pins.map((p) => ({ ref: p.ref, pin: p.pin })),
    data: { reason: stuck ? 'no-landing-hole' : 'blocked', islands: islands.map((g) => g.map((p) => `${p.ref}.${p.pin}`)) },
  };
}

/** An insulated wire link the router had to use: no straight link joins these islands. */
export function insulatedProblem(st: RouteState, placed: Placed, a: number, b: number, net: number): Problem {
  const name = placed.netNames[net]!;
  return {
    code: 'route.insulated-link',
    severity: 'warning',
    path: ['nets', name],
    message: `net ${name} needs an insulated wire link from ${label(st, a)} to ${label(st, b)}: no straight link over free holes joins its islands`,
    hint: 'use sleeved hook-up wire and keep it clear of hot or tall parts; or give the net room (move parts apart, enlarge the board) so a straight link fits',
    nets: [name],
    holes: [holeOf(st, a), holeOf(st, b)],
    data: { reason: 'insulated-link' },
  };
}
