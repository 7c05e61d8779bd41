/** The hand-made demo layouts in layouts/ verify clean against their circuits. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CircuitSchema, LayoutSchema } from '../model/index.ts';
import { extractNetlist } from './extract.ts';
import { probeChecklist } from './probe.ts';
import { verifyLayout } from './verify.ts';

const read = (name: string) => JSON.parse(readFileSync(new URL(`../../../layouts/${name}`, import.meta.url), 'utf8')) as unknown;

describe('layouts/bench-buffer.hand.layout.json', () => {
  const circuit = CircuitSchema.parse(read('bench-buffer.circuit.json'));
  const layout = LayoutSchema.parse(read('bench-buffer.hand.layout.json'));

  it('verifies clean against layouts/bench-buffer.circuit.json', () => {
    const r = verifyLayout(circuit, layout);
    expect(r.faults).toEqual([]);
    expect(r.clean).toBe(true);
    // the reminders a builder needs: the transistor's lead order and the electrolytic's + lead
    expect(r.warnings.map((w) => [w.code, w.refs])).toEqual([
      ['verify.polarity', ['Q1']],
      ['verify.polarity', ['C2']],
    ]);
  });

  it('reads back the circuit’s nets exactly', () => {
    const got = extractNetlist(layout, circuit);
    expect(got.diff?.same).toBe(true);
    expect(got.nets.every((n) => n.matched)).toBe(true);
  });

  it('needs two beeps, one across each link, and no silent pair (it has no cuts)', () => {
    const { beep, silent } = probeChecklist(circuit, layout);
    expect(beep.map((p) => p.nets[0])).toEqual(['OUT', 'BASE']);
    expect(silent).toEqual([]);
  });
});

describe('layouts/twin-lfo.hand.layout.json', () => {
  const circuit = CircuitSchema.parse(read('twin-lfo.circuit.json'));
  const layout = LayoutSchema.parse(read('twin-lfo.hand.layout.json'));

  it('verifies clean against layouts/twin-lfo.circuit.json (a DIP-14 straddling cut strips)', () => {
    const r = verifyLayout(circuit, layout);
    expect(r.faults).toEqual([]);
    expect(extractNetlist(layout, circuit).diff?.same).toBe(true);
  });

  it('every strip under the DIP is cut between its two rows of pins', () => {
    const u1 = layout.parts.find((p) => p.ref === 'U1')!;
    const rows = new Set(u1.pins.map((p) => p.at[1]));
    const cutRows = new Set(layout.cuts.flatMap((c) => ('between' in c && c.between[0][0] >= 11 && c.between[1][0] <= 14 ? [c.between[0][1]] : [])));
    for (const r of rows) expect(cutRows.has(r)).toBe(true);
  });

  it('probe checklist: one beep per link-joined piece, one silent pair per cut between nets', () => {
    const { beep, silent } = probeChecklist(circuit, layout);
    expect(beep).toHaveLength(layout.links.length);
    expect(silent.length).toBeGreaterThan(0);
    expect(silent.length).toBeLessThanOrEqual(layout.cuts.length);
    for (const p of silent) expect(p.nets[0]).not.toBe(p.nets[1]);
  });
});
