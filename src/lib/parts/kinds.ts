/**
 * The part-kind contract: for each circuit `kind`, its pin names, which pins may stay
 * unconnected, the default footprint and the reference letter. Everything downstream asks
 * these functions instead of switching on a kind name (style habit 4).
 */
import type { CircuitPart, PartKind } from '../model/circuit.ts';
import type { Problem } from '../model/problem.ts';
import { getFootprint } from './library.ts';
import type { Footprint } from './footprint.ts';

export interface KindInfo {
  /** Pin names in footprint order; undefined where they depend on the part (ic, pads). */
  pins?: string[];
  /** Whether a pin may be left out of `pins` (unconnected). */
  openPinsAllowed: boolean;
  /** Reference letter(s) a builder expects (IEEE 315 class letters, check-values §9). */
  refLetters: string[];
  /** Lead order used when a transistor part states no pinout (warned loudly). */
  defaultPinout?: string;
  describe: string;
}

export const KINDS: Record<PartKind, KindInfo> = {
  resistor: { pins: ['1', '2'], openPinsAllowed: false, refLetters: ['R'], describe: 'resistor' },
  capacitor: { pins: ['1', '2'], openPinsAllowed: false, refLetters: ['C'], describe: 'capacitor' },
  inductor: { pins: ['1', '2'], openPinsAllowed: false, refLetters: ['L'], describe: 'inductor' },
  diode: { pins: ['A', 'K'], openPinsAllowed: false, refLetters: ['D', 'CR'], describe: 'diode' },
  led: { pins: ['A', 'K'], openPinsAllowed: false, refLetters: ['D', 'LED', 'DS'], describe: 'LED' },
  zener: { pins: ['A', 'K'], openPinsAllowed: false, refLetters: ['D', 'Z', 'ZD'], describe: 'zener diode' },
  npn: { pins: ['C', 'B', 'E'], openPinsAllowed: true, refLetters: ['Q', 'T', 'TR'], defaultPinout: 'EBC', describe: 'NPN transistor' },
  pnp: { pins: ['C', 'B', 'E'], openPinsAllowed: true, refLetters: ['Q', 'T', 'TR'], defaultPinout: 'EBC', describe: 'PNP transistor' },
  nmos: { pins: ['D', 'G', 'S'], openPinsAllowed: true, refLetters: ['Q', 'M', 'T'], defaultPinout: 'SGD', describe: 'N-channel MOSFET' },
  pmos: { pins: ['D', 'G', 'S'], openPinsAllowed: true, refLetters: ['Q', 'M', 'T'], defaultPinout: 'SGD', describe: 'P-channel MOSFET' },
  'jfet-n': { pins: ['D', 'G', 'S'], openPinsAllowed: true, refLetters: ['Q', 'J', 'T'], defaultPinout: 'DSG', describe: 'N-channel JFET' },
  'jfet-p': { pins: ['D', 'G', 'S'], openPinsAllowed: true, refLetters: ['Q', 'J', 'T'], defaultPinout: 'DSG', describe: 'P-channel JFET' },
  ic: { openPinsAllowed: true, refLetters: ['U', 'IC'], describe: 'integrated circuit' },
  opamp: { pins: ['+', '-', 'out', 'V+', 'V-'], openPinsAllowed: false, refLetters: ['U', 'IC'], describe: 'op-amp section' },
  trimmer: { pins: ['1', 'W', '3'], openPinsAllowed: true, refLetters: ['RV', 'VR', 'R', 'P'], describe: 'trimmer' },
  pads: { openPinsAllowed: true, refLetters: ['J', 'P', 'X', 'W', 'TP'], describe: 'off-board pads' },
  header: { openPinsAllowed: true, refLetters: ['J', 'P', 'X', 'H'], describe: '2-row pin header' },
};

function polarizedCap(part: CircuitPart): boolean {
  return part.kind === 'capacitor' && (part.polarized === true || '+' in part.pins || '-' in part.pins);
}

/** The full list of a part's pin names, including pins left unconnected. */
export function partPinNames(part: CircuitPart): string[] {
  if (polarizedCap(part)) return ['+', '-'];
  if (part.kind === 'ic') {
    const n = packagePins(part.package) ?? 0;
    return Array.from({ length: n }, (_, i) => String(i + 1));
  }
  if (part.kind === 'pads') return Array.from({ length: part.count ?? 0 }, (_, i) => String(i + 1));
  if (part.kind === 'header') return Array.from({ length: 2 * (part.count ?? 0) }, (_, i) => String(i + 1));
  return [...(KINDS[part.kind].pins ?? [])];
}

export function packagePins(pkg: string | undefined): number | undefined {
  const m = pkg ? /^DIP-(\d+)$/i.exec(pkg) : null;
  return m ? Number(m[1]) : undefined;
}

/** Whether the part has a marked orientation the builder must respect. */
export function isPolarized(part: CircuitPart): boolean {
  return polarizedCap(part) || ['diode', 'led', 'zener', 'npn', 'pnp', 'nmos', 'pmos', 'jfet-n', 'jfet-p', 'ic', 'trimmer'].includes(part.kind);
}

