/**
 * Line bookkeeping for the circuit text box: `lineStarts(text)` → the offset where each line
 * begins (always at least one line); `problemLines(problems)` → line → the worst severity
 * reported there, for marking the gutter.
 */
import type { Problem, Severity } from '../../lib/model/index.ts';

export function lineStarts(text: string): number[] {
  const out = [0];
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) out.push(i + 1);
  return out;
}

const RANK: Record<Severity, number> = { error: 3, warning: 2, note: 1 };

export function problemLines(problems: readonly Problem[]): Map<number, Severity> {
  const out = new Map<number, Severity>();
  for (const p of problems) {
    if (p.line === undefined) continue;
    const was = out.get(p.line);
    if (!was || RANK[p.severity] > RANK[was]) out.set(p.line, p.severity);
  }
  return out;
}
