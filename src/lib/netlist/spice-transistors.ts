/**
 * Three-lead SPICE cards → board parts: `Q nc nb ne [ns] model`, `J nd ng ns model`,
 * `M nd ng ns nb model` (also `M nd ng ns model` when the fourth token names a model).
 *
 * `readTransistor(walk, site, ref, override, letter)` pushes one PendingPart or problems.
 *
 * Polarity comes from the `.model` type (NPN/PNP, NJF/PJF, NMOS/PMOS, VDMOS with
 * `pchan`) or from an override's kind; without either it is a question
 * (`spice.ask-polarity`). A Q card's fourth node token is the substrate only when the
 * token after it names a model: a model lookup decides, never the position (check-values
 * §10 trap). Substrate and bulk nodes are simulation detail: a discrete part has no such
 * lead, so they are dropped with a note.
 */
import type { PartKind } from '../model/circuit.ts';
import type { Tok } from './spice-lines.ts';
import type { SpiceOverride } from './spice-override.ts';
import { base, nodes } from './spice-two-lead.ts';
import { problem, type Site, type Walk } from './spice-types.ts';

const BIPOLAR: Record<string, PartKind> = { NPN: 'npn', PNP: 'pnp' };
const FET: Record<string, PartKind> = { NJF: 'jfet-n', PJF: 'jfet-p', NMOS: 'nmos', PMOS: 'pmos' };

/** Q only: the 4th node token is the substrate or the model; a model lookup decides. */
function pickModel(w: Walk, site: Site): { model?: Tok; extra?: Tok } {
  const a = site.card.words[4];
  const b = site.card.words[5];
  const known = (t: Tok | undefined) => !!t && w.deck.models.has(t.text.toLowerCase());
  if (known(a) || (a && !b)) return { model: a };
  if (known(b)) return { model: b, extra: a };
  if (a && b)
    problem(w, 'error', a, 'spice.ask-model', `${site.name}: neither "${a.text}" (substrate node or model?) nor "${b.text}" names a .model in the deck`, `add the .model line for the transistor's model, e.g. ".model ${b.text} NPN", so the reader can tell the substrate node from the model`, { refs: [site.name] });
  else problem(w, 'error', site.card, 'spice.no-model', `${site.name} names no model`, `write the model name after the nodes, e.g. "${site.name} c b e 2N3904"`, { refs: [site.name] });
  return {};
}

function fetModel(w: Walk, site: Site, letter: string): { model?: Tok; extra?: Tok } {
  const words = site.card.words;
  if (letter === 'j' || w.deck.models.has((words[4]?.text ?? '').toLowerCase()) || !words[5]) {
    if (words[4]) return { model: words[4] };
    problem(w, 'error', site.card, 'spice.no-model', `${site.name} names no model`, `write the model name after the nodes, e.g. "${site.name} d g s ${letter === 'j' ? 'J201' : 'BS170'}"`, { refs: [site.name] });
    return {};
  }
  return { model: words[5], extra: words[4] };
}

export function readTransistor(w: Walk, site: Site, ref: string, o: SpiceOverride, letter: string): void {
  const bip = letter === 'q';
  const names = bip ? ['C', 'B', 'E'] : ['D', 'G', 'S'];
  const ns = nodes(w, site, 3, bip ? 'collector base emitter model' : 'drain gate source model');
  if (!ns) return;
  const { model, extra } = bip ? pickModel(w, site) : fetModel(w, site, letter);
  if (!model) return;
  const def = w.deck.models.get(model.text.toLowerCase());
  let kind: PartKind | undefined;
  if (def) {
    if (bip) kind = BIPOLAR[def.type];
    else if (def.type === 'VDMOS' && letter === 'm') kind = def.pchan ? 'pmos' : 'nmos';
    else kind = FET[def.type];
  }
  const allowed: PartKind[] = bip ? ['npn', 'pnp'] : letter === 'j' ? ['jfet-n', 'jfet-p'] : ['nmos', 'pmos'];
  if (kind && !allowed.includes(kind)) kind = undefined;
  if (o.kind) {
    if (!allowed.includes(o.kind)) {
      problem(w, 'error', site.card, 'spice.override-kind', `${site.name}: kind "${o.kind}" does not fit a ${site.card.words[0]!.text[0]!.toUpperCase()} card`, `use one of: ${allowed.join(', ')}`, { refs: [site.name] });
      return;
    }
    kind = o.kind;
  }
  if (!kind) {
    const family = bip ? 'bipolar' : letter === 'j' ? 'JFET' : 'MOSFET';
    const what = bip ? 'NPN or PNP' : letter === 'j' ? 'N-channel or P-channel JFET' : 'N-channel or P-channel MOSFET';
    const msg = def
      ? `${site.name}: model ${model.text} has type ${def.type} (line ${def.line}), which is not a ${family} type`
      : `${site.name}: model ${model.text} is not defined in the deck, so its polarity is unknown: ${what}?`;
    const typ = bip ? 'NPN' : letter === 'j' ? 'NJF' : 'NMOS';
    problem(w, 'error', model, 'spice.ask-polarity', msg, `add ".model ${model.text} ${typ}" or answer with an override { "${site.name}": { "kind": "${allowed[0]}" } }`, { refs: [site.name] });
    return;
  }
  const part = base(site, ref, kind, o);
  part.pins = { [names[0]!]: ns[0]!, [names[1]!]: ns[1]!, [names[2]!]: ns[2]! };
  part.value = (o.value ?? model.text).slice(0, 64);
  if (extra && !(letter === 'm' && w.nodes.resolve(extra, site.scope) === ns[2]))
    problem(w, 'note', extra, 'spice.lead-dropped', `${site.name}: ${bip ? 'substrate' : 'bulk'} node ${extra.text} is a simulation detail; a discrete part has no such lead, so it is left out`, bip ? undefined : 'a three-lead MOSFET ties bulk to source inside', { refs: [site.name] });
  w.parts.push(part);
}
