import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { verifyLayout } from '../verify/index.ts';
import type { CircuitInput } from '../model/circuit.ts';
import { planLayout, planScore } from './plan.ts';
import { circuitOfDesign } from './circuit-of-design.ts';
import { plantedInstance } from './planted.ts';
import { prepareDesign } from '../netlist/design.ts';
import { insulatedLinks } from '../render/index.ts';
import { circuitOf, designOf } from './test-kit.ts';

// A small follower stage of our own (common practice values).
const follower = circuitOf(
  [
    { ref: 'Q1', kind: 'npn', pinout: 'EBC', pins: { C: 'VCC', B: 'B', E: 'E' } },
    { ref: 'R1', kind: 'resistor', pins: { '1': 'VCC', '2': 'B' } },
    { ref: 'R2', kind: 'resistor', pins: { '1': 'B', '2': 'GND' } },
    { ref: 'R3', kind: 'resistor', pins: { '1': 'E', '2': 'GND' } },
    { ref: 'C1', kind: 'capacitor', pins: { '1': 'IN', '2': 'B' } },
    { ref: 'J1', kind: 'pads', count: 3, pins: { '1': 'VCC', '2': 'IN', '3': 'GND' } },
  ],
  { GND: { role: 'ground' }, VCC: { role: 'power', volts: 9 }, IN: { role: 'input' } },
);

function planned(circuit = follower, options: Parameters<typeof planLayout>[1] = { effort: 'quick' }) {
  return planLayout(designOf(circuit), options, {}, { circuit });
}

