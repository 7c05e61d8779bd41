/**
 * The live check behind the board: after an edit, re-route the placement and re-verify.
 *
 * `new Checker(circuit, design?, now = performance.now)`:
 * - `afterEdit(placement, changedRefs, previous, routeOptions?)` → Checked. Routes the
 *   placement (cuts, links, wires recomputed by routeLayout), then re-verifies incrementally
 *   with the changed refs. When the router cannot route it, the placement keeps the copper
 *   of `previous` and the router's problems are listed beside the verifier's findings, so
 *   the board shows exactly what would be built.
 * - `check(layout)` → Checked for a layout taken as it is (opened, undone, auto-placed):
 *   no routing; incremental against the last layout seen, with the parts that changed.
 * `design` is undefined when the circuit has problems; then nothing is routed.
 */
import type { Circuit, Layout, LayoutPart, Problem, RouteOptionsInput } from '../../lib/model/index.ts';
import type { Design } from '../../lib/netlist/design.ts';
import { routeLayout } from '../../lib/route/index.ts';
import { createVerifier, type VerifyReport } from '../../lib/verify/index.ts';

export interface Checked {
  layout: Layout;
  report: VerifyReport;
  /** Problems from routing (empty when it routed or when nothing was routed). */
  routeProblems: Problem[];
  /** Router figures of the last successful route. */
  stats?: Record<string, number>;
  timing: { routeMs: number; verifyMs: number; totalMs: number };
}

function samePart(a: LayoutPart, b: LayoutPart): boolean {
  if (a === b) return true;
  if (a.footprint !== b.footprint || a.pins.length !== b.pins.length) return false;
  return a.pins.every((p, i) => {
    const q = b.pins[i]!;
    return p.pin === q.pin && p.at[0] === q.at[0] && p.at[1] === q.at[1];
  });
}

/** Refs whose footprint or pin holes differ between two layouts, added and removed ones included. */
export function changedRefs(before: Layout | undefined, after: Layout): string[] {
  if (!before) return after.parts.map((p) => p.ref);
  const old = new Map(before.parts.map((p) => [p.ref, p]));
  const out: string[] = [];
  for (const p of after.parts) {
    const q = old.get(p.ref);
    if (!q || !samePart(p, q)) out.push(p.ref);
    old.delete(p.ref);
  }
  out.push(...old.keys());
  return out;
}

export class Checker {
  private readonly verifier;
  private last: Layout | undefined;

  constructor(
    readonly circuit: Circuit,
    readonly design: Design | undefined,
    private readonly now: () => number = () => performance.now(),
  ) {
    this.verifier = createVerifier(circuit);
  }

  afterEdit(placement: Layout, changed: string[], previous: Layout, routeOptions?: RouteOptionsInput): Checked {
    const t0 = this.now();
    let layout = placement;
    let routeProblems: Problem[] = [];
    let stats: Record<string, number> | undefined;
    if (this.design) {
      const routed = routeLayout(this.design, placement, routeOptions);
      if (routed.ok) {
        layout = routed.value.layout;
        stats = { ...routed.value.stats };
      } else {
        layout = { ...placement, cuts: previous.cuts, links: previous.links, wires: previous.wires };
        routeProblems = routed.problems;
      }
    }
    const t1 = this.now();
    // The caller names what it moved; if the verifier last saw some other layout, diff instead.
    const refs = this.last === previous ? changed : this.last ? changedRefs(this.last, layout) : undefined;
    const report = refs ? this.verifier.recheck(layout, refs) : this.verifier.check(layout);
    this.last = layout;
    const t2 = this.now();
    const out: Checked = { layout, report, routeProblems, timing: { routeMs: t1 - t0, verifyMs: t2 - t1, totalMs: t2 - t0 } };
    if (stats) out.stats = stats;
    return out;
  }

  check(layout: Layout): Checked {
    const t0 = this.now();
    const report = this.last ? this.verifier.recheck(layout, changedRefs(this.last, layout)) : this.verifier.check(layout);
    this.last = layout;
    const t1 = this.now();
    return { layout, report, routeProblems: [], timing: { routeMs: 0, verifyMs: t1 - t0, totalMs: t1 - t0 } };
  }
}
