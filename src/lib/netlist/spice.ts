/**
 * SPICE netlist import.
 *
 * `importSpice(text, options?: { overrides? }): Result<{ circuit: Circuit; design: Design; report: SpiceReport }>`
 *
 * Reads the subset a stripboard needs (R, C, L, D, Q, J, M, X, V, I; `.subckt` flattened,
 * `.model` types, `.global`), skips simulation-only lines with a note, and builds a circuit
 * document: node `0`/`gnd` is net GND (role ground), DC supplies become a power-entry pads
 * part, op-amp sections are packed by prepareDesign. Answers the deck cannot give (a
 * model's polarity, a subcircuit's package and pin map) are questions: problems with codes
 * `spice.ask-…` that fail the import and say which note or override answers them. Every
 * problem carries line and column. Never throws on any input. Rules per element in
 * spice-elements.ts, spice-calls.ts, spice-sources.ts; layout notes in spice-notes.ts.
 */
import { CircuitSchema, type Circuit, type PartKind } from '../model/circuit.ts';
import type { Packing } from '../model/layout.ts';
import { zodProblems } from '../model/parse.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { prepareDesign, type Design } from './design.ts';
import { structureDeck } from './spice-deck.ts';
import { readCards } from './spice-lines.ts';
import { assembleCircuit } from './spice-build.ts';
import { NodeTable } from './spice-nodes.ts';
import { SpiceImportOptionsSchema, type SpiceImportOptions, type SpiceOverride } from './spice-override.ts';
import { decideSources, type SourceUse } from './spice-sources.ts';
import type { PendingPart, Walk } from './spice-types.ts';
import { walkDeck } from './spice-walk.ts';

export interface SpiceReport {
  title: string;
  parts: { ref: string; kind: PartKind; value?: string; from: string; line: number }[];
  nets: { name: string; role?: string; volts?: number; pins: { ref: string; pin: string }[] }[];
  sources: SourceUse[];
  /** Lines not used for the board, and why. */
  skipped: { line: number; what: string }[];
  /** Everything worth telling that is not an error (notes and warnings, with lines). */
  notes: Problem[];
  packing?: Packing;
  spares?: Record<string, Record<string, string>>;
}

export interface SpiceImport {
  circuit: Circuit;
  design: Design;
  report: SpiceReport;
}

/** A title line that looks like an element card (a name with a digit, then two fields). */
const ELEMENT_TITLE = /^[rcldqjmxvi][a-z_]*\d\w*\s+\S+\s+\S+/i;

/** Put a line and column on a problem that points into the circuit built from the deck. */
function locate(p: Problem, parts: PendingPart[], nodes: NodeTable, keyOf: Map<string, string>): Problem {
  if (p.line !== undefined) return p;
  const [a, b] = p.path;
  if (a === 'parts' && typeof b === 'number' && parts[b]) {
    const src = parts[b];
    const out: Problem = { ...p, line: src.line, column: src.column };
    if (p.code === 'part.pinout-defaulted') out.hint = `${p.hint ?? ''}; in the deck: "* kerfline: ${src.from} pinout=EBC" with the real order`;
    if (src.from !== src.ref) out.message = `${p.message} (from ${src.from})`;
    return out;
  }
  if (a === 'nets' && typeof b === 'string') {
    const pos = nodes.position(keyOf.get(b) ?? b.toLowerCase());
    if (pos) return { ...p, ...pos };
  }
  return p;
}

