/**
 * The design: what the placer, router and renderer work on. It is the circuit with every
 * part bound to a footprint and op-amp sections packed into DIP packages. The verifier
 * does not use it: it reads the circuit and the layout's packing map itself.
 */
import type { Circuit, NetInfo, PartKind } from '../model/circuit.ts';
import type { Packing } from '../model/layout.ts';
import type { Edge } from '../model/options.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { checkPart, defaultFootprintName, footprintFor, leadOrder, partPinNames } from '../parts/kinds.ts';
import type { Footprint } from '../parts/footprint.ts';
import { getFootprint } from '../parts/library.ts';
import { packOpamps } from './packing.ts';

export interface DesignPart {
  ref: string;
  /** Kind as placed: packed op-amp sections become `ic`. */
  kind: PartKind;
  value?: string;
  /** Footprint library name and the pin names it is bound to. */
  footprint: string;
  pinNames: string[];
  /** pin → net; a pin missing here is unconnected. */
  nets: Record<string, string>;
  /** Allowed lead span (two-lead parts), from the part or the footprint. */
  span?: { min: number; max: number };
  /** Preferred board edge (pads parts). */
  edge?: Edge;
  package?: string;
  polarized: boolean;
  /** Indices of the circuit parts this design part came from. */
  source: number[];
  /** Off-board labels per pad (pads parts). */
  labels?: Record<string, string>;
}

export interface DesignNet {
  name: string;
  info: NetInfo;
  pins: { ref: string; pin: string }[];
}

export interface Design {
  title: string;
  parts: DesignPart[];
  nets: DesignNet[];
  packing?: Packing;
  spares?: Record<string, Record<string, string>>;
}

/** The footprint object of a design part. */
export function designFootprint(part: DesignPart): Footprint {
  const fp = getFootprint(part.footprint, part.pinNames);
  if (!fp) throw new Error(`design part ${part.ref}: footprint ${part.footprint} did not resolve`);
  return fp;
}

/**
 * Check every part against its kind, bind footprints, pack op-amp sections. Returns all
 * problems at once; warnings (defaulted lead orders, single-pin nets) ride along.
 */
export function prepareDesign(circuit: Circuit): Result<Design> {
  const problems: Problem[] = [];
  const warnings: Problem[] = [];
  const seen = new Map<string, number>();
  circuit.parts.forEach((part, i) => {
    const prev = seen.get(part.ref);
    if (prev !== undefined)
      problems.push({
        code: 'circuit.duplicate-ref',
        severity: 'error',
        path: ['parts', i, 'ref'],
        message: `reference ${part.ref} is used twice (parts[${prev}] and parts[${i}])`,
        hint: `rename one of them, e.g. ${part.ref}${'B'}`,
        refs: [part.ref],
      });
    seen.set(part.ref, i);
    problems.push(...checkPart(part, ['parts', i]));
  });
  if (problems.length) return fail(problems, warnings);

  const parts: DesignPart[] = [];
  const sections: number[] = [];
  circuit.parts.forEach((part, i) => {
    if (part.kind === 'opamp') {
      sections.push(i);
      return;
    }
    const fp = footprintFor(part)!;
    const lo = leadOrder(part);
    if (lo?.defaulted)
      warnings.push({
        code: 'part.pinout-defaulted',
        severity: 'warning',
        path: ['parts', i, 'pinout'],
        message: `${part.ref} states no lead order; assuming ${lo.order} seen from the flat face`,
        hint: `check the maker's datasheet and add "pinout": "${lo.order}" (or the real order)`,
        refs: [part.ref],
      });
    const dp: DesignPart = {
      ref: part.ref,
      kind: part.kind,
      footprint: part.footprint ?? defaultFootprintName(part)!,
      pinNames: fp.pinNames.slice(),
      nets: { ...part.pins },
      polarized: !!(fp.marks.plus || fp.marks.cathode || fp.marks.pin1 || lo),
      source: [i],
    };
    if (part.value !== undefined) dp.value = part.value;
    if (fp.span) dp.span = { min: Math.max(fp.span.min, part.span?.min ?? 0), max: Math.min(fp.span.max, part.span?.max ?? 99) };
    if (part.edge) dp.edge = part.edge;
    if (part.package) dp.package = part.package.toUpperCase();
    if (part.labels) dp.labels = { ...part.labels };
    parts.push(dp);
  });

  let packing: Packing | undefined;
  let spares: Record<string, Record<string, string>> | undefined;
  if (sections.length) {
    const packed = packOpamps(circuit, sections, new Set(parts.map((p) => p.ref)));
    if (!packed.ok) return fail(packed.problems, [...warnings, ...packed.warnings]);
    parts.push(...packed.value.parts);
    packing = packed.value.packing;
    spares = packed.value.spares;
    warnings.push(...packed.warnings);
  }

  const netMap = new Map<string, DesignNet>();
  for (const p of parts)
    for (const pin of p.pinNames) {
      const net = p.nets[pin];
      if (net === undefined) continue;
      let n = netMap.get(net);
      if (!n) netMap.set(net, (n = { name: net, info: circuit.nets[net] ?? {}, pins: [] }));
      n.pins.push({ ref: p.ref, pin });
    }
  for (const name of Object.keys(circuit.nets))
    if (!netMap.has(name))
      warnings.push({ code: 'net.unused', severity: 'warning', path: ['nets', name], message: `net ${name} is described but no pin uses it`, hint: 'remove it, or connect a pin to it', nets: [name] });
  for (const n of netMap.values())
    if (n.pins.length === 1)
      warnings.push({
        code: 'net.single-pin',
        severity: 'warning',
        path: ['nets', n.name],
        message: `net ${n.name} reaches only ${n.pins[0]!.ref} pin ${n.pins[0]!.pin}`,
        hint: 'check the spelling of the net name, or connect another pin to it',
        nets: [n.name],
        pins: n.pins,
      });
  const design: Design = { title: circuit.title, parts, nets: [...netMap.values()].sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)) };
  if (packing) design.packing = packing;
  if (spares) design.spares = spares;
  return ok(design, warnings);
}

/** Pin names of a circuit part, exported for checkers that read circuits directly. */
export { partPinNames };
