/**
 * `joinRest(base, st, scratch): { st, failed }` — the last phase: every net still in pieces
 * after the wires and the spanning-tree links is joined by the maze search with everything
 * allowed (links, copper-side wires and solder bridges, free strips claimed as relays), one
 * component at a time, nets in number order. Islands with few landing holes keep them
 * (reserveScarce) while their net is in pieces.
 *
 * Rip-up and re-route: when a net finds no path, a search whose links may pass over other
 * nets' links names the nets in the way; their links are taken out (the state is rebuilt
 * from `base`, the state before any link, see replay), the net routes, and the ripped nets
 * queue up to route again. A net is ripped up at most MAX_RIPS times and each round at most
 * a bounded number of times, so it ends.
 *
 * Relay islands: the first round allows none. The nets it leaves in pieces get a second
 * round, with rip-up as a last resort (RELAY_RIPS), in which the search may also start relay
 * islands inside gaps between two other nets and in the tails of other nets' strips (one
 * extra cut each, see claims.ts), as few as it can. So a net that can be joined without one
 * never gets one, and a placement that routes without relay islands routes exactly as if
 * they did not exist. Returns the final state and the nets that stay in pieces.
 */
import { hasExit } from './exits.ts';
import { connect, linkBlockers } from './maze.ts';
import { PLAIN, RELAYS, type Scratch } from './search.ts';
import { replay } from './replay.ts';
import { reserveScarce } from './reserve.ts';
import { components, type RouteState } from './state.ts';

const MAX_RIPS = 3;
/**
 * Rip-ups the relay round may make in all. Few: more mostly trade one net's islands for
 * another's (measured on two crowded 300-part placements: with 1, 34 and 27 nets stay in
 * pieces; with 2, 4 or no limit 34–36 and 28, in up to three times the time).
 */
const RELAY_RIPS = 1;

export function joinRest(base: RouteState, start: RouteState, sc: Scratch): { st: RouteState; failed: number[] } {
  let st = joinRound(base, start, sc, false, inPieces(start));
  const left = inPieces(st);
  if (!left.length) return { st, failed: left };
  st = joinRound(base, st, sc, true, left);
  // Whatever the rounds did, a net in pieces is reported: never a partial layout.
  return { st, failed: inPieces(st) };
}

function inPieces(st: RouteState): number[] {
  const out: number[] = [];
  for (let n = 0; n < st.realNets; n++) if (components(st, n).length > 1) out.push(n);
  return out;
}

/** One round over the nets in pieces (`queue`, taken), with or without relay islands. */
function joinRound(base: RouteState, start: RouteState, sc: Scratch, relays: boolean, queue: number[]): RouteState {
  let st = start;
  const opts = relays ? RELAYS : PLAIN;
  const rips = new Int32Array(st.netCount);
  let budget = relays ? RELAY_RIPS : 2 * queue.length + 4;
  while (queue.length) {
    const n = queue.shift()!;
    reserveScarce(st);
    for (;;) {
      const comps = components(st, n);
      if (comps.length <= 1) break;
      // An island shut in by pins and bodies for good: no search can help.
      if (comps.some((r) => !hasExit(st, n, r, true, relays))) break;
      if (connect(st, sc, n, comps[0]!, opts)) continue;
      const victims = budget > 0 ? linkBlockers(st, sc, n, comps[0]!, relays) : undefined;
      // In the relay round every look for victims counts against the budget: it is costly.
      if (relays) budget--;
      if (!victims || victims.length === 0 || victims.some((v) => rips[v]! >= MAX_RIPS)) break;
      if (!relays) budget--;
      for (const v of victims) {
        rips[v]!++;
        if (!queue.includes(v)) queue.push(v);
      }
      st = replay(base, st, new Set(victims));
      reserveScarce(st);
    }
  }
  return st;
}
