/**
 * Reading what the user typed or dropped.
 *
 * - `readSource(source)` → Result<{ circuit, design }>: JSON circuit text through
 *   parseCircuitText, SPICE-syntax text through importSpice. Problems carry line numbers
 *   for the circuit pane.
 * - `sniffFile(name, text)` → what a file is: a project, a circuit document, a layout
 *   document or a SPICE-syntax netlist, by its `format` field, else by its extension
 *   (.cir .sp .spice .net are netlists), else by whether it looks like JSON.
 */
import type { Circuit, Problem, Result, Source } from '../../lib/model/index.ts';
import { importSpice, parseCircuitText } from '../../lib/netlist/index.ts';
import type { Design } from '../../lib/netlist/design.ts';

export interface Reading {
  circuit: Circuit;
  design: Design;
  warnings: Problem[];
}

export function readSource(source: Source): Result<Reading> {
  const r = source.kind === 'spice' ? importSpice(source.text) : parseCircuitText(source.text);
  if (!r.ok) return r;
  return { ok: true, value: { circuit: r.value.circuit, design: r.value.design, warnings: r.warnings }, warnings: r.warnings };
}

export type FileKind = 'project' | 'circuit' | 'layout' | 'spice' | 'unknown-json';

const NETLIST_EXT = /\.(cir|sp|spice|net|ckt)$/i;

export function sniffFile(name: string, text: string): FileKind {
  const head = text.trimStart();
  if (head.startsWith('{')) {
    const m = /"format"\s*:\s*"kerfline\.(project|circuit|layout)"/.exec(text.slice(0, 4096));
    if (m) return m[1] as 'project' | 'circuit' | 'layout';
    if (!NETLIST_EXT.test(name)) return 'unknown-json';
  }
  return NETLIST_EXT.test(name) || !head.startsWith('{') ? 'spice' : 'unknown-json';
}