export function importSpice(text: string, options?: SpiceImportOptions): Result<SpiceImport> {
  const opt = SpiceImportOptionsSchema.safeParse(options ?? {});
  if (!opt.success) return fail(zodProblems(opt.error, 'spice.options'));
  const lines = readCards(typeof text === 'string' ? text : '');
  const deck = structureDeck(lines.cards);
  const overrides = new Map<string, SpiceOverride>(Object.entries(opt.data.overrides ?? {}).map(([k, v]) => [k.toLowerCase(), v]));
  const w: Walk = { deck, nodes: new NodeTable(deck.globals), overrides, parts: [], sources: [], problems: [], warnings: [], names: new Set() };
  for (const p of [...lines.problems, ...deck.problems]) (p.severity === 'error' ? w.problems : w.warnings).push(p);
  if (lines.cards.length === 0 && lines.title === '')
    return fail([{ code: 'spice.empty', severity: 'error', path: [], line: 1, column: 1, message: 'the netlist is empty', hint: 'line 1 is the title, then one element per line (R1 a b 10k)' }]);
  if (ELEMENT_TITLE.test(lines.title))
    w.warnings.push({ code: 'spice.title-looks-like-element', severity: 'warning', path: [], line: 1, column: 1, message: `line 1 "${lines.title.slice(0, 40)}" is read as the title, as SPICE always does; it looks like an element`, hint: 'put a title line first, so this element is not lost' });
  const skipped = [...lines.skipped, ...deck.skipped.map((s) => ({ line: s.line, what: s.what }))];
  for (const s of deck.skipped)
    w.warnings.push({ code: s.warn ? 'spice.not-followed' : 'spice.skipped', severity: s.warn ? 'warning' : 'note', path: [], line: s.line, column: 1, message: `skipped ${s.what}` });

  walkDeck(w);

  const taken = new Set([...w.names, ...w.parts.map((p) => p.ref.toLowerCase())]);
  const freeRef = (letter: string): string => {
    let n = 1;
    while (taken.has(`${letter}${n}`.toLowerCase())) n++;
    taken.add(`${letter}${n}`.toLowerCase());
    return `${letter}${n}`;
  };
  const decided = decideSources(w, freeRef);
  const parts = [...w.parts, ...decided.parts];
  if (!deck.top.length && !w.problems.length)
    w.problems.push({ code: 'spice.no-elements', severity: 'error', path: [], line: 1, column: 1, message: 'the netlist holds no elements', hint: 'line 1 is the title; write one element per line after it (R1 a b 10k)' });
  // Elements, but every one simulation-only: an empty board is no answer (and is what
  // random or binary text reads as).
  else if (!parts.length && !w.problems.length)
    w.problems.push({ code: 'spice.nothing-to-place', severity: 'error', path: [], line: 1, column: 1, message: 'no element of the netlist can go on a board: every one was left out (see the warnings)', hint: 'a deck for Kerfline needs real parts (R, C, L, D, Q, J, M or a subcircuit with a layout note)' });

  const { input, keyOf } = assembleCircuit(w, parts, decided, lines.title);
  const problems = w.problems.slice();
  const warnings = w.warnings.slice();
  const parsed = CircuitSchema.safeParse(input);
  if (!parsed.success) problems.push(...zodProblems(parsed.error, 'circuit').map((p) => locate(p, parts, w.nodes, keyOf)));
  if (problems.length || !parsed.success) return fail(problems, warnings);

  const design = prepareDesign(parsed.data);
  warnings.push(...design.warnings.map((p) => locate(p, parts, w.nodes, keyOf)));
  if (!design.ok) return fail(design.problems.map((p) => locate(p, parts, w.nodes, keyOf)), warnings);
  const report: SpiceReport = {
    title: parsed.data.title,
    parts: parts.map((p) => ({ ref: p.ref, kind: p.kind, ...(p.value !== undefined ? { value: p.value } : {}), from: p.from, line: p.line })),
    nets: design.value.nets.map((n) => ({ name: n.name, ...n.info, pins: n.pins })),
    sources: decided.uses,
    skipped: skipped.sort((a, b) => a.line - b.line),
    notes: warnings,
  };
  if (design.value.packing) report.packing = design.value.packing;
  if (design.value.spares) report.spares = design.value.spares;
  return ok({ circuit: parsed.data, design: design.value, report }, warnings);
}
