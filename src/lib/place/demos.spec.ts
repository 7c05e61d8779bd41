/**
 * The planned demo layouts committed in layouts/ are reproducible: re-planning each demo
 * circuit with the seed and effort recorded in its `meta` gives the identical document, and
 * it verifies clean against the circuit.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CircuitSchema } from '../model/circuit.ts';
import { prepareDesign } from '../netlist/design.ts';
import { verifyLayout } from '../verify/index.ts';
import { planLayout } from './plan.ts';

const dir = join(__dirname, '..', '..', '..', 'layouts');
const DEMOS = ['bench-buffer', 'twin-lfo', 'four-mixer'];

describe('committed demo plans', () => {
  for (const name of DEMOS) {
    it(`re-plans ${name} to the committed layout, which verifies clean`, () => {
      const layoutFile = join(dir, `${name}.layout.json`);
      expect(existsSync(layoutFile)).toBe(true);
      const committed = JSON.parse(readFileSync(layoutFile, 'utf8')) as { meta: { seed: number; effort: 'quick' | 'normal' | 'thorough' } };
      const circuit = CircuitSchema.parse(JSON.parse(readFileSync(join(dir, `${name}.circuit.json`), 'utf8')));
      const design = prepareDesign(circuit);
      expect(design.ok).toBe(true);
      if (!design.ok) return;
      const r = planLayout(design.value, { seed: committed.meta.seed, effort: committed.meta.effort }, {}, { circuit });
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      expect(JSON.parse(JSON.stringify(r.value.layout))).toEqual(committed);
      expect(verifyLayout(circuit, r.value.layout).faults).toEqual([]);
      expect(existsSync(join(dir, `${name}.svg`))).toBe(true);
    });
  }
});
