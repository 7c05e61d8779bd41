/**
 * `X` cards: a subcircuit call becomes one part, or is flattened into its body.
 *
 * `readCall(walk, site, ref, override, flatten)`
 *
 * The call's override (options, then notes, then the note inside the `.subckt` body)
 * decides first: `kind=opamp` makes one op-amp section (pins from `pins=…`, else from the
 * port names, see spice-opamp.ts); `kind=ic` needs `package` and the package pin for each
 * node (`pins=3,2,8,4,1`); `kind=pads` makes one pad per node (`labels=…`); any other kind
 * maps the nodes to its pins in the kind's order (or as `pins=…` names them). Without an
 * answer, a 5-port subcircuit whose name contains "opamp", "op_amp" or "op-amp" is an
 * op-amp section; any other defined subcircuit is flattened (inner nodes become `X1.node`,
 * `0` stays ground); a call to an undefined subcircuit is a question (`spice.ask-package`):
 * the import fails rather than guess a package or pin map.
 */
import type { PartKind } from '../model/circuit.ts';
import { KINDS, packagePins } from '../parts/kinds.ts';
import type { Subckt } from './spice-deck.ts';
import type { Tok } from './spice-lines.ts';
import type { Scope } from './spice-nodes.ts';
import { opampRoles } from './spice-opamp.ts';
import type { SpiceOverride } from './spice-override.ts';
import { problem, type PendingPart, type Site, type Walk } from './spice-types.ts';

const OPAMP_NAME = /op[-_ ]?amp/i;

/** The subcircuit name and node tokens of an X card. */
export function callShape(words: Tok[]): { sub?: Tok; nodes: Tok[] } {
  const pi = words.findIndex((t, i) => i > 0 && /^params:$/i.test(t.text));
  const end = pi >= 0 ? pi : words.length;
  if (end < 2) return { nodes: [] };
  return { sub: words[end - 1]!, nodes: words.slice(1, end - 1) };
}

function ask(w: Walk, site: Site, t: Tok, message: string, example: string, more = ''): void {
  problem(w, 'error', t, 'spice.ask-package', message, `answer in the deck with a note such as "* kerfline: ${example}"${more}, or with an override for ${site.name}`, { refs: [site.name] });
}

function pinList(o: SpiceOverride): string[] | undefined {
  if (o.pins) return o.pins;
  if (o.pinout && /^[\d\s,]+$/.test(o.pinout)) return o.pinout.split(/[\s,]+/).filter(Boolean);
  return undefined;
}

function asPart(w: Walk, site: Site, ref: string, kind: PartKind, o: SpiceOverride, nodes: string[], sub: Subckt | undefined, subTok: Tok): void {
  const part: PendingPart = { ref, from: site.name, line: site.card.line, column: site.card.column, kind, pins: {} };
  if (o.footprint) part.footprint = o.footprint;
  if (o.value) part.value = o.value;
  else if (kind !== 'pads') part.value = subTok.text.slice(0, 64);
  let names: string[] | undefined;
  if (kind === 'opamp') {
    names = o.pins;
    if (!names) {
      const r = opampRoles(sub?.ports.map((p) => p.text));
      names = r.roles;
      if (r.assumed)
        problem(w, 'warning', subTok, 'spice.opamp-order-assumed', `${site.name}: the port names of ${subTok.text} do not say which node is which, so the usual model order + − V+ V− out is assumed`, `if that is wrong, add "* kerfline: ${subTok.text} kind=opamp pins=+,-,V+,V-,out" in the order of its nodes`, { refs: [site.name] });
    }
  } else if (kind === 'ic') {
    const size = packagePins(o.package);
    names = pinList(o);
    if (!o.package || !size || !names) {
      ask(w, site, subTok, `${site.name} calls ${subTok.text} as an ic: which package and pin map? (${!size ? 'no DIP package named' : 'no package pin given for each node'})`, `${subTok.text} kind=ic package=DIP-8 pins=${nodes.map((_, i) => i + 1).join(',')}`);
      return;
    }
    part.package = o.package.toUpperCase();
    const bad = names.find((n) => !/^\d+$/.test(n) || Number(n) < 1 || Number(n) > size);
    if (bad !== undefined) {
      problem(w, 'error', subTok, 'spice.bad-pin-map', `${site.name}: pin "${bad}" is not a pin of a ${o.package}`, `use package pin numbers 1–${size}`, { refs: [site.name] });
      return;
    }
  } else if (kind === 'pads') {
    part.count = nodes.length;
    names = nodes.map((_, i) => String(i + 1));
    part.value = o.value ?? subTok.text.slice(0, 64);
    if (o.labels) part.labels = Object.fromEntries(o.labels.slice(0, nodes.length).map((l, i) => [String(i + 1), l]));
  } else if (kind === 'header') {
    problem(w, 'error', subTok, 'spice.override-kind', `${site.name}: a header cannot come from a subcircuit call`, 'use kind=pads, one pad per node', { refs: [site.name] });
    return;
  } else {
    const pol = kind === 'capacitor' && o.polarized === true;
    names = o.pins ?? (pol ? ['+', '-'] : KINDS[kind].pins);
    if (pol) part.polarized = true;
    if (o.pinout) part.pinout = o.pinout;
    if (o.package) part.package = o.package;
  }
  if (!names || names.length !== nodes.length) {
    problem(w, 'error', site.card, 'spice.node-count', `${site.name} has ${nodes.length} nodes but a ${kind} here has ${names?.length ?? '?'} pins (${(names ?? []).join(', ')})`, 'give one pin name per node with pins=…, or check the call', { refs: [site.name] });
    return;
  }
  if (new Set(names).size !== names.length) {
    problem(w, 'error', site.card, 'spice.bad-pin-map', `${site.name}: the pin map ${names.join(',')} names a pin twice`, 'name each pin once', { refs: [site.name] });
    return;
  }
  names.forEach((n, i) => (part.pins[n] = nodes[i]!));
  w.parts.push(part);
}

