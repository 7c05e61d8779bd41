/** Shared shapes of the SPICE importer's passes (private to the netlist module). */
import type { PartKind } from '../model/circuit.ts';
import type { Problem } from '../model/problem.ts';
import type { DeckStructure } from './spice-deck.ts';
import type { Tok } from './spice-lines.ts';
import type { NodeTable, Scope } from './spice-nodes.ts';
import type { SpiceOverride } from './spice-override.ts';

/** A board part found in the deck; pins map to node keys (see NodeTable). */
export interface PendingPart {
  ref: string;
  /** Element name as written, with the call path (`X1.R3`). */
  from: string;
  line: number;
  column: number;
  kind: PartKind;
  value?: string;
  pins: Record<string, string>;
  footprint?: string;
  package?: string;
  pinout?: string;
  polarized?: boolean;
  count?: number;
  labels?: Record<string, string>;
}

/** An independent source (V or I), decided into supply, probe or signal later. */
export interface PendingSource {
  name: string;
  line: number;
  column: number;
  plus: string;
  minus: string;
  /** DC value when the source is a plain DC voltage source (no AC, no transient shape). */
  dc?: number;
  current: boolean;
}

export interface Walk {
  deck: DeckStructure;
  nodes: NodeTable;
  overrides: Map<string, SpiceOverride>;
  parts: PendingPart[];
  sources: PendingSource[];
  problems: Problem[];
  warnings: Problem[];
  /** Every element name in use (lower case), for clash-free refs. */
  names: Set<string>;
}

export interface Site {
  card: { line: number; column: number; words: Tok[]; params: { key: Tok; value: Tok }[] };
  scope: Scope;
  /** Element name with its call path, as written. */
  name: string;
}

export function at(t: { line: number; column: number }): { line: number; column: number } {
  return { line: t.line, column: t.column };
}

export function problem(w: Walk, severity: 'error' | 'warning' | 'note', t: { line: number; column: number }, code: string, message: string, hint?: string, extra?: Partial<Problem>): void {
  const p: Problem = { code, severity, path: [], ...at(t), message, ...(hint ? { hint } : {}), ...extra };
  (severity === 'error' ? w.problems : w.warnings).push(p);
}
