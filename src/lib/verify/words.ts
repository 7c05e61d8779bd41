/** Bench wording shared by the verifier's checks: hole labels, pin names, short lists. */
import { holeLabelBoth } from '../board/index.ts';
import type { Hole, Problem, Severity } from '../model/problem.ts';

/** "C7 (copper C18)". */
export function at(h: Hole, cols: number): string {
  const x = h[0];
  const y = h[1];
  if (!(Number.isInteger(x) && Number.isInteger(y) && x >= 0 && x < cols && y >= 0)) return holeLabelBoth(h, cols);
  if (labels.cols !== cols || labels.text.size >= MAX_LABELS) {
    labels.cols = cols;
    labels.text.clear();
  }
  const i = x + y * cols;
  let got = labels.text.get(i);
  if (got === undefined) labels.text.set(i, (got = holeLabelBoth(h, cols)));
  return got;
}

/** Labels made so far, for one board width (the same few boards are checked again and again). */
const labels = { cols: -1, text: new Map<number, string>() };
/** Bound on remembered labels. */
const MAX_LABELS = 65536;

export function pinText(ref: string, pin: string): string {
  return `${ref} pin ${pin}`;
}

/** "a, b and c"; long lists end in "and N more". */
export function listText(items: readonly string[], max = 8): string {
  if (items.length <= 1) return items[0] ?? '';
  if (items.length > max) return `${items.slice(0, max).join(', ')} and ${items.length - max} more`;
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

export type ProblemExtra = Partial<Pick<Problem, 'hint' | 'refs' | 'nets' | 'holes' | 'pins' | 'data'>>;

/** Build a problem with only the fields that are set (so equal checks give equal data). */
export function problem(code: string, severity: Severity, path: (string | number)[], message: string, extra: ProblemExtra = {}): Problem {
  const p: Problem = { code, severity, path, message };
  if (extra.hint !== undefined) p.hint = extra.hint;
  if (extra.refs?.length) p.refs = extra.refs;
  if (extra.nets?.length) p.nets = extra.nets;
  if (extra.holes?.length) p.holes = extra.holes;
  if (extra.pins?.length) p.pins = extra.pins;
  if (extra.data) p.data = extra.data;
  return p;
}

/** Holes in reading order: top to bottom, then left to right. */
export function byReading(a: Hole, b: Hole): number {
  return a[1] - b[1] || a[0] - b[0];
}

/** A total order on problems, so any way of collecting them gives one list. */
export function canonical(list: Problem[]): Problem[] {
  return [...list].sort(compareProblems);
}

/** Path segment by segment (numbers before names), then code, message and holes. */
function compareProblems(a: Problem, b: Problem): number {
  const n = Math.min(a.path.length, b.path.length);
  for (let i = 0; i < n; i++) {
    const x = a.path[i]!;
    const y = b.path[i]!;
    if (x === y) continue;
    if (typeof x === 'number' && typeof y === 'number') return x - y;
    if (typeof x === 'number') return -1;
    if (typeof y === 'number') return 1;
    return x < y ? -1 : 1;
  }
  if (a.path.length !== b.path.length) return a.path.length - b.path.length;
  if (a.code !== b.code) return a.code < b.code ? -1 : 1;
  if (a.message !== b.message) return a.message < b.message ? -1 : 1;
  const ha = JSON.stringify(a.holes ?? []);
  const hb = JSON.stringify(b.holes ?? []);
  return ha < hb ? -1 : ha > hb ? 1 : 0;
}
