/**
 * Problems are data (style habit 8): a stable `code`, a `path` into the document, the
 * subjects it concerns, and English text made by the module that found it (`message` says
 * what is wrong, `hint` how to fix it). Tests match `code`, never wording.
 */
export type Hole = [number, number];

export type Severity = 'error' | 'warning' | 'note';

export interface Problem {
  /** Stable machine code, e.g. `spice.unknown-element`, `verify.short`. */
  code: string;
  severity: Severity;
  /** Path into the document: JSON path segments, or [] for whole-document problems. */
  path: (string | number)[];
  /** 1-based line and column for text inputs (SPICE, JSON text). */
  line?: number;
  column?: number;
  /** What was wrong, naming the thing as the user wrote it. */
  message: string;
  /** How to fix it. */
  hint?: string;
  refs?: string[];
  nets?: string[];
  holes?: Hole[];
  pins?: { ref: string; pin: string }[];
  data?: Record<string, unknown>;
}

/** Success-or-problems result for expected failures (style habit 11). */
export type Result<T> =
  | { ok: true; value: T; warnings: Problem[] }
  | { ok: false; problems: Problem[]; warnings: Problem[] };

export function ok<T>(value: T, warnings: Problem[] = []): Result<T> {
  return { ok: true, value, warnings };
}

export function fail<T>(problems: Problem[], warnings: Problem[] = []): Result<T> {
  return { ok: false, problems: sortProblems(problems), warnings };
}

/** Readable dotted path: `parts[3].pins.K`. */
export function formatPath(path: (string | number)[]): string {
  let out = '';
  for (const seg of path) {
    if (typeof seg === 'number') out += `[${seg}]`;
    else if (/^[A-Za-z_$][\w$]*$/.test(seg)) out += out ? `.${seg}` : seg;
    else out += `[${JSON.stringify(seg)}]`;
  }
  return out || '(document)';
}

/** One-line form: `line 4, column 7: message (fix: hint)` or `parts[2].value: message`. */
export function formatProblem(p: Problem): string {
  const where =
    p.line !== undefined
      ? `line ${p.line}${p.column !== undefined ? `, column ${p.column}` : ''}`
      : formatPath(p.path);
  const tag = p.severity === 'error' ? 'error' : p.severity;
  return `${tag} ${where}: ${p.message}${p.hint ? ` (fix: ${p.hint})` : ''}`;
}

/** Sort by position: line/column first, then path segments. */
export function sortProblems(list: Problem[]): Problem[] {
  const key = (p: Problem) => p.path.map((s) => (typeof s === 'number' ? String(s).padStart(6, '0') : s)).join('\u0000');
  return [...list].sort(
    (a, b) =>
      (a.line ?? 0) - (b.line ?? 0) ||
      (a.column ?? 0) - (b.column ?? 0) ||
      (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0),
  );
}
