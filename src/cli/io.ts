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
 * - `writeTextFile(path, data): Promise<Result<void>>` — the same for any text or bytes; a
 *   file that cannot be written is a problem (`io.write`).
 * A file that cannot be read is a problem, never an exception: `io.read` (missing, a folder,
 * no permission), `io.empty`, `io.not-text` (binary data), `io.wrong-document` (a layout
 * where a circuit belongs, or the other way round).
 */
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { dirname, extname } from 'node:path';
import { z } from 'zod';
import { LayoutSchema, type Circuit, type Layout } from '../lib/model/index.ts';
import { parseDocument, zodProblems, parseJsonText } from '../lib/model/parse.ts';
import { fail, formatPath, ok, type Problem, type Result } from '../lib/model/problem.ts';
import { locateJsonPath } from '../lib/model/json-locate.ts';
import { importSpice, parseCircuitText, SpiceOverrideSchema, type Design, type SpiceOverride, type SpiceReport } from '../lib/netlist/index.ts';

export interface LoadedCircuit {
  circuit: Circuit;
  design: Design;
  warnings: Problem[];
  source: 'json' | 'spice';
  report?: SpiceReport;
}

const SPICE_EXT = new Set(['.cir', '.sp', '.spice', '.net', '.ckt']);

type FileRole = 'circuit' | 'layout' | 'overrides';

const EXPECTED: Record<FileRole, string> = {
  circuit: 'a circuit document (JSON with "format": "kerfline.circuit") or a SPICE netlist (.cir)',
  layout: 'a layout document (JSON with "format": "kerfline.layout")',
  overrides: 'a JSON object of answers, { "<ref or model>": { "kind": … } }',
};

/** Share of a text that is control characters or undecodable bytes above which it is not text. */
const BINARY_SHARE = 0.05;

async function readText(path: string, role: FileRole): Promise<Result<string>> {
  let bytes: Buffer;
  try {
    bytes = await readFile(path);
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : e instanceof Error ? e.message : String(e);
    return fail([{ code: 'io.read', severity: 'error', path: [], message: `cannot read ${path}: ${why}`, hint: 'check the file name and that the file exists' }]);
  }
  // A byte-order mark from some editors is not part of the text (JSON.parse refuses it).
  const text = bytes.toString('utf8').replace(/^\uFEFF/, '');
  if (!text.trim()) return fail([{ code: 'io.empty', severity: 'error', path: [], line: 1, column: 1, message: 'the file is empty', hint: `give ${EXPECTED[role]}` }]);
  const sample = text.slice(0, 4096);
  const odd = sample.match(/[\u0000-\u0008\u000e-\u001f\u007f\ufffd]/g)?.length ?? 0;
  if (bytes.includes(0) || odd > BINARY_SHARE * sample.length)
    return fail([{ code: 'io.not-text', severity: 'error', path: [], message: 'not a text file: it holds binary data', hint: `give ${EXPECTED[role]}, saved as plain UTF-8 text` }]);
  return ok(text);
}

const FORMATS: Record<string, string> = { 'kerfline.circuit': 'circuit', 'kerfline.layout': 'layout', 'kerfline.project': 'project' };

/** A Kerfline document of another kind where `role` belongs: one clear problem instead of a page of schema errors. */
function wrongDocument(text: string, role: 'circuit' | 'layout'): Problem | undefined {
  let format: unknown;
  try {
    format = (JSON.parse(text) as { format?: unknown } | null)?.format;
  } catch {
    return undefined;
  }
  const kind = typeof format === 'string' ? FORMATS[format] : undefined;
  if (!kind || kind === role) return undefined;
  const where = locateJsonPath(text, ['format']);
  const fromProject = role === 'layout' ? 'the app exports one from a project (Layout JSON)' : 'a project keeps its circuit under "circuit": save that object as a file of its own';
  const hint = kind === 'project' ? `give ${EXPECTED[role]}; ${fromProject}` : `give ${EXPECTED[role]} here (the circuit file goes first, the layout second)`;
  return { code: 'io.wrong-document', severity: 'error', path: ['format'], ...(where ?? {}), message: `this is a ${kind} document ("format": "${String(format)}"), not a ${role}`, hint };
}

export async function loadCircuit(path: string, options: { overrides?: Record<string, SpiceOverride> } = {}): Promise<Result<LoadedCircuit>> {
  const text = await readText(path, 'circuit');
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
  const wrong = wrongDocument(text.value, 'circuit');
  if (wrong) return fail([wrong], notes);
  const r = parseCircuitText(text.value);
  if (!r.ok) return fail(r.problems, [...notes, ...r.warnings]);
  const warnings = [...notes, ...r.warnings];
  return ok({ circuit: r.value.circuit, design: r.value.design, warnings, source: 'json' }, warnings);
}

export async function loadOverrides(path: string): Promise<Result<Record<string, SpiceOverride>>> {
  const text = await readText(path, 'overrides');
  if (!text.ok) return fail(text.problems);
  const json = parseJsonText(text.value, 'overrides');
  if (!json.ok) return fail(json.problems);
  const r = z.record(z.string().min(1), SpiceOverrideSchema).safeParse(json.value);
  return r.success ? ok(r.data) : fail(zodProblems(r.error, 'overrides', text.value));
}

export async function loadLayout(path: string): Promise<Result<Layout>> {
  const text = await readText(path, 'layout');
  if (!text.ok) return fail(text.problems);
  const wrong = wrongDocument(text.value, 'layout');
  if (wrong) return fail([wrong]);
  return parseDocument(LayoutSchema, text.value, 'layout');
}

/** One line for one problem, as printProblems writes it. */
export function problemLine(p: Problem, file?: string): string {
  const where = p.line !== undefined ? `${p.line}:${p.column ?? 1}` : p.path.length ? formatPath(p.path) : '';
  const place = [file, where].filter(Boolean).join(file && p.line !== undefined ? ':' : ': ');
  // With a line, the JSON path still says which field (parts[0].pins[0].at[0]).
  const field = p.line !== undefined && p.path.length ? `${formatPath(p.path)}: ` : '';
  const tag = p.severity === 'error' ? '' : `${p.severity}: `;
  // One line each, and nothing from a file steers the terminal: control characters
  // (newlines, escape sequences) inside user text become spaces.
  const line = `${place ? `${place}: ` : ''}${field}${tag}${p.message}${p.hint ? ` (fix: ${p.hint})` : ''}`;
  return line.replace(/[\u0000-\u001f\u007f-\u009f]+/g, ' ');
}

export function printProblems(problems: Problem[], stream: { write(s: string): unknown }, file?: string): void {
  for (const p of problems) stream.write(problemLine(p, file) + '\n');
}

export async function writeJsonFile(path: string, value: unknown): Promise<void> {
  await mkdir(dirname(path), { recursive: true });
  await writeFile(path, JSON.stringify(value, null, 2) + '\n', 'utf8');
}

export async function writeTextFile(path: string, data: string | Uint8Array): Promise<Result<void>> {
  try {
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, data);
    return ok(undefined);
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' || code === 'EPERM' || code === 'EROFS' ? 'permission denied' : code === 'ENOENT' || code === 'EEXIST' || code === 'ENOTDIR' ? 'its folder cannot be made there' : e instanceof Error ? e.message : String(e);
    return fail([{ code: 'io.write', severity: 'error', path: [], message: `cannot write ${path}: ${why}`, hint: 'give a file name in a folder you can write to' }]);
  }
}
