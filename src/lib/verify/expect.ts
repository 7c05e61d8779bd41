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
import type { CircuitPart } from '../model/circuit.ts';
import { KINDS, checkPart, isPolarized, leadOrder, partPinNames } from '../parts/index.ts';
import { footprintNamed } from './footprints.ts';
import { checkPacking } from './packing.ts';
import { matches, snapshot } from './snapshot.ts';
import type { PinRef } from './types.ts';
import { listText, problem } from './words.ts';

export interface ExpectedPart {
  ref: string;
  /** Where it comes from: the circuit part, or the first packing entry naming a package. */
  path: (string | number)[];
  describe: string;
  /** Every pin, connected or not. */
  pinNames: readonly string[];
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
  /** net → its pins at package level, nets in the order their first pin is met. */
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
  const sections = new Set<string>();

  circuit.parts.forEach((part, i) => {
    if (part.kind === 'opamp') sections.add(part.ref);
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
    const read = readPart(part, i);
    for (const p of read.problems) faults.push(fresh(p));
    if (read.expected) parts.set(part.ref, read.expected);
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

  // nets in the order their first pin is met; expectedNetlist sorts them by name
  const nets = new Map<string, PinRef[]>();
  for (const e of parts.values())
    for (const pin of e.pinNames) {
      const net = e.nets[pin];
      if (net === undefined) continue;
      const list = nets.get(net);
      if (list) list.push({ ref: e.ref, pin });
      else nets.set(net, [{ ref: e.ref, pin }]);
    }
  for (const [name, pins] of nets)
    if (pins.length === 1)
      warnings.push(
        problem('verify.single-pin-net', 'warning', ['nets', name], `net ${name} reaches only ${pins[0]!.ref} pin ${pins[0]!.pin}`, {
          hint: 'check the spelling of the net name, or connect another pin to it',
          nets: [name],
          pins: [{ ...pins[0]! }],
        }),
      );
  return { parts, nets, faults, warnings, sections };
}

/** What one circuit part (not a repeated ref) gives: its circuit faults and, unless an op-amp section, its expected part. */
interface PartReading {
  problems: Problem[];
  expected?: ExpectedPart;
}

/**
 * Parts read before, each with a snapshot of the part to tell whether it is still the
 * same: the live editor verifies the same circuit again and again, and checkPart (which
 * builds footprints) is the costly step. Entries are shared between calls: their problems
 * leave as copies and their expected parts are never changed (applySpares copies first).
 */
let readings = new WeakMap<CircuitPart, { index: number; snap: unknown; reading: PartReading }>();
let remembered = 0;
/** Bound on remembered parts. */
const MAX_READINGS = 8192;

function readPart(part: CircuitPart, i: number): PartReading {
  const got = readings.get(part);
  if (got && got.index === i && matches(part, got.snap)) return got.reading;
  const reading: PartReading = { problems: checkPart(part, ['parts', i]).map((p) => ({ ...p, code: 'verify.circuit', data: { ...(p.data ?? {}), cause: p.code } })) };
  if (part.kind !== 'opamp') {
    const e: ExpectedPart = {
      ref: part.ref,
      path: ['parts', i],
      describe: KINDS[part.kind].describe,
      pinNames: Object.freeze(partPinNames(part)),
      nets: bare(part.pins),
      openAllowed: KINDS[part.kind].openPinsAllowed,
      polarized: isPolarized(part),
      packed: false,
    };
    if (part.span) e.span = { min: part.span.min, max: part.span.max };
    const order = leadOrder(part);
    if (order) e.order = order;
    if (part.footprint) e.footprint = part.footprint;
    reading.expected = e;
  }
  if (++remembered > MAX_READINGS) {
    readings = new WeakMap();
    remembered = 0;
  }
  readings.set(part, { index: i, snap: snapshot(part), reading });
  return reading;
}

/** Problems leave the verifier as fresh data (never shared with the memo). */
function fresh(p: Problem): Problem {
  return JSON.parse(JSON.stringify(p)) as Problem;
}

function packageFootprintPins(layout: LayoutMaps, ref: string): string[] | undefined {
  const lp = layout.parts.find((p) => p.ref === ref);
  return lp ? footprintNamed(lp.footprint)?.pinNames.slice() : undefined;
}

/** Spare package pins carry the nets the layout gave them (tied-off sections). */
function applySpares(layout: LayoutMaps, parts: Map<string, ExpectedPart>, faults: Problem[]): void {
  const copied = new Set<ExpectedPart>();
  for (const [ref, map] of Object.entries(layout.spares ?? {})) {
    let e = parts.get(ref);
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
      else {
        // expected parts of circuit parts are shared with the memo: change a copy
        if (!copied.has(e)) {
          e = { ...e, nets: bare(e.nets) };
          copied.add(e);
          parts.set(ref, e);
        }
        e.nets[pin] = net;
      }
    }
  }
}

/** A copy of a name → net map without a prototype: names are user text. */
function bare(map: Record<string, string>): Record<string, string> {
  return Object.assign(Object.create(null) as Record<string, string>, map);
}
