/**
 * Where on the board a problem is: its own holes when it names them, else the lead holes of
 * the parts it names, else the lead holes of the nets it names (through the design's pin
 * lists). `problemHoles(problem, layout, design?)` → holes, possibly empty.
 */
import type { Hole, Layout, Problem } from '../../lib/model/index.ts';
import type { Design } from '../../lib/netlist/design.ts';

export function problemHoles(p: Problem, layout: Layout | undefined, design?: Design): Hole[] {
  if (p.holes?.length) return p.holes.map((h) => [h[0], h[1]]);
  if (!layout) return [];
  const byRef = new Map(layout.parts.map((part) => [part.ref, part]));
  const out: Hole[] = [];
  if (p.pins?.length) {
    for (const { ref, pin } of p.pins) {
      const at = byRef.get(ref)?.pins.find((q) => q.pin === pin)?.at;
      if (at) out.push([at[0], at[1]]);
    }
    if (out.length) return out;
  }
  for (const ref of p.refs ?? []) for (const q of byRef.get(ref)?.pins ?? []) out.push([q.at[0], q.at[1]]);
  if (out.length || !design) return out;
  const wanted = new Set(p.nets ?? []);
  for (const net of design.nets)
    if (wanted.has(net.name))
      for (const { ref, pin } of net.pins) {
        const at = byRef.get(ref)?.pins.find((q) => q.pin === pin)?.at;
        if (at) out.push([at[0], at[1]]);
      }
  return out;
}
