import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { LayoutSchema, type Layout } from '../../lib/model/index.ts';
import { parseCircuitText } from '../../lib/netlist/index.ts';
import { Checker, changedRefs } from './checker.ts';
import { movePart } from './edits.ts';

const read = parseCircuitText(readFileSync('layouts/bench-buffer.circuit.json', 'utf8'));
if (!read.ok) throw new Error('bench-buffer circuit does not read');
const { circuit, design } = read.value;
// The hand-made layout committed beside the demo circuit (verifies clean).
const hand = LayoutSchema.parse(JSON.parse(readFileSync('layouts/bench-buffer.hand.layout.json', 'utf8')));

/** Move a two-lead part so one lead lands in another net's lead hole and the other stays free. */
function shortingMove(layout: Layout): { ref: string; delta: [number, number] } {
  const net = (ref: string, pin: string) => design.parts.find((p) => p.ref === ref)?.nets[pin];
  const used = new Set(layout.parts.flatMap((p) => p.pins.map((q) => `${q.at}`)));
  for (const part of layout.parts.filter((p) => p.pins.length === 2))
    for (const target of layout.parts.filter((p) => p.ref !== part.ref))
      for (const q of target.pins) {
        const [a, b] = part.pins as [Layout['parts'][0]['pins'][0], Layout['parts'][0]['pins'][0]];
        if (net(target.ref, q.pin) === net(part.ref, a.pin)) continue;
        const delta: [number, number] = [q.at[0] - a.at[0], q.at[1] - a.at[1]];
        const to = [b.at[0] + delta[0], b.at[1] + delta[1]];
        if (to[0]! >= 0 && to[1]! >= 0 && to[0]! < layout.board.cols && to[1]! < layout.board.rows && !used.has(`${to}`)) return { ref: part.ref, delta };
      }
  throw new Error('no shorting move in the fixture');
}

describe('the live check behind the board', () => {
  it('checks a layout as it is', () => {
    const c = new Checker(circuit, design, () => 0);
    const r = c.check(hand);
    expect(r.report.clean).toBe(true);
    expect(r.layout).toBe(hand);
  });

  it('keeps the old copper and names the short when an edit cannot be routed', () => {
    const c = new Checker(circuit, design);
    c.check(hand);
    const m = shortingMove(hand);
    const moved = movePart(hand, m.ref, m.delta);
    if (!moved.ok) throw new Error(moved.why);
    const r = c.afterEdit(moved.layout, [m.ref], hand);
    expect(r.routeProblems.map((p) => p.code)).toContain('route.shared-hole');
    expect(r.report.faults.map((p) => p.code)).toContain('verify.short');
    expect(r.layout.cuts).toBe(hand.cuts);
    expect(r.layout.links).toBe(hand.links);
    expect(r.timing.totalMs).toBeGreaterThanOrEqual(r.timing.routeMs);
    // Back where it was: routed again, and clean.
    const back = c.afterEdit(hand, [m.ref], r.layout);
    expect(back.routeProblems).toEqual([]);
    expect(back.report.clean).toBe(true);
  });

  it('answers the same incrementally as from scratch (undo and redo)', () => {
    const inc = new Checker(circuit, design);
    inc.check(hand);
    const m = shortingMove(hand);
    const moved = movePart(hand, m.ref, m.delta);
    if (!moved.ok) throw new Error(moved.why);
    const a = inc.check(moved.layout);
    const b = new Checker(circuit, design).check(moved.layout);
    expect(a.report).toEqual(b.report);
    expect(inc.check(hand).report.clean).toBe(true);
  });

  it('lists the parts whose holes changed, added and removed ones included', () => {
    expect(changedRefs(hand, hand)).toEqual([]);
    expect(changedRefs(hand, structuredClone(hand))).toEqual([]);
    const moved = movePart(hand, 'R1', [1, 0]);
    if (!moved.ok) throw new Error(moved.why);
    expect(changedRefs(hand, moved.layout)).toEqual(['R1']);
    const fewer = { ...hand, parts: hand.parts.filter((p) => p.ref !== 'C2') };
    expect(changedRefs(hand, fewer)).toEqual(['C2']);
    expect(changedRefs(undefined, fewer).length).toBe(fewer.parts.length);
  });
});
