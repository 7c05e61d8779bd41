/**
 * Planted instances (placement-notes.md): the netlist is read off a random layout with
 * random cuts and links, so a routing is known to exist. The router must find one almost
 * always, with no more cuts than the planted layout (its cut count is the minimum), and what
 * it finds must verify clean.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { routeLayout } from './index.ts';
import { plantedCase } from './testing/planted.ts';

describe('planted instances on strip boards', () => {
  it('route clean with no more cuts than the planted layout (200 cases)', () => {
    let routed = 0;
    const runs = 200;
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.integer({ min: 4, max: 12 }), (seed, parts) => {
        const c = plantedCase(seed, makeBoard('strip', 22, 16), parts, { acrossStrips: true });
        // the planted layout itself is a valid answer (checks the generator)
        expect(verifyLayout(c.circuit, c.planted).faults).toEqual([]);
        const r = routeLayout(c.design, c.placement, { cutStyle: 'between' });
        if (!r.ok) return;
        routed++;
        expect(verifyLayout(c.circuit, r.value.layout).faults).toEqual([]);
        expect(r.value.stats.cuts).toBeLessThanOrEqual(c.planted.cuts.length);
      }),
      { numRuns: runs },
    );
    // Planted layouts may rely on extra cuts that make private relays; the router keeps to
    // the minimum cuts, so a few may not route. Almost all must.
    expect(routed / runs).toBeGreaterThan(0.9);
  });
});
