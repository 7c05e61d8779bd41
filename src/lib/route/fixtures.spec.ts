/**
 * The demo placements in layouts/ (hand-made, one per demo circuit) route and verify clean.
 * Drilled-only cutting fails where a demo puts two leads of different nets side by side on a
 * strip (an inline trimmer, a capacitor laid along a strip), naming that part.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LayoutSchema } from '../model/index.ts';
import { parseCircuitText } from '../netlist/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { routeLayout } from './index.ts';
import { checkRouted } from './testing/check.ts';

const DIR = join(import.meta.dirname, '../../../layouts');
const circuits = readdirSync(DIR)
  .filter((f) => f.endsWith('.circuit.json'))
  .map((f) => f.replace(/\.circuit\.json$/, ''))
  .sort();

/** The part a drilled-only routing trips over, per demo (null: drilled cuts work). */
const DRILLED: Record<string, string | null> = { 'bench-buffer': 'C1', 'twin-lfo': 'RV1', 'four-mixer': null };

function load(name: string) {
  const circuit = parseCircuitText(readFileSync(join(DIR, `${name}.circuit.json`), 'utf8'));
  if (!circuit.ok) throw new Error(`${name}: ${circuit.problems.map((p) => p.message).join('; ')}`);
  const placement = LayoutSchema.parse(JSON.parse(readFileSync(join(DIR, `${name}.placement.json`), 'utf8')));
  return { ...circuit.value, placement };
}

describe('demo placements', () => {
  it('exist for every demo circuit', () => {
    expect(circuits.length).toBeGreaterThanOrEqual(3);
    for (const name of circuits) expect(existsSync(join(DIR, `${name}.placement.json`)), name).toBe(true);
  });

  for (const name of circuits) {
    it(`${name}: routes and verifies clean with scored or either-style cuts`, () => {
      const { circuit, design, placement } = load(name);
      expect(placement.cuts.length + placement.links.length + placement.wires.length).toBe(0);
      for (const cutStyle of ['either', 'between'] as const) {
        const r = routeLayout(design, placement, { cutStyle });
        if (!r.ok) throw new Error(`${name} (${cutStyle}): ${r.problems.map((p) => p.message).join('\n')}`);
        const report = verifyLayout(circuit, r.value.layout);
        expect(report.faults).toEqual([]);
        expect(report.clean).toBe(true);
        expect(checkRouted(design, r.value.layout)).toEqual([]);
        expect(r.value.stats.links).toBe(r.value.layout.links.length);
        if (design.packing) expect(r.value.layout.packing).toEqual(design.packing);
      }
    });

    it(`${name}: drilled-only cutting ${DRILLED[name] ? `fails at ${DRILLED[name]}` : 'works too'}`, () => {
      const { circuit, design, placement } = load(name);
      const r = routeLayout(design, placement, { cutStyle: 'hole' });
      const culprit = DRILLED[name];
      if (culprit === undefined) return; // a new demo: the test above covers it
      if (culprit === null) {
        expect(r.ok && verifyLayout(circuit, r.value.layout).clean).toBe(true);
      } else {
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.problems.some((p) => p.code === 'route.unroutable' && p.data?.reason === 'drilled-cut' && p.refs?.includes(culprit))).toBe(true);
      }
    });
  }
});
