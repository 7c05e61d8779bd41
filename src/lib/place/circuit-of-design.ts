/**
 * `circuitOfDesign(design): Circuit` — a circuit document equivalent to a design, for
 * verifying a plan when the caller did not hand in the circuit it came from.
 *
 * Every part keeps its ref, kind, value, connected pins, footprint (named explicitly) and
 * span; a three-lead part's lead order is read back from its footprint's pin order (the
 * kind contract says which kinds state one); packed op-amp packages turn back into their
 * sections, whose pins are read through the design's packing map.
 */
import type { Circuit, CircuitPart } from '../model/circuit.ts';
import type { Design } from '../netlist/design.ts';
import { KINDS } from '../parts/kinds.ts';

export function circuitOfDesign(design: Design): Circuit {
  const packages = new Set(Object.values(design.packing ?? {}).map((e) => e.part));
  const rows: { order: number; part: CircuitPart }[] = [];
  for (const dp of design.parts) {
    if (packages.has(dp.ref)) continue;
    const pins: Record<string, string> = {};
    for (const pin of dp.pinNames) if (dp.nets[pin] !== undefined) pins[pin] = dp.nets[pin]!;
    const part: CircuitPart = { ref: dp.ref, kind: dp.kind, pins, footprint: dp.footprint };
    if (dp.value !== undefined) part.value = dp.value;
    if (dp.span) part.span = { ...dp.span };
    if (dp.package) part.package = dp.package;
    if (dp.edge) part.edge = dp.edge;
    if (dp.labels) part.labels = { ...dp.labels };
    if (KINDS[dp.kind].defaultPinout) part.pinout = dp.pinNames.join('');
    if (KINDS[dp.kind].pins === undefined && !dp.package) part.count = dp.kind === 'header' ? dp.pinNames.length / 2 : dp.pinNames.length;
    if (dp.pinNames.includes('+')) part.polarized = true;
    rows.push({ order: dp.source[0] ?? 0, part });
  }
  for (const [section, entry] of Object.entries(design.packing ?? {})) {
    const pkg = design.parts.find((p) => p.ref === entry.part);
    if (!pkg) continue;
    const pins: Record<string, string> = {};
    for (const [role, pin] of Object.entries(entry.pins)) {
      const net = pkg.nets[pin];
      if (net !== undefined) pins[role] = net;
    }
    const part: CircuitPart = { ref: section, kind: 'opamp', pins };
    if (pkg.value !== undefined) part.value = pkg.value;
    const i = Object.keys(design.packing!).filter((k) => design.packing![k]!.part === entry.part).indexOf(section);
    rows.push({ order: pkg.source[i] ?? pkg.source[0] ?? 0, part });
  }
  rows.sort((a, b) => a.order - b.order);
  const nets: Circuit['nets'] = {};
  for (const n of design.nets) if (Object.keys(n.info).length) nets[n.name] = { ...n.info };
  return { format: 'kerfline.circuit', version: 1, title: design.title, parts: rows.map((r) => r.part), nets };
}
