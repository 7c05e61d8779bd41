/**
 * The footprint library: names → footprints. Two-lead footprints take their pin names
 * from the part; the others carry their own (TO-92/TO-220 from the lead order in the name).
 */
import type { Footprint } from './footprint.ts';
import { AXIAL_SPECS, RADIAL_SPECS, axial, radial } from './two-lead.ts';
import { dip, header2, padRow, to220, to92, trimmer } from './multi-lead.ts';

export const DIP_SIZES = [4, 6, 8, 14, 16, 18, 20, 24, 28];

/** Names a user may write, for help text and the app's picker. Patterns in angle brackets. */
export function footprintNames(): string[] {
  return [
    ...AXIAL_SPECS.map((s) => s.name),
    ...RADIAL_SPECS.map((s) => s.name),
    'to92-<order>',
    'to220-<order>',
    ...DIP_SIZES.map((n) => `dip-${n}`),
    'pads-<n>',
    'header-2x<n>',
    'trimmer-inline',
    'trimmer-triangle',
  ];
}

/** Whether a footprint takes its two pin names from the part. */
export function isTwoLead(name: string): boolean {
  return AXIAL_SPECS.some((s) => s.name === name) || RADIAL_SPECS.some((s) => s.name === name);
}

/**
 * Resolve a footprint by name. `pinNames` supplies the two pin names for two-lead
 * footprints (first at the anchor). Returns undefined for an unknown name or a mismatch.
 */
export function getFootprint(name: string, pinNames?: readonly string[]): Footprint | undefined {
  const ax = AXIAL_SPECS.find((s) => s.name === name);
  const rad = RADIAL_SPECS.find((s) => s.name === name);
  if (ax || rad) {
    if (!pinNames || pinNames.length !== 2 || pinNames[0] === pinNames[1]) return undefined;
    const pins: [string, string] = [pinNames[0]!, pinNames[1]!];
    return ax ? axial(ax, pins) : radial(rad!, pins);
  }
  let m = /^to(92|220)-([A-Za-z]{3})$/.exec(name);
  if (m) {
    const order = m[2]!;
    if (new Set(order).size !== 3) return undefined;
    return m[1] === '92' ? to92(order) : to220(order);
  }
  m = /^dip-(\d+)$/.exec(name);
  if (m && DIP_SIZES.includes(Number(m[1]))) return dip(Number(m[1]));
  m = /^pads-(\d+)$/.exec(name);
  if (m && Number(m[1]) >= 1 && Number(m[1]) <= 64) return padRow(Number(m[1]));
  m = /^header-2x(\d+)$/.exec(name);
  if (m && Number(m[1]) >= 1 && Number(m[1]) <= 40) return header2(Number(m[1]));
  if (name === 'trimmer-inline') return trimmer('inline');
  if (name === 'trimmer-triangle') return trimmer('triangle');
  return undefined;
}
