/**
 * Walk the deck's element cards, top level first, flattening subcircuit calls.
 *
 * `walkDeck(walk)` fills walk.parts and walk.sources.
 *
 * Each card's override is merged from the least to the most specific answer: the note in
 * a called `.subckt` body, deck notes for its model or subcircuit, deck notes for the
 * element, then options.overrides for the model and for the element (names compared
 * without case; an X element may be named with or without its leading X). Elements the
 * board cannot hold (controlled sources E F G H, behavioural B, switches S W, lines T O U,
 * coupling K, digital A …) are left out with a warning naming them.
 */
import type { Card } from './spice-lines.ts';
import type { Subckt } from './spice-deck.ts';
import { readCall, callShape } from './spice-calls.ts';
import { readTransistor } from './spice-transistors.ts';
import { readTwoLead } from './spice-two-lead.ts';
import type { Scope } from './spice-nodes.ts';
import { mergeOverrides, type SpiceOverride } from './spice-override.ts';
import { readSource } from './spice-sources.ts';
import { problem, type Site, type Walk } from './spice-types.ts';

/** Cap on elements visited, so a call tree that doubles at every level cannot run away. */
export const MAX_ELEMENTS = 20000;

const LEFT_OUT: Record<string, string> = {
  e: 'a voltage-controlled voltage source',
  f: 'a current-controlled current source',
  g: 'a voltage-controlled current source',
  h: 'a current-controlled voltage source',
  b: 'a behavioural source',
  s: 'a voltage-controlled switch',
  w: 'a current-controlled switch',
  t: 'a transmission line',
  o: 'a lossy transmission line',
  u: 'a distributed RC line',
  k: 'a coupling of inductors',
  a: 'a code model (XSPICE)',
  y: 'a transmission line',
  p: 'a coupled line',
  n: 'a device model (OSDI)',
  z: 'a MESFET',
};

/** Model-name tokens of a card, by element letter (for model-level answers). */
const MODEL_AT: Record<string, number[]> = { d: [3], q: [4, 5], j: [4], m: [4, 5] };

function overrideFor(w: Walk, names: string[], body?: SpiceOverride): SpiceOverride {
  const deck = names.map((n) => w.deck.notes.get(n.toLowerCase())?.override);
  const opts = names.map((n) => w.overrides.get(n.toLowerCase()));
  return mergeOverrides(body, ...deck, ...opts);
}

/** Ref for an X call that becomes a part: drop the X when what follows is a free name. */
function callRef(w: Walk, prefix: string, local: string): string {
  const bare = local.slice(1);
  if (/^[A-Za-z]/.test(bare) && !w.names.has((prefix + bare).toLowerCase())) return prefix + bare;
  return prefix + local;
}

export function walkDeck(w: Walk): void {
  let visited = 0;
  let stopped = false;
  const walk = (cards: Card[], scope: Scope, depth: number): void => {
    for (const c of cards) w.names.add((scope.prefix + c.words[0]!.text).toLowerCase());
    const seen = new Map<string, number>();
    for (const card of cards) {
      if (stopped) return;
      if (++visited > MAX_ELEMENTS) {
        stopped = true;
        problem(w, 'error', card, 'spice.too-large', `the deck expands to more than ${MAX_ELEMENTS} elements`, 'a stripboard holds far fewer parts: check for subcircuits that call each other many times');
        return;
      }
      const head = card.words[0]!;
      const local = head.text;
      const name = scope.prefix + local;
      const prev = seen.get(local.toLowerCase());
      if (prev !== undefined) {
        problem(w, 'error', head, 'spice.duplicate-name', `${name} is defined twice (first on line ${prev})`, 'give each element its own name', { refs: [name] });
        continue;
      }
      seen.set(local.toLowerCase(), card.line);
      const site: Site = { card, scope, name };
      const letter = local[0]!.toLowerCase();
      if (letter === 'x') {
        const sub = callShape(card.words).sub;
        const subDef = sub ? w.deck.subckts.get(sub.text.toLowerCase()) : undefined;
        const ref = callRef(w, scope.prefix, local);
        const o = overrideFor(w, [...(sub ? [sub.text] : []), name, ref], subDef?.note);
        readCall(w, site, ref, o, (s: Subckt, inner: Scope) => walk(s.body, inner, depth + 1), depth);
      } else if (letter === 'v' || letter === 'i') readSource(w, site);
      else if ('rcldqjm'.includes(letter)) {
        const models = (MODEL_AT[letter] ?? []).map((i) => card.words[i]?.text).filter((t): t is string => !!t);
        const o = overrideFor(w, [...models, name]);
        if ('rcld'.includes(letter)) readTwoLead(w, site, name, o, letter);
        else readTransistor(w, site, name, o, letter);
      } else
        problem(w, 'warning', head, 'spice.left-out', `${name} is ${LEFT_OUT[letter] ?? `an element of unknown type "${local[0]}"`}: simulation only, left out of the board`, 'if it stands for a real part, replace it with one the board can hold (R, C, L, D, Q, J, M or a subcircuit with a layout note)', { refs: [name] });
    }
  };
  walk(w.deck.top, { prefix: '', ports: new Map() }, 0);
}