describe('planLayout', () => {
  it('returns a routed layout that verifies clean, with its provenance', () => {
    const r = planned();
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(verifyLayout(follower, r.value.layout).clean).toBe(true);
    expect(r.value.layout.meta).toMatchObject({ seed: 1, effort: 'quick' });
    expect(r.value.stats.cuts).toBe(r.value.layout.cuts.length);
    expect(r.value.stats.links).toBe(r.value.layout.links.length);
  });

  it('gives the same layout for the same seed', () => {
    const a = planned(follower, { effort: 'quick', seed: 5 });
    const b = planned(follower, { effort: 'quick', seed: 5 });
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) expect(JSON.stringify(a.value.layout)).toBe(JSON.stringify(b.value.layout));
  });

  it('is never worse at normal effort than at quick for the same seed (small designs: holes used first, then score)', () => {
    for (const seed of [2, 7]) {
      const quick = planned(follower, { effort: 'quick', seed });
      const normal = planned(follower, { effort: 'normal', seed });
      expect(quick.ok && normal.ok).toBe(true);
      if (!quick.ok || !normal.ok) continue;
      expect(normal.value.layout.meta).toMatchObject({ seed, effort: 'normal' });
      const [q, n] = [quick.value.stats, normal.value.stats];
      expect(n.holesUsed).toBeLessThanOrEqual(q.holesUsed);
      if (n.holesUsed === q.holesUsed) expect(planScore(n, 2.54)).toBeLessThanOrEqual(planScore(q, 2.54));
    }
  });

  it('is never worse at normal effort than at quick by score on designs too big to shrink', () => {
    const inst = plantedInstance(16, 9);
    const circuit = circuitOfDesign(inst.design);
    const quick = planLayout(inst.design, { effort: 'quick', seed: 3 }, {}, { circuit });
    const normal = planLayout(inst.design, { effort: 'normal', seed: 3 }, {}, { circuit });
    expect(quick.ok && normal.ok).toBe(true);
    if (quick.ok && normal.ok) expect(planScore(normal.value.stats, 2.54)).toBeLessThanOrEqual(planScore(quick.value.stats, 2.54));
  });

  it('plans a planted design (its circuit, ic packages included, rebuilds and verifies)', () => {
    const inst = plantedInstance(16, 4);
    expect(prepareDesign(circuitOfDesign(inst.design)).ok).toBe(true);
    const r = planLayout(inst.design, { effort: 'quick' });
    expect(r.ok).toBe(true);
    if (r.ok) expect(verifyLayout(circuitOfDesign(inst.design), r.value.layout).clean).toBe(true);
  });

  it('verifies clean without being handed the circuit (rebuilt from the design)', () => {
    const r = planLayout(designOf(follower), { effort: 'quick', seed: 2 });
    expect(r.ok).toBe(true);
  });

  it('uses insulated wire links only when allowed, each one flagged (planted 70 parts, seed 4, quick)', () => {
    const inst = plantedInstance(70, 4);
    const count = (r: ReturnType<typeof planLayout>) => {
      if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
      const warned = r.warnings.filter((w) => w.code === 'route.insulated-link').length;
      // The warnings name exactly the links the drawing and the guide call insulated.
      expect(insulatedLinks(r.value.layout).filter(Boolean)).toHaveLength(warned);
      return warned;
    };
    // This design needs some at quick effort when they are allowed (the default)…
    expect(count(planLayout(inst.design, { effort: 'quick' }))).toBeGreaterThan(0);
    // …and routes with bare straight links only (more routing rounds) when they are not.
    expect(count(planLayout(inst.design, { effort: 'quick', insulatedLinks: false }))).toBe(0);
  });

  it('keeps pins out of keep-out areas on a fixed board', () => {
    const keep = { from: [0, 0] as [number, number], to: [5, 13] as [number, number] };
    const r = planned(follower, { effort: 'quick', board: { kind: 'strip', cols: 22, rows: 14 }, keepOut: [keep] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.layout.board).toMatchObject({ cols: 22, rows: 14 });
    for (const p of r.value.layout.parts) for (const q of p.pins) expect(q.at[0]).toBeGreaterThan(5);
  });

  it('keeps locked parts where the previous layout had them', () => {
    const first = planned();
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const r1 = first.value.layout.parts.find((p) => p.ref === 'R1')!;
    const again = planLayout(designOf(follower), { effort: 'quick', seed: 9, locked: ['R1'] }, {}, { circuit: follower, previous: first.value.layout });
    expect(again.ok).toBe(true);
    if (!again.ok) return;
    expect(again.value.layout.parts.find((p) => p.ref === 'R1')!.pins).toEqual(r1.pins);
    expect(again.value.layout.parts.find((p) => p.ref === 'R1')!.locked).toBe(true);
  });

  it('names a locked part it has no place for', () => {
    const r = planLayout(designOf(follower), { effort: 'quick', locked: ['R9'] });
    expect(r.ok ? [] : r.problems.map((p) => p.code)).toEqual(['place.locked-unknown']);
  });

  it('fails with place.no-layout on a board too small, and on an empty circuit', () => {
    const small = planned(follower, { effort: 'quick', board: { kind: 'strip', cols: 3, rows: 3 } });
    expect(small.ok ? [] : small.problems.map((p) => p.code)).toEqual(['place.no-layout']);
    const empty = planned(circuitOf([]), { effort: 'quick' });
    expect(empty.ok ? [] : empty.problems.map((p) => p.code)).toEqual(['place.no-layout']);
  });

  it('reports bad options as problems', () => {
    const r = planLayout(designOf(follower), { effort: 'fast' } as never);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.code).toMatch(/^place\.options\./);
  });

  it('reports progress and can be stopped', () => {
    const phases = new Set<string>();
    let calls = 0;
    const r = planLayout(designOf(follower), { effort: 'quick' }, { onProgress: (p) => phases.add(p.phase), shouldStop: () => ++calls > 3 }, { circuit: follower });
    expect(phases.has('anneal')).toBe(true);
    if (r.ok) expect(verifyLayout(follower, r.value.layout).clean).toBe(true);
    else expect(r.problems[0]!.code).toBe('place.no-layout');
  });

  it('packs op-amp sections, may swap them, and still verifies clean', () => {
    const amp = circuitOf(
      [
        { ref: 'U1A', kind: 'opamp', pins: { '+': 'GND', '-': 'N1', out: 'O1', 'V+': 'VP', 'V-': 'VN' } },
        { ref: 'U1B', kind: 'opamp', pins: { '+': 'GND', '-': 'N2', out: 'O2', 'V+': 'VP', 'V-': 'VN' } },
        { ref: 'R1', kind: 'resistor', pins: { '1': 'N1', '2': 'O1' } },
        { ref: 'R2', kind: 'resistor', pins: { '1': 'O1', '2': 'N2' } },
        { ref: 'R3', kind: 'resistor', pins: { '1': 'N2', '2': 'O2' } },
        { ref: 'J1', kind: 'pads', count: 4, pins: { '1': 'VP', '2': 'GND', '3': 'VN', '4': 'O2' } },
      ],
      { GND: { role: 'ground' }, VP: { role: 'power', volts: 12 }, VN: { role: 'power', volts: -12 } },
    );
    const r = planned(amp);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Object.keys(r.value.layout.packing ?? {}).sort()).toEqual(['U1A', 'U1B']);
    expect(verifyLayout(amp, r.value.layout).clean).toBe(true);
  });

  it('plans on a pad board and on a breadboard-pattern board', () => {
    for (const board of [{ kind: 'pads' as const, cols: 16, rows: 12 }, { kind: 'bus' as const, cols: 20, rows: 17, pattern: 'breadboard' }]) {
      const r = planned(follower, { effort: 'quick', board });
      expect(r.ok, board.kind).toBe(true);
      if (r.ok) expect(verifyLayout(follower, r.value.layout).clean).toBe(true);
    }
  });

  it('emits only clean layouts or an explicit place.no-layout for random small circuits', () => {
    const kinds = [
      { kind: 'resistor', pins: ['1', '2'] },
      { kind: 'capacitor', pins: ['1', '2'] },
      { kind: 'diode', pins: ['A', 'K'] },
      { kind: 'npn', pins: ['C', 'B', 'E'] },
    ] as const;
    const part = fc.record({ k: fc.nat(kinds.length - 1), nets: fc.array(fc.nat(4), { minLength: 3, maxLength: 3 }) });
    fc.assert(
      fc.property(fc.array(part, { minLength: 1, maxLength: 5 }), fc.nat(1000), (list, seed) => {
        const parts: CircuitInput['parts'] = list.map((p, i) => {
          const k = kinds[p.k]!;
          const pins = Object.fromEntries(k.pins.map((pin, j) => [pin, `N${p.nets[j]}`]));
          return { ref: `X${i + 1}`, kind: k.kind, ...(k.kind === 'npn' ? { pinout: 'EBC' } : {}), pins };
        });
        const circuit = circuitOf(parts);
        const r = planned(circuit, { effort: 'quick', seed });
        if (r.ok) expect(verifyLayout(circuit, r.value.layout).faults).toEqual([]);
        else expect(r.problems.map((p) => p.code)).toEqual(['place.no-layout']);
      }),
      { numRuns: 12 },
    );
  });
});
