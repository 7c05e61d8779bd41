/**
 * The circuit's own per-part checks (parts/checkPart), remembered by the part's full JSON
 * and its index: the live editor verifies the same circuit again and again, and the
 * answer depends on nothing else.
 */
import type { CircuitPart } from '../model/circuit.ts';
import type { Problem } from '../model/problem.ts';
import { checkPart } from '../parts/index.ts';

const memo = new Map<string, Problem[]>();
/** Bound on remembered parts. */
const MAX_ENTRIES = 8192;

export function checkCircuitPart(part: CircuitPart, index: number): Problem[] {
  const key = `${index}\u0000${JSON.stringify(part)}`;
  let got = memo.get(key);
  if (!got) {
    got = checkPart(part, ['parts', index]);
    if (memo.size >= MAX_ENTRIES) memo.clear();
    memo.set(key, got);
  }
  return got.map((p) => structuredCopy(p));
}

/** Problems leave the verifier as fresh data (never shared with the memo). */
function structuredCopy(p: Problem): Problem {
  return JSON.parse(JSON.stringify(p)) as Problem;
}
