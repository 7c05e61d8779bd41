/**
 * The parts list, grouped by kind, value and footprint: count and refs, the value in IEC
 * 60062 letter form ("4k7", "100n") where it reads as a number, resistor colour bands for
 * 4 and 5 bands, the three-digit code of unpolarised capacitors, a polarity note, the
 * footprint and its lead spacing. Values that do not read as numbers (part numbers,
 * "quad op-amp") are listed as written.
 */
import { PART_KINDS } from '../model/circuit.ts';
import { KINDS } from '../parts/kinds.ts';
import type { Footprint } from '../parts/footprint.ts';
import { capacitorCode, colourBands, formatValue, parseValue, type Quantity } from '../values/index.ts';
import { byRef, type Placed } from './placed.ts';
import type { PartGroup } from './types.ts';

const QUANTITY: Partial<Record<string, Quantity>> = { resistor: 'resistance', trimmer: 'resistance', capacitor: 'capacitance', inductor: 'inductance' };

function mm(v: number): string {
  return `${(Math.round(v * 100) / 100).toFixed(2)} mm`;
}

/** What the builder must line up, from the footprint's marks (common practice wording). */
function polarityNote(kind: string, fp: Footprint): string | undefined {
  if (fp.marks.plus) return '+ lead into the hole marked +; the stripe on the can marks the − lead';
  if (fp.marks.cathode && kind === 'led') return 'cathode (K): the shorter lead, by the flat on the rim';
  if (fp.marks.cathode) return 'the band marks the cathode (K)';
  if (fp.pinNames.length === 3 && fp.pinNames.every((n) => /^[A-Z]$/.test(n)))
    return `leads ${fp.pinNames.join('-')} left to right with the flat or printed face towards you`;
  if (fp.pinNames.includes('W')) return 'the wiper (W) is the middle lead';
  if (fp.marks.pin1 && fp.height === 'socket') return 'pin 1 at the notch or dot, as drawn';
  return undefined;
}

function spacing(fp: Footprint, spans: number[], pitch: number): string {
  if (fp.span) {
    const uniq = [...new Set(spans)].sort((a, b) => a - b);
    return uniq.map((s) => `${mm(s * pitch)} (${s} holes)`).join(', ') || `${mm(fp.span.preferred * pitch)}`;
  }
  if (fp.spacingMm !== undefined) return mm(fp.spacingMm);
  if (fp.rowSpacingMm !== undefined && fp.leadPitchMm !== undefined) return `${mm(fp.leadPitchMm)} pitch, rows ${mm(fp.rowSpacingMm)} apart`;
  if (fp.leadPitchMm !== undefined) return `${mm(fp.leadPitchMm)} pitch`;
  return '';
}

interface Reading {
  value: string;
  number?: number;
  quantity?: Quantity;
}

function readValue(kind: string, written: string): Reading {
  const q = QUANTITY[kind];
  if (!q || !written) return { value: written };
  const r = parseValue(written, q);
  if (!r.ok) return { value: written };
  return { value: formatValue(r.value.value, q), number: r.value.value, quantity: q };
}

export function partsList(placed: Placed[], pitch: number): PartGroup[] {
  const groups = new Map<string, { g: PartGroup; spans: number[]; fp: Footprint; sortValue: number }>();
  for (const p of placed) {
    if (!p.dp || !p.fp) continue;
    const { dp, fp } = p;
    const written = dp.value ?? '';
    const kindName = fp.marks.plus && dp.kind === 'capacitor' ? 'electrolytic capacitor' : KINDS[dp.kind].describe;
    const reading = readValue(dp.kind, written);
    const key = `${kindName}\u0000${reading.value}\u0000${fp.name}`;
    let entry = groups.get(key);
    if (!entry) {
      const g: PartGroup = { kind: kindName, value: reading.value, written, count: 0, refs: [], footprint: fp.name, footprintTitle: fp.title, leadSpacing: '', height: fp.height };
      if (reading.number !== undefined && dp.kind === 'resistor') {
        const b4 = colourBands(reading.number, 4);
        const b5 = colourBands(reading.number, 5);
        if (b4.ok) g.bands4 = b4.value;
        if (b5.ok) g.bands5 = b5.value;
      }
      if (reading.number !== undefined && reading.quantity === 'capacitance' && !fp.marks.plus) {
        const code = capacitorCode(reading.number);
        if (code !== undefined) g.capCode = code;
      }
      const pol = polarityNote(dp.kind, fp);
      if (pol) g.polarity = pol;
      entry = { g, spans: [], fp, sortValue: reading.number ?? Number.POSITIVE_INFINITY };
      groups.set(key, entry);
    }
    entry.g.count++;
    entry.g.refs.push(dp.ref);
    if (p.pose?.span !== undefined) entry.spans.push(p.pose.span);
  }
  const kindRank = (p: Placed['dp']) => (p ? PART_KINDS.indexOf(p.kind) : 99);
  const rankOf = new Map<string, number>();
  for (const p of placed) if (p.dp && p.fp) rankOf.set(p.dp.ref, kindRank(p.dp));
  return [...groups.values()]
    .map((e) => {
      e.g.refs.sort(byRef);
      e.g.leadSpacing = spacing(e.fp, e.spans, pitch);
      return e;
    })
    .sort(
      (a, b) =>
        (rankOf.get(a.g.refs[0]!) ?? 99) - (rankOf.get(b.g.refs[0]!) ?? 99) ||
        a.g.kind.localeCompare(b.g.kind) ||
        a.sortValue - b.sortValue ||
        byRef(a.g.refs[0]!, b.g.refs[0]!),
    )
    .map((e) => e.g);
}
