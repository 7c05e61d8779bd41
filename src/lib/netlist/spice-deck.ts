/**
 * Structure of a SPICE deck: cards → top-level elements, `.subckt` definitions, `.model`
 * types, `.global` nodes and layout notes.
 *
 * `structureDeck(cards): DeckStructure`
 *
 * Definitions nested inside a `.subckt` are collected like top-level ones (names are one
 * namespace, compared without case). Simulation-only dot commands (.tran, .ac, .dc, .op,
 * .param, .options, .print, .include, .lib, .ic, .meas …) are skipped and listed for the
 * report; `.include` and `.lib` are warnings, since parts in those files are not read.
 */
import type { Problem } from '../model/problem.ts';
import type { Card, Tok } from './spice-lines.ts';
import { parseNote } from './spice-notes.ts';
import { mergeOverrides, type SpiceOverride } from './spice-override.ts';

export interface Subckt {
  name: Tok;
  ports: Tok[];
  body: Card[];
  /** Notes written inside the body (speak for the subcircuit). */
  note?: SpiceOverride;
  line: number;
}

export interface ModelDef {
  name: Tok;
  /** Device type as written after the name: NPN, PNP, D, NJF, PJF, NMOS, PMOS, VDMOS … (upper case). */
  type: string;
  /** Whether the model's parameters mark a P-channel part (VDMOS `pchan`). */
  pchan: boolean;
  line: number;
}

export interface DeckStructure {
  top: Card[];
  subckts: Map<string, Subckt>;
  models: Map<string, ModelDef>;
  globals: Set<string>;
  /** Notes at top level, keyed by lower-case target. */
  notes: Map<string, { override: SpiceOverride; line: number }>;
  skipped: { line: number; what: string; warn: boolean }[];
  problems: Problem[];
}

const SIM_ONLY = new Set([
  '.tran', '.ac', '.dc', '.op', '.noise', '.tf', '.sens', '.pz', '.disto', '.four', '.sp', '.pss',
  '.param', '.options', '.option', '.opt', '.print', '.plot', '.probe', '.save', '.meas', '.measure',
  '.ic', '.nodeset', '.temp', '.width', '.func', '.csparam', '.title', '.endc', '.step', '.data',
]);

export function structureDeck(cards: Card[]): DeckStructure {
  const out: DeckStructure = { top: [], subckts: new Map(), models: new Map(), globals: new Set(), notes: new Map(), skipped: [], problems: [] };
  const stack: Subckt[] = [];
  const err = (t: { line: number; column: number }, code: string, message: string, hint: string) =>
    out.problems.push({ code, severity: 'error', path: [], line: t.line, column: t.column, message, hint });
  for (const card of cards) {
    const cur = stack[stack.length - 1];
    if (card.kind === 'note') {
      const n = parseNote(card);
      out.problems.push(...n.problems);
      if (cur && !n.target) cur.note = mergeOverrides(cur.note, n.override);
      else if (!n.target) err(card, 'spice.bad-note', 'a layout note outside a .subckt must name its target first', 'write "* kerfline: C5 polarized=true" (target, then fields)');
      else {
        const key = n.target.text.toLowerCase();
        const prev = out.notes.get(key);
        out.notes.set(key, { override: mergeOverrides(prev?.override, n.override), line: prev?.line ?? card.line });
      }
      continue;
    }
    if (card.kind === 'element') {
      (cur ? cur.body : out.top).push(card);
      continue;
    }
    const head = card.words[0]!;
    const cmd = head.text.toLowerCase();
    if (cmd === '.subckt') {
      const name = card.words[1];
      if (!name) {
        err(head, 'spice.bad-subckt', '.subckt needs a name and its port nodes', 'write ".subckt name node1 node2 …"');
        stack.push({ name: { text: '?', line: card.line, column: card.column }, ports: [], body: [], line: card.line });
        continue;
      }
      const words = card.words.slice(2);
      const pi = words.findIndex((w) => /^params:$/i.test(w.text));
      const ports = pi >= 0 ? words.slice(0, pi) : words;
      for (const p of ports)
        if (p.text === '0' || p.text.toLowerCase() === 'gnd')
          err(p, 'spice.ground-port', `.subckt ${name.text}: the ground node ${p.text} cannot be a port`, 'ground is global inside every subcircuit; remove it from the port list');
      const sub: Subckt = { name, ports, body: [], line: card.line };
      const key = name.text.toLowerCase();
      if (out.subckts.has(key)) err(name, 'spice.duplicate-subckt', `.subckt ${name.text} is defined twice (first on line ${out.subckts.get(key)!.line})`, 'rename or remove one of them');
      else out.subckts.set(key, sub);
      stack.push(sub);
      continue;
    }
    if (cmd === '.ends') {
      const closed = stack.pop();
      if (!closed) err(head, 'spice.stray-ends', '.ends with no open .subckt', 'remove it, or add the .subckt line it closes');
      else if (card.words[1] && card.words[1].text.toLowerCase() !== closed.name.text.toLowerCase())
        out.problems.push({ code: 'spice.ends-name', severity: 'warning', path: [], line: card.line, column: card.words[1].column, message: `.ends ${card.words[1].text} closes .subckt ${closed.name.text} (line ${closed.line})`, hint: `write ".ends ${closed.name.text}"` });
      continue;
    }
    if (cmd === '.model') {
      const name = card.words[1];
      const type = card.words[2];
      if (!name || !type) {
        err(head, 'spice.bad-model', '.model needs a name and a device type', 'write ".model QN NPN(BF=200)"');
        continue;
      }
      const pchan = card.words.slice(3).some((w) => /^pchan$/i.test(w.text)) || card.params.some((p) => /^pchan$/i.test(p.key.text) && !/^0$/.test(p.value.text));
      out.models.set(name.text.toLowerCase(), { name, type: type.text.toUpperCase(), pchan, line: card.line });
      out.skipped.push({ line: card.line, what: `.model ${name.text} parameters (simulation only; its device type ${type.text.toUpperCase()} is used)`, warn: false });
      continue;
    }
    if (cmd === '.global') {
      for (const w of card.words.slice(1)) out.globals.add(w.text.toLowerCase());
      continue;
    }
    if (cmd === '.include' || cmd === '.inc' || cmd === '.lib') {
      out.skipped.push({ line: card.line, what: `${head.text} ${card.words.slice(1).map((w) => w.text).join(' ')}: another file, not read (parts or models in it are missing)`, warn: true });
      continue;
    }
    out.skipped.push({ line: card.line, what: `${head.text}${SIM_ONLY.has(cmd) ? ' (simulation only)' : ' (not a layout command)'}`, warn: false });
  }
  for (const s of stack) err({ line: s.line, column: 1 }, 'spice.unclosed-subckt', `.subckt ${s.name.text} is never closed`, `add ".ends ${s.name.text}" after its last element`);
  return out;
}
