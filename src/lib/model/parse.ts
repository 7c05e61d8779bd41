/**
 * Reading documents at the boundary: JSON text → zod-validated value, with every problem
 * located by JSON path and, where the text is at hand, by line and column. Never throws.
 */
import type { z } from 'zod';
import { fail, ok, type Problem, type Result } from './problem.ts';
import { jsonErrorOffset, locateJsonPath, offsetToLineColumn } from './json-locate.ts';

/** Turn zod issues into problems (one per issue, all of them). */
export function zodProblems(error: z.ZodError, prefix: string, text?: string): Problem[] {
  return error.issues.map((issue) => {
    const path = issue.path.map((s) => (typeof s === 'symbol' ? String(s) : s)) as (string | number)[];
    const where = text !== undefined ? locateJsonPath(text, path) : undefined;
    const p: Problem = {
      code: `${prefix}.${issue.code}`,
      severity: 'error',
      path,
      message: issue.message,
      hint: hintFor(issue),
    };
    if (where) {
      p.line = where.line;
      p.column = where.column;
    }
    return p;
  });
}

function hintFor(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'invalid_type':
      return `give a value of type ${issue.expected}`;
    case 'invalid_value':
      return `use one of: ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
    case 'unrecognized_keys':
      return `remove or rename ${issue.keys.join(', ')}`;
    case 'too_small':
      return `give at least ${String(issue.minimum)}`;
    case 'too_big':
      return `give at most ${String(issue.maximum)}`;
    case 'invalid_format':
      return 'check the spelling against the format in DEVELOPERS.md';
    default:
      return 'see the document format in DEVELOPERS.md and static/schema/';
  }
}

/** Parse JSON text; a syntax error becomes a problem with line and column. */
export function parseJsonText(text: string, prefix: string): Result<unknown> {
  try {
    return ok(JSON.parse(text) as unknown);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const m = /position (\d+)/.exec(msg);
    // No position in the engine's message: find the place ourselves.
    const found = m ? Number(m[1]) : /line (\d+) column (\d+)/.test(msg) || typeof text !== 'string' ? undefined : jsonErrorOffset(text);
    const at = found ?? (/end of (JSON )?input/i.test(msg) && typeof text === 'string' ? text.length : undefined);
    const lc = at !== undefined ? offsetToLineColumn(text, at) : /line (\d+) column (\d+)/.exec(msg);
    const p: Problem = {
      code: `${prefix}.json-syntax`,
      severity: 'error',
      path: [],
      message: `not valid JSON: ${msg.replace(/^JSON\.parse: /, '')}`,
      hint: 'check for a missing comma, quote or bracket near this place',
    };
    if (lc && !Array.isArray(lc)) {
      p.line = lc.line;
      p.column = lc.column;
    } else if (Array.isArray(lc)) {
      p.line = Number(lc[1]);
      p.column = Number(lc[2]);
    }
    return fail([p]);
  }
}

/** Validate an already-parsed value against a schema. */
export function validate<S extends z.ZodType>(schema: S, value: unknown, prefix: string, text?: string): Result<z.infer<S>> {
  const r = schema.safeParse(value);
  if (r.success) return ok(r.data as z.infer<S>);
  return fail(zodProblems(r.error, prefix, text));
}

/** JSON text → validated value. */
export function parseDocument<S extends z.ZodType>(schema: S, text: string, prefix: string): Result<z.infer<S>> {
  const j = parseJsonText(text, prefix);
  if (!j.ok) return fail(j.problems);
  return validate(schema, j.value, prefix, text);
}
