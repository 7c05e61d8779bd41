/**
 * Circuit document text → circuit and design.
 *
 * `parseCircuitText(text): Result<{ circuit: Circuit; design: Design }>`
 *
 * Parses JSON, validates against CircuitSchema, then binds footprints and packs op-amp
 * sections (prepareDesign). Every problem and warning carries its JSON path and, found in
 * the text, its line and column. All problems come in one pass: when the schema rejects
 * the document, the parts that are well formed are still checked against their kinds and
 * for repeated references, so one run shows everything to fix. Never throws.
 */
import { CircuitPartSchema, CircuitSchema, type Circuit } from '../model/circuit.ts';
import { locateJsonPath, offsetToLineColumn } from '../model/json-locate.ts';
import { parseJsonText, zodProblems } from '../model/parse.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { checkPart } from '../parts/kinds.ts';
import { prepareDesign, type Design } from './design.ts';

/**
 * Line and column for a problem. A net that the `nets` object does not describe is found
 * where a pin first names it, which is where the writer typed it.
 */
function placed(text: string, p: Problem, circuit?: Circuit): Problem {
  if (p.line !== undefined) return p;
  let path = p.path;
  const [a, net] = p.path;
  if (circuit && a === 'nets' && typeof net === 'string' && !(net in circuit.nets)) {
    const i = circuit.parts.findIndex((part) => Object.values(part.pins).includes(net));
    const pin = i >= 0 ? Object.entries(circuit.parts[i]!.pins).find(([, n]) => n === net)?.[0] : undefined;
    if (pin !== undefined) path = ['parts', i, 'pins', pin];
  }
  const where = locateJsonPath(text, path);
  return where ? { ...p, line: where.line, column: where.column } : p;
}

/** Kind checks on the parts that pass the part schema, for a document the schema refused. */
function partProblems(raw: unknown): Problem[] {
  const parts = raw && typeof raw === 'object' && Array.isArray((raw as { parts?: unknown }).parts) ? ((raw as { parts: unknown[] }).parts) : [];
  const out: Problem[] = [];
  const seen = new Map<string, number>();
  parts.forEach((value, i) => {
    const r = CircuitPartSchema.safeParse(value);
    if (!r.success) return;
    const prev = seen.get(r.data.ref);
    if (prev !== undefined)
      out.push({ code: 'circuit.duplicate-ref', severity: 'error', path: ['parts', i, 'ref'], message: `reference ${r.data.ref} is used twice (parts[${prev}] and parts[${i}])`, hint: 'rename one of them', refs: [r.data.ref] });
    else seen.set(r.data.ref, i);
    out.push(...checkPart(r.data, ['parts', i]));
  });
  return out;
}

export function parseCircuitText(text: string): Result<{ circuit: Circuit; design: Design }> {
  const src = typeof text === 'string' ? text : '';
  const json = parseJsonText(src, 'circuit');
  // A syntax error with no position (empty or cut-off text) is at the end of the text.
  if (!json.ok) return fail(json.problems.map((p) => (p.line !== undefined ? p : { ...p, ...offsetToLineColumn(src, src.length) })));
  const r = CircuitSchema.safeParse(json.value);
  if (!r.success) {
    const problems = [...zodProblems(r.error, 'circuit', src), ...partProblems(json.value)];
    return fail(problems.map((p) => placed(src, p)));
  }
  const design = prepareDesign(r.data);
  const warnings = design.warnings.map((p) => placed(src, p, r.data));
  if (!design.ok) return fail(design.problems.map((p) => placed(src, p, r.data)), warnings);
  return ok({ circuit: r.data, design: design.value }, warnings);
}
