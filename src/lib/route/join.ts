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
 * queue up to route again. A net is ripped up at most MAX_RIPS times and the whole phase at
 * most a bounded number of times, so it ends. Returns the final state and the nets that
 * stay in pieces.
 */
import { hasExit } from './exits.ts';
import { connect, linkBlockers } from './maze.ts';
import type { Scratch } from './search.ts';
import { replay } from './replay.ts';
import { reserveScarce } from './reserve.ts';
import { components, type RouteState } from './state.ts';

const MAX_RIPS = 3;

export function joinRest(base: RouteState, start: RouteState, sc: Scratch): { st: RouteState; failed: number[] } {
  let st = start;
  const queue: number[] = [];
  for (let n = 0; n < st.realNets; n++) if (components(st, n).length > 1) queue.push(n);
  const rips = new Int32Array(st.netCount);
  let budget = 2 * queue.length + 4;
  while (queue.length) {
    const n = queue.shift()!;
    reserveScarce(st);
    for (;;) {
      const comps = components(st, n);
      if (comps.length <= 1) break;
      // An island shut in by pins and bodies for good: no search can help.
      if (comps.some((r) => !hasExit(st, n, r, true))) break;
      if (connect(st, sc, n, comps[0]!, { wires: true, links: true, unowned: true })) continue;
      const victims = budget > 0 ? linkBlockers(st, sc, n, comps[0]!) : undefined;
      if (!victims || victims.length === 0 || victims.some((v) => rips[v]! >= MAX_RIPS)) break;
      budget--;
      for (const v of victims) {
        rips[v]!++;
        if (!queue.includes(v)) queue.push(v);
      }
      st = replay(base, st, new Set(victims));
      reserveScarce(st);
    }
  }
  // Whatever the loop did, a net in pieces is reported: never a partial layout.
  const pieces: number[] = [];
  for (let n = 0; n < st.realNets; n++) if (components(st, n).length > 1) pieces.push(n);
  return { st, failed: pieces };
}
