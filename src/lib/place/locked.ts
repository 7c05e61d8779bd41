/**
 * `lockedSpots(problem, refs, previous): Result<Map<part, Spot>>` — where the locked parts
 * must stay: each named part's pins are read from the previous layout and matched to one
 * of its poses. A ref that is not in the design, or not placed in the previous layout, or
 * placed in a shape its footprint cannot take, is a problem (`place.locked-unknown`,
 * `place.locked-unplaced`, `place.locked-shape`).
 */
import type { Layout } from '../model/layout.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import type { PlaceProblem } from './problem.ts';
import type { Spot } from './state.ts';

export function lockedSpots(problem: PlaceProblem, refs: string[], previous: Layout | undefined): Result<Map<number, Spot>> {
  const out = new Map<number, Spot>();
  const problems: Problem[] = [];
  refs.forEach((ref, i) => {
    const p = problem.parts.findIndex((q) => q.ref === ref);
    const path = ['locked', i];
    if (p < 0) {
      problems.push({ code: 'place.locked-unknown', severity: 'error', path, message: `locked part ${ref} is not in the circuit`, hint: 'remove it from the locked list or check the spelling', refs: [ref] });
      return;
    }
    const lp = previous?.parts.find((q) => q.ref === ref);
    if (!lp) {
      problems.push({ code: 'place.locked-unplaced', severity: 'error', path, message: `locked part ${ref} has no place yet to keep`, hint: 'place it once (or plan without locking it), then lock it', refs: [ref] });
      return;
    }
    const part = problem.parts[p]!;
    const at = new Map(lp.pins.map((q) => [q.pin, q.at]));
    const first = at.get(part.pinNames[0]!);
    const k = first
      ? part.poses.findIndex((pose) => pose.pins.every((o, j) => {
          const h = at.get(part.pinNames[j]!);
          return h !== undefined && h[0] - first[0] === o[0] - pose.pins[0]![0] && h[1] - first[1] === o[1] - pose.pins[0]![1];
        }))
      : -1;
    if (k < 0 || !first) {
      problems.push({ code: 'place.locked-shape', severity: 'error', path, message: `locked part ${ref} is placed in a shape its footprint ${part.fp.name} cannot take`, hint: 'unlock it, or move its pins back into the footprint shape', refs: [ref] });
      return;
    }
    const o = part.poses[k]!.pins[0]!;
    out.set(p, { x: first[0] - o[0], y: first[1] - o[1], pose: k });
  });
  return problems.length ? fail(problems) : ok(out);
}
