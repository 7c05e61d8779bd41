/**
 * The design as this layout packed it. prepareDesign packs op-amp sections its own way;
 * a layout may carry its own `packing` (and `spares`), which is what the verifier reads.
 * When it does, the packages it names replace the design's, with pin → net maps read from
 * the circuit through the layout's map, so nets on the drawings match the board.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import type { Design, DesignPart } from '../netlist/design.ts';

export function designForLayout(design: Design, circuit: Circuit, layout: Layout): Design {
  const packing = layout.packing;
  if (!packing || !Object.keys(packing).length) return design;
  const sections = new Map(circuit.parts.map((p, i) => [p.ref, { part: p, index: i }]));
  const packages = new Map<string, DesignPart>();
  for (const [secRef, map] of Object.entries(packing)) {
    const sec = sections.get(secRef);
    const lp = layout.parts.find((p) => p.ref === map.part);
    if (!sec || !lp) return design;
    let pkg = packages.get(map.part);
    if (!pkg) {
      pkg = { ref: map.part, kind: 'ic', footprint: lp.footprint, pinNames: lp.pins.map((p) => p.pin).sort((a, b) => Number(a) - Number(b)), nets: {}, polarized: true, source: [] };
      if (lp.package) pkg.package = lp.package;
      packages.set(map.part, pkg);
    }
    for (const [secPin, pkgPin] of Object.entries(map.pins)) {
      const net = sec.part.pins[secPin];
      if (net !== undefined) pkg.nets[pkgPin] = net;
    }
    pkg.source.push(sec.index);
    if (sec.part.value) pkg.value = pkg.value && pkg.value !== sec.part.value ? 'op-amp' : sec.part.value;
  }
  for (const [ref, pins] of Object.entries(layout.spares ?? {})) {
    const pkg = packages.get(ref);
    if (pkg) for (const [pin, net] of Object.entries(pins)) pkg.nets[pin] = net;
  }
  const packedSources = new Set([...packages.values()].flatMap((p) => p.source));
  const kept = design.parts.filter((p) => !(p.kind === 'ic' && p.source.some((s) => packedSources.has(s))));
  return { ...design, parts: [...kept, ...packages.values()], packing };
}
