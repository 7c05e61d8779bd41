/**
 * The design as a layout has it. Auto-place may swap op-amp sections between the slots of
 * a package (gate swaps); the layout then records where each section went in `packing` and
 * what the spare slots carry in `spares`. Routing after an edit must use those nets, not
 * the ones prepareDesign chose, or it would wire the swapped pins to the wrong nets.
 *
 * `designAsLaid(design, circuit, packing?, spares?)` → the design with every packed
 * package's pin nets rebuilt from a layout's `packing` and `spares`, or `design` itself when
 * the layout packs nothing differently (or names a package the design does not have).
 */
import type { Circuit, Layout } from '../../lib/model/index.ts';
import type { Design, DesignNet } from '../../lib/netlist/design.ts';

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a ?? {}) === JSON.stringify(b ?? {});

export function designAsLaid(design: Design, circuit: Circuit, packing: Layout['packing'], spares?: Layout['spares']): Design {
  if (!packing || (same(packing, design.packing) && same(spares, design.spares))) return design;
  const sections = new Map(circuit.parts.map((p) => [p.ref, p]));
  const rebuilt = new Map<string, Record<string, string>>();
  for (const [section, { part, pins }] of Object.entries(packing)) {
    const src = sections.get(section);
    if (!src || !design.parts.some((p) => p.ref === part)) return design;
    const nets = rebuilt.get(part) ?? {};
    for (const [role, pkgPin] of Object.entries(pins)) {
      const net = src.pins[role];
      if (net !== undefined) nets[pkgPin] = net;
    }
    rebuilt.set(part, nets);
  }
  for (const [part, pins] of Object.entries(spares ?? {})) {
    const nets = rebuilt.get(part);
    if (nets) Object.assign(nets, pins);
  }
  const parts = design.parts.map((p) => (rebuilt.has(p.ref) ? { ...p, nets: rebuilt.get(p.ref)! } : p));
  const pinsOf = new Map<string, DesignNet['pins']>();
  for (const p of parts)
    for (const pin of p.pinNames) {
      const net = p.nets[pin];
      if (net !== undefined) pinsOf.set(net, [...(pinsOf.get(net) ?? []), { ref: p.ref, pin }]);
    }
  const known = new Set(design.nets.map((n) => n.name));
  const nets: DesignNet[] = design.nets.map((n) => ({ ...n, pins: pinsOf.get(n.name) ?? [] }));
  for (const [name, pins] of pinsOf) if (!known.has(name)) nets.push({ name, info: circuit.nets[name] ?? {}, pins });
  nets.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  const out: Design = { ...design, parts, nets, packing };
  if (spares) out.spares = spares;
  return out;
}
