/**
 * Two-lead SPICE cards → board parts: `R n1 n2 value`, `C n+ n- value`, `L n+ n- value`,
 * `D n+ n- model` (check-values §10; n+ of a diode is the anode).
 *
 * `readTwoLead(walk, site, ref, override, letter)` pushes one PendingPart or problems.
 *
 * A diode's kind comes from its model name: a name containing "led" is an LED; one
 * containing "zen", "bzx" or "bzv" is a zener; any other is a plain diode. A capacitor is
 * polarized only when a note or override says so (`polarized=true`; the first node is +).
 * Values go through the values module and are shown in IEC 60062 letter form; a value
 * that is not a number (a `{param}` expression) is kept as written with a warning.
 */
import type { PartKind } from '../model/circuit.ts';
import type { Tok } from './spice-lines.ts';
import type { SpiceOverride } from './spice-override.ts';
import { problem, type PendingPart, type Site, type Walk } from './spice-types.ts';
import { spiceNumber, valueText } from './spice-value.ts';

const TWO_LEAD: Record<string, { kind: PartKind; quantity: 'resistance' | 'capacitance' | 'inductance' }> = {
  r: { kind: 'resistor', quantity: 'resistance' },
  c: { kind: 'capacitor', quantity: 'capacitance' },
  l: { kind: 'inductor', quantity: 'inductance' },
};
const TWO_LEAD_KINDS: PartKind[] = ['resistor', 'capacitor', 'inductor', 'diode', 'led', 'zener'];

/**
 * The two SPICE suffix traps a builder falls into (check-values §10): M is milli, so a
 * resistor "1M" is 1 mΩ; F is femto, so a capacitor "1F" is 1 fF. Both are read the SPICE
 * way, and warned, because a part that small on a board is almost surely a slip.
 */
function suffixTrap(text: string, letter: string): { meaning: string; hint: string } | undefined {
  if (letter === 'r' && /^[+]?[\d.]+(e[+-]?\d+)?m(?!eg|il)/i.test(text))
    return { meaning: 'milliohms (M is milli)', hint: 'write MEG for megohms, e.g. 1MEG' };
  if (letter === 'c' && /^[+]?[\d.]+(e[+-]?\d+)?f/i.test(text))
    return { meaning: 'femtofarads (F is femto)', hint: 'write the farads with a prefix, e.g. 10u or 100n' };
  return undefined;
}

/** Diode kind from a model name (rule in the module comment). */
export function diodeKind(model: string): PartKind {
  if (/led/i.test(model)) return 'led';
  if (/zen|bzx|bzv/i.test(model)) return 'zener';
  return 'diode';
}

function twoLeadPins(kind: PartKind, polarized: boolean): [string, string] {
  if (kind === 'diode' || kind === 'led' || kind === 'zener') return ['A', 'K'];
  if (kind === 'capacitor' && polarized) return ['+', '-'];
  return ['1', '2'];
}

export function base(site: Site, ref: string, kind: PartKind, o: SpiceOverride): PendingPart {
  const p: PendingPart = { ref, from: site.name, line: site.card.line, column: site.card.column, kind, pins: {} };
  if (o.footprint) p.footprint = o.footprint;
  if (o.pinout) p.pinout = o.pinout;
  if (o.polarized !== undefined) p.polarized = o.polarized;
  if (o.package) p.package = o.package;
  return p;
}

export function nodes(w: Walk, site: Site, count: number, what: string): string[] | undefined {
  const words = site.card.words;
  if (words.length < count + 1) {
    problem(w, 'error', site.card, 'spice.missing-node', `${site.name} needs ${count} nodes (${what}) but has ${Math.max(0, words.length - 1)}`, `write "${site.name} ${what}"`, { refs: [site.name] });
    return undefined;
  }
  return words.slice(1, count + 1).map((t) => w.nodes.resolve(t, site.scope));
}

export function readTwoLead(w: Walk, site: Site, ref: string, o: SpiceOverride, letter: string): void {
  const d = TWO_LEAD[letter];
  const isDiode = letter === 'd';
  const ns = nodes(w, site, 2, isDiode ? 'anode cathode model' : 'node1 node2 value');
  if (!ns) return;
  const words = site.card.words;
  let valueTok: Tok | undefined = words[3];
  if (!valueTok && d) valueTok = site.card.params.find((p) => p.key.text.toLowerCase() === letter)?.value;
  let kind: PartKind = d ? d.kind : diodeKind(valueTok?.text ?? '');
  if (o.kind) {
    if (!TWO_LEAD_KINDS.includes(o.kind)) {
      problem(w, 'error', site.card, 'spice.override-kind', `${site.name} has two leads; kind "${o.kind}" does not`, `use one of: ${TWO_LEAD_KINDS.join(', ')}`, { refs: [site.name] });
      return;
    }
    kind = o.kind;
  }
  const part = base(site, ref, kind, o);
  const [a, b] = twoLeadPins(kind, kind === 'capacitor' && o.polarized === true);
  part.pins = { [a]: ns[0]!, [b]: ns[1]! };
  if (o.value) part.value = o.value;
  else if (!valueTok) {
    if (isDiode) problem(w, 'error', site.card, 'spice.no-model', `${site.name} names no diode model`, `write "${site.name} anode cathode 1N4148" (a model name)`, { refs: [site.name] });
    else problem(w, 'error', site.card, 'spice.no-value', `${site.name} has no value`, `write the value after the two nodes, e.g. "${site.name} a b 10k"`, { refs: [site.name] });
    return;
  } else if (isDiode) {
    part.value = valueTok.text.slice(0, 64);
    if (!w.deck.models.has(valueTok.text.toLowerCase()) && !o.kind)
      problem(w, 'note', valueTok, 'spice.model-missing', `${site.name}: no .model ${valueTok.text} in the deck; read as a ${kind} from its name`, 'add a note "* kerfline: NAME kind=led" if that is wrong');
  } else {
    const n = spiceNumber(valueTok.text, d!.quantity);
    if (n === undefined || n.value <= 0) {
      part.value = valueTok.text.slice(0, 64);
      problem(w, 'warning', valueTok, 'spice.value-unread', `${site.name}: the value "${valueTok.text}" is not a plain number; kept as written`, 'write a number with a suffix, e.g. 4.7k or 100n, if the builder should see the value');
    } else {
      part.value = valueText(n.value, d!.quantity);
      if (n.letterCode)
        problem(w, 'note', valueTok, 'spice.letter-code', `${site.name}: "${valueTok.text}" read as ${part.value} (letter-code form; a SPICE3 simulator would read it differently)`, 'write it as 4.7k, 100u … if the deck is also for simulation');
      const trap = suffixTrap(valueTok.text, letter);
      if (trap) problem(w, 'warning', valueTok, 'spice.suffix-trap', `${site.name}: "${valueTok.text}" is ${part.value} in SPICE, ${trap.meaning}`, trap.hint, { refs: [site.name] });
    }
  }
  w.parts.push(part);
}
