import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, type Circuit, type Layout } from '../model/index.ts';
import { HEIGHT_CLASSES } from '../parts/footprint.ts';
import { benchBufferLayout } from '../render/fixture.ts';
import { buildGuide } from './build-guide.ts';
import { linkList } from './segments.ts';
import { buildOrder } from './build-order.ts';
import { drawScene } from '../render/index.ts';

function benchCircuit(): Circuit {
  return CircuitSchema.parse(JSON.parse(readFileSync(new URL('../../../layouts/bench-buffer.circuit.json', import.meta.url), 'utf8')));
}

/** The fixture on a 24-column board with one more cut: at component column 3 of row C (harmless: J1.2 and the link end lie left of it). */
function wideLayout(): Layout {
  const l = benchBufferLayout();
  return { ...l, board: { ...l.board, cols: 24 }, cuts: [...l.cuts, { at: [2, 2] }] };
}

function guideOf(circuit: Circuit, layout: Layout) {
  const g = buildGuide(circuit, layout);
  if (!g.ok) throw new Error(g.problems.map((p) => `${p.code}: ${p.message}`).join('\n'));
  return g.value;
}

describe('buildGuide', () => {
  it('lists cuts from the copper side: component column 3 of 24 reads column 22', () => {
    const g = guideOf(benchCircuit(), wideLayout());
    const rowC = g.cuts.find((r) => r.row === 'C')!;
    expect(rowC.items).toEqual([{ id: 'X3', style: 'drilled', copper: 'C22', component: 'C3' }]);
    // the scored cut between component H10 and H11 reads H14|H15 once the board is turned over
    expect(g.cuts.find((r) => r.row === 'H')!.items[0]).toMatchObject({ style: 'scored', copper: 'H14|H15', component: 'H10|H11' });
    expect(g.cuts.map((r) => r.row)).toEqual(['C', 'G', 'H']);
    expect(g.cutCount).toBe(3);
  });

  it('trims the board to what is used plus one hole', () => {
    const g = guideOf(benchCircuit(), wideLayout());
    // the rightmost used hole is link L2's end at component column 13 (index 12); one spare
    // column makes 14 columns, 14 × 2.54 = 35.56 mm; rows are all used (A … H)
    expect(g.board.trim).toMatchObject({ cols: 14, rows: 8, whole: false, widthMm: 35.56 });
    expect(g.board.trim.from.component).toBe('A1');
    expect(g.board.trim.to.component).toBe('H14');
    expect(g.board.trim.to.copper).toBe('H11');
  });

  it('gives link lengths, the wire gauge and the net of each link', () => {
    const g = guideOf(benchCircuit(), benchBufferLayout());
    expect(g.links.map((l) => [l.id, l.from.component, l.to.component, l.lengthMm, l.net])).toEqual([
      ['L1', 'C2', 'G2', 10.16, 'IN'],
      ['L2', 'B13', 'G13', 12.7, 'OUT'],
      ['L3', 'E9', 'H9', 7.62, 'BASE'],
    ]);
    // wire to cut = ⌈span + 5 mm each end to pass through and bend (segments.ts, common practice)⌉ = ⌈10.16 + 10⌉
    expect(g.links[0]!.cutMm).toBe(21);
    expect(g.wireStock.awg).toBe(22);
  });

  it('marks a link out of one row and column as an insulated wire, cut to its row-plus-column span', () => {
    const l = benchBufferLayout();
    // The guide reads nets and insulated links off the component-side scene, as buildGuide draws it.
    const list = (layout: typeof l) => linkList(layout, drawScene(layout, undefined, { side: 'component' }));
    expect(list(l).some((i) => i.insulated)).toBe(false);
    const [bent] = list({ ...l, links: [{ from: [2, 2], to: [5, 6] }] });
    // 3 columns and 4 rows apart: 5 pitches straight across (12.7 mm), laid along the grid 7 pitches, plus 5 mm each end
    expect(bent).toMatchObject({ lengthMm: 12.7, cutMm: Math.ceil(7 * 2.54 + 10), insulated: true });
    // Insulated links go in after the parts they lie over, in a step of their own.
    const straight = list(l)[0]!;
    const steps = buildOrder([], [straight, bent!], []);
    expect(steps.map((s) => [s.stage, s.items])).toEqual([
      ['link', [`L1 ${straight.from.component}–${straight.to.component}`]],
      ['insulated', [`L1 ${bent!.from.component}–${bent!.to.component} (insulated wire, sleeved)`]],
    ]);
    // Straight but over a pin, or crossing another link: insulated too.
    const pin = l.parts[0]!.pins[0]!.at;
    const overPin = list({ ...l, links: [{ from: [pin[0], pin[1] - 1], to: [pin[0], pin[1] + 1] }] });
    expect(overPin[0]!.insulated).toBe(true);
    // No pin on column 10 rows 0–4, on row 2 columns 8–12, nor on columns 12 and 13.
    const crossing = list({ ...l, links: [{ from: [10, 0], to: [10, 4] }, { from: [8, 2], to: [12, 2] }] });
    expect(crossing.map((i) => i.insulated ?? false)).toEqual([true, true]);
    // A bare link crossing an insulated one (over a pin) stays bare: the sleeve parts them.
    // R1 has a pin at [7, 3]; no pin lies on row 2 from column 6 to 8.
    expect(l.parts.flatMap((p) => p.pins.map((q) => q.at.join()))).toContain('7,3');
    const sleeved = list({ ...l, links: [{ from: [7, 2], to: [7, 4] }, { from: [6, 2], to: [8, 2] }] });
    expect(sleeved.map((i) => i.insulated ?? false)).toEqual([true, false]);
    const apart = list({ ...l, links: [{ from: [12, 0], to: [12, 4] }, { from: [13, 0], to: [13, 4] }] });
    expect(apart.map((i) => i.insulated ?? false)).toEqual([false, false]);
  });

  it('marks resistors and capacitors by the IEC 60062 check values', () => {
    const g = guideOf(benchCircuit(), benchBufferLayout());
    const r47 = g.parts.find((p) => p.value === '4k7')!;
    // check-values §1a worked examples: yellow violet red gold = 4.7 kΩ ±5 %;
    // yellow violet black brown brown = 4.70 kΩ ±1 %
    expect(r47.bands4).toEqual(['yellow', 'violet', 'red', 'gold']);
    expect(r47.bands5).toEqual(['yellow', 'violet', 'black', 'brown', 'brown']);
    // §1a digits/multipliers: 220 kΩ = red red ×10 k (yellow), 5 bands red red black ×1 k (orange)
    expect(g.parts.find((p) => p.value === '220k')!.bands4).toEqual(['red', 'red', 'yellow', 'gold']);
    // check-values §1c: mark 224 = 220 nF
    expect(g.parts.find((p) => p.value === '220n')!.capCode).toBe('224');
    // an electrolytic carries a polarity note and no code
    const c2 = g.parts.find((p) => p.refs.includes('C2'))!;
    expect(c2.capCode).toBeUndefined();
    expect(c2.polarity).toMatch(/\+/);
    expect(g.parts.find((p) => p.refs.includes('Q1'))!.polarity).toMatch(/C-B-E/);
  });

  it('orders the build lowest first by height class', () => {
    const g = guideOf(benchCircuit(), benchBufferLayout());
    expect(g.buildOrder.map((s) => s.stage)).toEqual(['link', 'low', 'small', 'transistor', 'tall', 'offboard']);
    const ranks = g.buildOrder.map((s) => (s.stage === 'wires' ? HEIGHT_CLASSES.indexOf('tall') + 0.6 : s.stage === 'insulated' ? HEIGHT_CLASSES.indexOf('tall') + 0.5 : HEIGHT_CLASSES.indexOf(s.stage)));
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    expect(g.buildOrder.find((s) => s.stage === 'low')!.items).toEqual(['R1', 'R2', 'R3']);
    expect(g.buildOrder.map((s) => s.step)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('lists every off-board pad with its net and label, and the probe pairs', () => {
    const g = guideOf(benchCircuit(), benchBufferLayout());
    expect(g.offBoard).toHaveLength(1);
    expect(g.offBoard[0]!.pads.map((p) => [p.pin, p.hole.component, p.net, p.label])).toEqual([
      ['1', 'D1', 'V+', 'power entry +9 V (red)'],
      ['2', 'C1', 'IN', 'input jack tip'],
      ['3', 'B1', 'OUT', 'output jack tip'],
      ['4', 'A1', 'GND', 'power entry 0 V and both jack sleeves'],
    ]);
    // three nets span two strips joined by a link: one beep pair each
    expect(g.probes.beep.map((p) => p.nets[0]).sort()).toEqual(['BASE', 'IN', 'OUT']);
    expect(g.probes.silent.length).toBeGreaterThan(0);
    expect(g.cautions.some((c) => /mains/i.test(c.text))).toBe(true);
  });

  it('refuses a layout that does not match the circuit', () => {
    const l = benchBufferLayout();
    const broken: Layout = { ...l, links: l.links.slice(1) };
    const g = buildGuide(benchCircuit(), broken);
    expect(g.ok).toBe(false);
    if (g.ok) return;
    expect(g.problems.map((p) => p.code)).toContain('guide.layout-faults');
    expect(g.problems.some((p) => p.code === 'verify.open')).toBe(true);
  });

  it('is plain data and the same every time', () => {
    const a = guideOf(benchCircuit(), benchBufferLayout());
    expect(JSON.parse(JSON.stringify(a))).toEqual(a);
    expect(guideOf(benchCircuit(), benchBufferLayout())).toEqual(a);
  });
});