/** The lead order for a three-lead part, and whether it was defaulted. */
export function leadOrder(part: CircuitPart): { order: string; defaulted: boolean } | undefined {
  const info = KINDS[part.kind];
  if (!info.defaultPinout) return undefined;
  if (part.pinout) return { order: part.pinout.toUpperCase(), defaulted: false };
  return { order: info.defaultPinout, defaulted: true };
}

/** Default footprint name for a part (a `footprint` field overrides it). */
export function defaultFootprintName(part: CircuitPart): string | undefined {
  switch (part.kind) {
    case 'resistor':
    case 'inductor':
      return 'axial-small';
    case 'capacitor':
      return polarizedCap(part) ? 'ecap-2.54' : 'radial-2.54';
    case 'diode':
    case 'zener':
      return 'do35';
    case 'led':
      return 'led-5mm';
    case 'ic': {
      const n = packagePins(part.package);
      return n ? `dip-${n}` : undefined;
    }
    case 'trimmer':
      return 'trimmer-inline';
    case 'pads':
      return part.count ? `pads-${part.count}` : undefined;
    case 'header':
      return part.count ? `header-2x${part.count}` : undefined;
    case 'opamp':
      return undefined;
    default: {
      const lo = leadOrder(part);
      return lo ? `to92-${lo.order}` : undefined;
    }
  }
}

/** The footprint a part uses: its override or the default, bound to its pin names. */
export function footprintFor(part: CircuitPart): Footprint | undefined {
  const name = part.footprint ?? defaultFootprintName(part);
  return name ? getFootprint(name, partPinNames(part)) : undefined;
}

/**
 * Per-kind checks of one part: pin names known, required pins connected, lead order
 * valid, footprint resolvable and matching the part's pins. Paths are relative to the part.
 */
export function checkPart(part: CircuitPart, path: (string | number)[]): Problem[] {
  const out: Problem[] = [];
  const info = KINDS[part.kind];
  const names = partPinNames(part);
  const err = (code: string, sub: (string | number)[], message: string, hint: string): void => {
    out.push({ code: `part.${code}`, severity: 'error', path: [...path, ...sub], message, hint, refs: [part.ref] });
  };
  if (part.kind === 'ic' && !part.package)
    err('no-package', ['package'], `${part.ref} is an ic but says no package`, 'add "package": "DIP-8" (or DIP-14, DIP-16 …)');
  if ((part.kind === 'pads' || part.kind === 'header') && !part.count)
    err('no-count', ['count'], `${part.ref} is ${part.kind} but says no count`, 'add "count": N, the number of pads');
  if (part.kind === 'opamp') {
    // sections are packed into DIP packages before placement (see netlist/packing)
  }
  for (const pin of Object.keys(part.pins)) {
    if (!names.includes(pin))
      err('unknown-pin', ['pins', pin], `${part.ref} (${info.describe}) has no pin "${pin}"`, `use the pin names ${names.join(', ') || '(none)'}`);
  }
  if (!info.openPinsAllowed) {
    for (const pin of names)
      if (!(pin in part.pins))
        err('open-lead', ['pins'], `${part.ref} leaves pin "${pin}" unconnected; a ${info.describe} needs every lead connected`, `connect pin "${pin}" to a net`);
  }
  if (part.pinout && info.defaultPinout) {
    const order = part.pinout.toUpperCase();
    const want = [...(info.pins ?? [])].sort().join('');
    if ([...order].sort().join('') !== want)
      err('bad-pinout', ['pinout'], `${part.ref} pinout "${part.pinout}" does not name each of ${info.pins?.join(', ')} once`, `write the lead order from the flat face, e.g. "${info.defaultPinout}"`);
  }
  if (part.pinout && !info.defaultPinout)
    err('pinout-not-used', ['pinout'], `${part.ref} is a ${info.describe}; pinout applies to three-lead transistors only`, 'remove "pinout"');
  if (out.length === 0 && part.kind !== 'opamp') {
    const fp = footprintFor(part);
    if (!fp)
      err(
        'unknown-footprint',
        ['footprint'],
        `${part.ref}: footprint "${part.footprint ?? defaultFootprintName(part) ?? '?'}" is not in the library or does not fit its pins`,
        'pick a footprint from `kerfline footprints`, with as many pins as the part',
      );
    else if (fp.pinNames.length !== names.length || names.some((n) => !fp.pinNames.includes(n)))
      err('footprint-pins', ['footprint'], `${part.ref}: footprint ${fp.name} has pins ${fp.pinNames.join(', ')} but the part has ${names.join(', ')}`, 'pick a footprint whose pins match the part');
    if (fp?.span && part.span && (part.span.max < fp.span.min || part.span.min > fp.span.max))
      err('span-range', ['span'], `${part.ref}: span ${part.span.min}–${part.span.max} holes cannot fit ${fp.name} (${fp.span.min}–${fp.span.max})`, `give a span within ${fp.span.min}–${fp.span.max}`);
  }
  return out;
}
