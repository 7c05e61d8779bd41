/** Problems raised by the values module (codes `value.*`); the caller adds the path. */
import type { Problem, Severity } from '../model/problem.ts';

export function valueProblem(
  code: string,
  text: string,
  message: string,
  hint?: string,
  severity: Severity = 'error',
): Problem {
  return { code, severity, path: [], message, ...(hint !== undefined ? { hint } : {}), data: { text } };
}

/** The text as the user wrote it, quoted and shortened for a message. */
export function quoted(text: string): string {
  const t = text.length > 40 ? `${text.slice(0, 37)}…` : text;
  return JSON.stringify(t);
}
