/**
 * Reading op-amp sections through the layout's `packing` map. Checks that every section is
 * packed once, maps all five pins, sits in a real section of the industry-standard dual
 * DIP-8 or quad DIP-14 pinout (our own table, from ../shared/design/exchange.md), and that
 * sections sharing a package agree on the nets of shared pins.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import type { Problem } from '../model/problem.ts';
import { footprintNamed } from './footprints.ts';
import { problem } from './words.ts';

const SECTION_PINS = ['+', '-', 'out', 'V+', 'V-'] as const;

interface Standard {
  /** [out, −, +] of each section. */
  sections: [string, string, string][];
  supply: { 'V+': string; 'V-': string };
}

/** exchange.md "Packing": dual 1 outA 2 −A 3 +A 4 V− 5 +B 6 −B 7 outB 8 V+; quad as listed there. */
const STANDARD: Record<number, Standard> = {
  8: { sections: [['1', '2', '3'], ['7', '6', '5']], supply: { 'V+': '8', 'V-': '4' } },
  14: {
    sections: [['1', '2', '3'], ['7', '6', '5'], ['8', '9', '10'], ['14', '13', '12']],
    supply: { 'V+': '4', 'V-': '11' },
  },
};

export interface PackageInfo {
  ref: string;
  path: (string | number)[];
  nets: Record<string, string>;
  /** Pin names to use when the package is not on the board to ask its footprint. */
  fallbackPins: string[];
}

type LayoutMaps = Pick<Layout, 'parts' | 'packing'>;

export function checkPacking(circuit: Circuit, layout: LayoutMaps, circuitRefs: Set<string>): { faults: Problem[]; packages: PackageInfo[] } {
  const faults: Problem[] = [];
  const packing = layout.packing ?? {};
  const sections = new Map<string, number>();
  circuit.parts.forEach((p, i) => {
    if (p.kind === 'opamp' && !sections.has(p.ref)) sections.set(p.ref, i);
  });
  const fault = (path: (string | number)[], message: string, hint: string, refs: string[], nets?: string[]) =>
    faults.push(problem('verify.packing', 'error', path, message, nets ? { hint, refs, nets } : { hint, refs }));

  for (const [ref, i] of sections)
    if (!packing[ref])
      faults.push(
        problem('verify.missing-part', 'error', ['parts', i], `op-amp section ${ref} is in no package: the layout's packing does not list it`, {
          hint: `add "packing": { "${ref}": { "part": "U…", "pins": { … } } } naming the package that holds it`,
          refs: [ref],
        }),
      );

  const packages = new Map<string, PackageInfo & { used: Set<number>; size: number | undefined }>();
  for (const [secRef, entry] of Object.entries(packing)) {
    const path = ['packing', secRef];
    const ci = sections.get(secRef);
    if (ci === undefined) {
      fault(path, `packing lists ${secRef}, but the circuit has no op-amp section called ${secRef}`, 'remove the entry, or fix the reference', [secRef]);
      continue;
    }
    if (circuitRefs.has(entry.part)) {
      fault([...path, 'part'], `packing puts ${secRef} into ${entry.part}, which is already a circuit part`, 'give the package a reference of its own', [secRef, entry.part]);
      continue;
    }
    const section = circuit.parts[ci]!;
    const keys = Object.keys(entry.pins);
    const missing = SECTION_PINS.filter((k) => entry.pins[k] === undefined);
    const unknown = keys.filter((k) => !(SECTION_PINS as readonly string[]).includes(k));
    if (missing.length || unknown.length) {
      fault(
        [...path, 'pins'],
        `packing of ${secRef} must map the five section pins + − out V+ V−` +
          (missing.length ? `; missing ${missing.join(' ')}` : '') +
          (unknown.length ? `; unknown ${unknown.join(' ')}` : ''),
        'map every section pin to a package pin number',
        [secRef],
      );
      continue;
    }
    let pkg = packages.get(entry.part);
    if (!pkg) {
      const lp = layout.parts.find((p) => p.ref === entry.part);
      const size = lp ? footprintNamed(lp.footprint)?.pinNames.length : undefined;
      pkg = { ref: entry.part, path, nets: Object.create(null) as Record<string, string>, fallbackPins: [], used: new Set(), size };
      packages.set(entry.part, pkg);
    }
    const nums = SECTION_PINS.map((k) => Number(entry.pins[k]));
    const size = pkg.size ?? (Math.max(...nums) > 8 ? 14 : 8);
    pkg.fallbackPins = Array.from({ length: size }, (_, k) => String(k + 1));
    const std = STANDARD[size];
    if (!std) {
      fault([...path, 'part'], `${entry.part} has ${size} pins; op-amp sections go into DIP-8 (dual) or DIP-14 (quad) packages`, 'use a dip-8 or dip-14 footprint', [entry.part]);
      continue;
    }
    const p = entry.pins as Record<(typeof SECTION_PINS)[number], string>;
    const slot = std.sections.findIndex((s) => s[0] === p.out && s[1] === p['-'] && s[2] === p['+']);
    if (slot < 0 || p['V+'] !== std.supply['V+'] || p['V-'] !== std.supply['V-']) {
      fault(
        [...path, 'pins'],
        `packing of ${secRef} (out ${p.out}, − ${p['-']}, + ${p['+']}, V+ ${p['V+']}, V− ${p['V-']}) is not a section of the standard DIP-${size} op-amp pinout`,
        `use one of (out, −, +) = ${std.sections.map((s) => s.join(', ')).join(' / ')} with V+ on ${std.supply['V+']} and V− on ${std.supply['V-']}`,
        [secRef, entry.part],
      );
      continue;
    }
    if (pkg.used.has(slot)) {
      fault([...path, 'pins'], `two sections of ${entry.part} use the section on pins ${std.sections[slot]!.join(', ')}`, 'give each section of a package its own pins', [secRef, entry.part]);
      continue;
    }
    pkg.used.add(slot);
    for (const k of SECTION_PINS) {
      const net = section.pins[k];
      if (net === undefined) continue; // the circuit check reports the open lead
      const pin = p[k];
      const had = pkg.nets[pin];
      if (had !== undefined && had !== net)
        fault([...path, 'pins', k], `${entry.part} pin ${pin} would carry ${had} and ${net} (${secRef} ${k})`, 'sections sharing a package must share their supply nets', [secRef, entry.part], [had, net]);
      else pkg.nets[pin] = net;
    }
  }
  return { faults, packages: [...packages.values()].map(({ ref, path, nets, fallbackPins }) => ({ ref, path, nets, fallbackPins })) };
}
