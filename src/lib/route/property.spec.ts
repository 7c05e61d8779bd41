/**
 * Property tests: random legal placements on each board kind (strip, pads, bus in the
 * breadboard pattern), routed and then checked from scratch by the verifier and by the
 * independent test check. Every result is either clean (no open, no short, no geometry
 * fault, links straight and clear of leads, bodies and each other) or an explicit
 * route.unroutable naming a net of the circuit. 2 000 cases per run in all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { breadboardBoard, makeBoard } from '../board/index.ts';
import type { Board } from '../model/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { routeLayout } from './index.ts';
import { checkRouted } from './testing/check.ts';
import { randomCase } from './testing/random-placement.ts';

const REASONS = ['drilled-cut', 'no-landing-hole', 'blocked'];

function caseArb(board: fc.Arbitrary<Board>) {
  return fc.record({
    seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }),
    board,
    parts: fc.integer({ min: 2, max: 9 }),
    nets: fc.integer({ min: 2, max: 7 }),
    cutStyle: fc.constantFrom('either' as const, 'between' as const, 'hole' as const),
    linksOverBodies: fc.boolean(),
  });
}

function runProperty(name: string, board: fc.Arbitrary<Board>, numRuns: number): void {
  it(`${name}: every routed layout verifies clean, every failure names a net (${numRuns} cases)`, () => {
    let routed = 0;
    fc.assert(
      fc.property(caseArb(board), ({ seed, board, parts, nets, cutStyle, linksOverBodies }) => {
        const c = randomCase(seed, board, parts, nets);
        const r = routeLayout(c.design, c.placement, { cutStyle, linksOverBodies });
        if (r.ok) {
          routed++;
          const report = verifyLayout(c.circuit, r.value.layout);
          expect(report.faults).toEqual([]);
          expect(checkRouted(c.design, r.value.layout, { linksOverBodies })).toEqual([]);
          const { layout, stats } = r.value;
          expect([stats.cuts, stats.links, stats.wires]).toEqual([layout.cuts.length, layout.links.length, layout.wires.length]);
          if (cutStyle === 'hole') expect(layout.cuts.every((cut) => 'at' in cut)).toBe(true);
          if (cutStyle === 'between') expect(layout.cuts.every((cut) => 'between' in cut)).toBe(true);
        } else {
          const names = new Set(c.design.nets.map((n) => n.name));
          expect(r.problems.length).toBeGreaterThan(0);
          for (const p of r.problems) {
            expect(p.code).toBe('route.unroutable');
            expect(REASONS).toContain(p.data?.reason);
            // A drilled cut between two unconnected pins names the pins: there is no net.
            if (p.data?.reason === 'drilled-cut') expect(p.pins).toHaveLength(2);
            else expect(p.nets?.length).toBeGreaterThan(0);
            for (const n of p.nets ?? []) {
              expect(names.has(n)).toBe(true);
              expect(p.message).toContain(n);
            }
          }
        }
      }),
      { numRuns },
    );
    // Random placements are often crowded past routing; a fair share must still route.
    expect(routed / numRuns).toBeGreaterThan(0.25);
  });
}

describe('routeLayout properties', () => {
  runProperty(
    'strip boards',
    fc.record({ cols: fc.integer({ min: 8, max: 22 }), rows: fc.integer({ min: 6, max: 14 }) }).map(({ cols, rows }) => makeBoard('strip', cols, rows)),
    800,
  );
  runProperty(
    'pad boards',
    fc.record({ cols: fc.integer({ min: 8, max: 18 }), rows: fc.integer({ min: 6, max: 12 }) }).map(({ cols, rows }) => makeBoard('pads', cols, rows)),
    600,
  );
  runProperty(
    'bus boards (breadboard pattern)',
    fc.integer({ min: 8, max: 20 }).map((cols) => breadboardBoard(cols)),
    600,
  );
});