export function readCall(w: Walk, site: Site, ref: string, o: SpiceOverride, flatten: (sub: Subckt, scope: Scope) => void, depth: number): void {
  const { sub: subTok, nodes: nodeToks } = callShape(site.card.words);
  if (!subTok || nodeToks.length === 0) {
    problem(w, 'error', site.card, 'spice.bad-call', `${site.name} needs nodes and a subcircuit name`, `write "${site.name} node1 node2 … subname"`, { refs: [site.name] });
    return;
  }
  const sub = w.deck.subckts.get(subTok.text.toLowerCase());
  const nodes = nodeToks.map((t) => w.nodes.resolve(t, site.scope));
  if (o.kind) return asPart(w, site, ref, o.kind, o, nodes, sub, subTok);
  if (sub && OPAMP_NAME.test(subTok.text)) {
    if (nodes.length === 5) return asPart(w, site, ref, 'opamp', o, nodes, sub, subTok);
    ask(w, site, subTok, `${site.name} calls ${subTok.text}, named like an op-amp, with ${nodes.length} nodes (a section has 5): which package and pin map?`, `${subTok.text} kind=ic package=DIP-8 pins=…`);
    return;
  }
  if (!sub) {
    ask(w, site, subTok, `${site.name} calls subcircuit ${subTok.text}, which the deck does not define: which package and pin map?`, `${subTok.text} kind=ic package=DIP-8 pins=${nodes.map((_, i) => i + 1).join(',')}`, ' (or kind=opamp for one op-amp section)');
    return;
  }
  if (sub.ports.length !== nodes.length) {
    problem(w, 'error', site.card, 'spice.node-count', `${site.name} passes ${nodes.length} nodes but .subckt ${sub.name.text} (line ${sub.line}) has ${sub.ports.length} ports`, 'pass one node per port', { refs: [site.name] });
    return;
  }
  if (depth >= 32) {
    problem(w, 'error', site.card, 'spice.deep-calls', `${site.name}: subcircuit calls nest deeper than 32 (does ${sub.name.text} call itself?)`, 'remove the loop of subcircuit calls', { refs: [site.name] });
    return;
  }
  if (sub.body.length === 0)
    problem(w, 'warning', subTok, 'spice.empty-subckt', `${site.name} calls ${sub.name.text}, which holds no parts: nothing is placed for it`, `if it stands for a connector or an off-board part, add "* kerfline: kind=pads" inside .subckt ${sub.name.text}`, { refs: [site.name] });
  const ports = new Map<string, string>();
  sub.ports.forEach((p, i) => ports.set(p.text.toLowerCase(), nodes[i]!));
  flatten(sub, { prefix: `${site.name}.`, ports });
}
