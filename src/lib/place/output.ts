/**
 * From a finished placement state to documents: `placementLayout(state, design, board,
 * slotSections)` writes the layout document of the placed parts (no cuts or links yet:
 * the router adds them) and `designAfterSwaps(design, state, tables, slotSections)` the
 * design with the nets that gate swaps moved between package pins, for the router.
 */
import type { Design, DesignNet } from '../netlist/design.ts';
import type { Board, Layout, LayoutPart } from '../model/layout.ts';
import type { PlaceState } from './state.ts';
import { packingOf, sparesOf, type SectionTable } from './sections.ts';

export function designAfterSwaps(design: Design, s: PlaceState, tables: SectionTable[], slotSections: (string | undefined)[][]): Design {
  const names = s.problem.nets;
  const parts = design.parts.map((dp, p) => {
    const nets: Record<string, string> = {};
    s.problem.parts[p]!.pinNames.forEach((pin, i) => {
      const net = names[s.pinNet[p]![i]!]!;
      if (!net.open) nets[pin] = net.name;
    });
    return { ...dp, nets };
  });
  const pinsOf = new Map<string, DesignNet['pins']>();
  for (const dp of parts) for (const pin of dp.pinNames) {
    const net = dp.nets[pin];
    if (net !== undefined) pinsOf.set(net, [...(pinsOf.get(net) ?? []), { ref: dp.ref, pin }]);
  }
  const out: Design = { ...design, parts, nets: design.nets.map((n) => ({ ...n, pins: pinsOf.get(n.name) ?? [] })) };
  const packing = packingOf(tables, slotSections, design.packing);
  if (packing) out.packing = packing;
  const spares = sparesOf(tables, slotSections, (part, pin) => parts[part]?.nets[pin], design.spares);
  if (spares) out.spares = spares;
  return out;
}

export function placementLayout(s: PlaceState, design: Design, board: Board, locked: Set<number>): Layout {
  const parts: LayoutPart[] = design.parts.map((dp, p) => {
    const part = s.problem.parts[p]!;
    const pose = part.poses[s.pose[p]!]!;
    const lp: LayoutPart = {
      ref: dp.ref,
      footprint: dp.footprint,
      pins: part.pinNames.map((pin, i) => ({ pin, at: [s.x[p]! + pose.pins[i]![0], s.y[p]! + pose.pins[i]![1]] as [number, number] })),
      kind: dp.kind,
      rotation: pose.rotation,
    };
    if (dp.package) lp.package = dp.package;
    if (dp.value !== undefined) lp.value = dp.value;
    if (locked.has(p)) lp.locked = true;
    return lp;
  });
  const layout: Layout = { format: 'kerfline.layout', version: 1, board: { ...board }, parts, cuts: [], links: [], wires: [] };
  if (design.packing) layout.packing = design.packing;
  if (design.spares) layout.spares = design.spares;
  return layout;
}
