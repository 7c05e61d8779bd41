/**
 * File input and output for the command line (Node only; the core stays pure).
 *
 * - `loadCircuit(path, { overrides? }): Promise<Result<LoadedCircuit>>` — by extension:
 *   `.json` is a circuit document; `.cir`, `.sp`, `.spice`, `.net`, `.ckt` are SPICE decks;
 *   anything else is read as JSON when it starts with `{`, else as SPICE (with a note).
 *   The value carries `circuit`, `design`, `warnings`, `source` ('json' | 'spice') and,
 *   for SPICE, the import `report`.
 * - `loadOverrides(path)` — a JSON file `{ "<ref or model>": { kind, package, pins, … } }`
 *   answering the SPICE importer's questions.
 * - `loadLayout(path): Promise<Result<Layout>>` — a layout document.
 * - `printProblems(problems, stream, file?)` — one line each: `file:line:column: message
 *   (fix: hint)`, or `file: json.path: message` where no line is known; warnings and notes
 *   say so after the place.
 * - `writeJsonFile(path, value)` — two-space JSON with a final newline, folders made.
 * A file that cannot be read is a problem (`io.read`), never an exception.
 */
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { dirname, extname } from 'node:path';
import { z } from 'zod';
import { LayoutSchema, type Circuit, type Layout } from '../lib/model/index.ts';
import { parseDocument, zodProblems, parseJsonText } from '../lib/model/parse.ts';
import { fail, formatPath, ok, type Problem, type Result } from '../lib/model/problem.ts';
import { importSpice, parseCircuitText, SpiceOverrideSchema, type Design, type SpiceOverride, type SpiceReport } from '../lib/netlist/index.ts';

export interface LoadedCircuit {
  circuit: Circuit;
  design: Design;
  warnings: Problem[];
  source: 'json' | 'spice';
  report?: SpiceReport;
}

const SPICE_EXT = new Set(['.cir', '.sp', '.spice', '.net', '.ckt']);

async function readText(path: string): Promise<Result<string>> {
  try {
    return ok(await readFile(path, 'utf8'));
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : e instanceof Error ? e.message : String(e);
    return fail([{ code: 'io.read', severity: 'error', path: [], message: `cannot read ${path}: ${why}`, hint: 'check the file name and that the file exists' }]);
  }
}

export async function loadCircuit(path: string, options: { overrides?: Record<string, SpiceOverride> } = {}): Promise<Result<LoadedCircuit>> {
  const text = await readText(path);
  if (!text.ok) return fail(text.problems);
  const ext = extname(path).toLowerCase();
  const notes: Problem[] = [];
  let spice = SPICE_EXT.has(ext);
  if (ext !== '.json' && !spice) {
    spice = !/^\s*\{/.test(text.value);
    notes.push({ code: 'io.guessed-format', severity: 'note', path: [], message: `${path}: the extension "${ext || '(none)'}" does not say the format; read as ${spice ? 'a SPICE netlist' : 'a JSON circuit document'}`, hint: 'name circuit documents .json and SPICE decks .cir' });
  }
  if (spice) {
    const r = importSpice(text.value, options.overrides ? { overrides: options.overrides } : {});
    if (!r.ok) return fail(r.problems, [...notes, ...r.warnings]);
    const warnings = [...notes, ...r.warnings];
    return ok({ circuit: r.value.circuit, design: r.value.design, warnings, source: 'spice', report: r.value.report }, warnings);
  }
  const r = parseCircuitText(text.value);
  if (!r.ok) return fail(r.problems, [...notes, ...r.warnings]);
  const warnings = [...notes, ...r.warnings];
  return ok({ circuit: r.value.circuit, design: r.value.design, warnings, source: 'json' }, warnings);
}

export async function loadOverrides(path: string): Promise<Result<Record<string, SpiceOverride>>> {
  const text = await readText(path);
  if (!text.ok) return fail(text.problems);
  const json = parseJsonText(text.value, 'overrides');
  if (!json.ok) return fail(json.problems);
  const r = z.record(z.string().min(1), SpiceOverrideSchema).safeParse(json.value);
  return r.success ? ok(r.data) : fail(zodProblems(r.error, 'overrides', text.value));
}

export async function loadLayout(path: string): Promise<Result<Layout>> {
  const text = await readText(path);
  if (!text.ok) return fail(text.problems);
  return parseDocument(LayoutSchema, text.value, 'layout');
}

/** One line for one problem, as printProblems writes it. */
export function problemLine(p: Problem, file?: string): string {
  const where = p.line !== undefined ? `${p.line}:${p.column ?? 1}` : p.path.length ? formatPath(p.path) : '';
  const place = [file, where].filter(Boolean).join(file && p.line !== undefined ? ':' : ': ');
  const tag = p.severity === 'error' ? '' : `${p.severity}: `;
  // One line each: a newline inside user text must not break the format.
  const msg = `${tag}${p.message}${p.hint ? ` (fix: ${p.hint})` : ''}`.replace(/[\r\n]+/g, ' ');
  return place ? `${place}: ${msg}` : msg;
}

export function printProblems(problems: Problem[], stream: { write(s: string): unknown }, file?: string): void {
  for (const p of problems) stream.write(problemLine(p, file) + '\n');
}

export async function writeJsonFile(path: string, value: unknown): Promise<void> {
  await mkdir(dirname(path), { recursive: true });
  await writeFile(path, JSON.stringify(value, null, 2) + '\n', 'utf8');
}
