/**
 * What the layout must realise, read straight from the circuit document and the layout's
 * `packing`/`spares` maps (the exchange contract), without the planner's design model.
 *
 * `readExpected(circuit, layout)` → the parts the board must carry (circuit parts, op-amp
 * sections replaced by the packages the packing names), each with its full pin list and a
 * pin → net map at package level, the nets as lists of such pins, and the faults found in
 * the circuit or the packing themselves (`verify.circuit`, `verify.packing`,
 * `verify.missing-part` for unpacked sections). Never throws on bad input.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import type { Problem } from '../model/problem.ts';
import { KINDS, isPolarized, leadOrder, partPinNames } from '../parts/index.ts';
import { checkCircuitPart } from './circuit-check.ts';
import { footprintNamed } from './footprints.ts';
import { checkPacking } from './packing.ts';
import type { PinRef } from './types.ts';
import { listText, problem } from './words.ts';

export interface ExpectedPart {
  ref: string;
  /** Where it comes from: the circuit part, or the first packing entry naming a package. */
  path: (string | number)[];
  describe: string;
  /** Every pin, connected or not. */
  pinNames: string[];
  /** pin → net; pins missing here are unconnected. */
  nets: Record<string, string>;
  openAllowed: boolean;
  polarized: boolean;
  /** The circuit's span limit for two-lead parts. */
  span?: { min: number; max: number };
  /** Lead order of three-lead parts, and whether the circuit left it to a default. */
  order?: { order: string; defaulted: boolean };
  /** A footprint the circuit insists on. */
  footprint?: string;
  /** Made by op-amp packing. */
  packed: boolean;
}

export interface Expected {
  parts: Map<string, ExpectedPart>;
  /** net → its pins at package level, nets in name order. */
  nets: Map<string, PinRef[]>;
  faults: Problem[];
  warnings: Problem[];
  /** Refs of the circuit's op-amp sections (they reach the board inside packages). */
  sections: Set<string>;
}

type LayoutMaps = Pick<Layout, 'parts' | 'packing' | 'spares'>;

export function readExpected(circuit: Circuit, layout: LayoutMaps): Expected {
  const faults: Problem[] = [];
  const warnings: Problem[] = [];
  const parts = new Map<string, ExpectedPart>();
  const seen = new Map<string, number>();

  circuit.parts.forEach((part, i) => {
    const prev = seen.get(part.ref);
    if (prev !== undefined) {
      faults.push(
        problem('verify.circuit', 'error', ['parts', i, 'ref'], `the circuit names ${part.ref} twice (parts[${prev}] and parts[${i}])`, {
          hint: 'give every part its own reference',
          refs: [part.ref],
        }),
      );
      return;
    }
    seen.set(part.ref, i);
    for (const p of checkCircuitPart(part, i))
      faults.push({ ...p, code: 'verify.circuit', data: { ...(p.data ?? {}), cause: p.code } });
    if (part.kind === 'opamp') return;
    const e: ExpectedPart = {
      ref: part.ref,
      path: ['parts', i],
      describe: KINDS[part.kind].describe,
      pinNames: partPinNames(part),
      nets: bare(part.pins),
      openAllowed: KINDS[part.kind].openPinsAllowed,
      polarized: isPolarized(part),
      packed: false,
    };
    if (part.span) e.span = { min: part.span.min, max: part.span.max };
    const order = leadOrder(part);
    if (order) e.order = order;
    if (part.footprint) e.footprint = part.footprint;
    parts.set(part.ref, e);
  });

  const packed = checkPacking(circuit, layout, new Set(parts.keys()));
  faults.push(...packed.faults);
  for (const pkg of packed.packages) {
    const pinNames = packageFootprintPins(layout, pkg.ref) ?? pkg.fallbackPins;
    parts.set(pkg.ref, {
      ref: pkg.ref,
      path: pkg.path,
      describe: 'op-amp package',
      pinNames,
      nets: pkg.nets,
      openAllowed: KINDS.ic.openPinsAllowed,
      polarized: true,
      packed: true,
    });
  }
  applySpares(layout, parts, faults);

  const nets = new Map<string, PinRef[]>();
  for (const e of parts.values())
    for (const pin of e.pinNames) {
      const net = e.nets[pin];
      if (net === undefined) continue;
      const list = nets.get(net) ?? nets.set(net, []).get(net)!;
      list.push({ ref: e.ref, pin });
    }
  const sorted = new Map([...nets.entries()].sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0)));
  for (const [name, pins] of sorted)
    if (pins.length === 1)
      warnings.push(
        problem('verify.single-pin-net', 'warning', ['nets', name], `net ${name} reaches only ${pins[0]!.ref} pin ${pins[0]!.pin}`, {
          hint: 'check the spelling of the net name, or connect another pin to it',
          nets: [name],
          pins,
        }),
      );
  const sections = new Set(circuit.parts.filter((p) => p.kind === 'opamp').map((p) => p.ref));
  return { parts, nets: sorted, faults, warnings, sections };
}

function packageFootprintPins(layout: LayoutMaps, ref: string): string[] | undefined {
  const lp = layout.parts.find((p) => p.ref === ref);
  return lp ? footprintNamed(lp.footprint)?.pinNames.slice() : undefined;
}

/** Spare package pins carry the nets the layout gave them (tied-off sections). */
function applySpares(layout: LayoutMaps, parts: Map<string, ExpectedPart>, faults: Problem[]): void {
  for (const [ref, map] of Object.entries(layout.spares ?? {})) {
    const e = parts.get(ref);
    if (!e) {
      faults.push(
        problem('verify.packing', 'error', ['spares', ref], `spares names ${ref}, which is neither a circuit part nor a package`, {
          hint: 'spares lists package pins no op-amp section uses; name a package from packing',
          refs: [ref],
        }),
      );
      continue;
    }
    for (const [pin, net] of Object.entries(map)) {
      if (!e.pinNames.includes(pin)) {
        faults.push(
          problem('verify.packing', 'error', ['spares', ref, pin], `spares gives ${ref} pin ${pin}, but ${ref} has pins ${listText(e.pinNames)}`, {
            hint: 'use a pin number of the package',
            refs: [ref],
          }),
        );
        continue;
      }
      const had = e.nets[pin];
      if (had !== undefined && had !== net)
        faults.push(
          problem('verify.packing', 'error', ['spares', ref, pin], `spares puts ${ref} pin ${pin} on ${net}, but a section already uses it for ${had}`, {
            hint: 'list in spares only pins that no section uses',
            refs: [ref],
            nets: [had, net],
          }),
        );
      else e.nets[pin] = net;
    }
  }
}

/** A copy of a name → net map without a prototype: names are user text. */
function bare(map: Record<string, string>): Record<string, string> {
  return Object.assign(Object.create(null) as Record<string, string>, map);
}
