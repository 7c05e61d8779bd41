/**
 * Op-amp sections inside their packages, for the gate-swap move.
 *
 * `sectionTables(design, refs)` lists, per packed package, its section slots (the package
 * pins of +, − and out of each section, from the standard pinouts in netlist/packing.ts)
 * and which circuit section sits in each slot (undefined for a tied-off spare).
 * Swapping two slots of one package swaps the nets on their pins; the supply pins stay, so
 * any two sections of one package may trade places. `packingOf` and `sparesOf` write the
 * layout's `packing` and `spares` maps back from the slots as they end up.
 */
import type { Design } from '../netlist/design.ts';
import type { Packing } from '../model/layout.ts';
import { DUAL_SECTIONS, DUAL_SUPPLY, QUAD_SECTIONS, QUAD_SUPPLY } from '../netlist/packing.ts';

const PIN_ROLES = ['+', '-', 'out'] as const;

export interface SectionTable {
  /** Index of the package among the design's parts. */
  part: number;
  ref: string;
  /** Package pin names of each slot, in the order + − out. */
  slots: string[][];
  /** Circuit section in each slot at the start. */
  sections: (string | undefined)[];
  supply: Record<'V+' | 'V-', string>;
}

export function sectionTables(design: Design, refs: string[]): SectionTable[] {
  if (!design.packing) return [];
  const byPart = new Map<string, { section: string; pins: Record<string, string> }[]>();
  for (const [section, entry] of Object.entries(design.packing)) {
    const list = byPart.get(entry.part) ?? [];
    list.push({ section, pins: entry.pins });
    byPart.set(entry.part, list);
  }
  const out: SectionTable[] = [];
  for (const [ref, members] of byPart) {
    const part = refs.indexOf(ref);
    if (part < 0) continue;
    const first = members[0]!.pins;
    const table = [
      { slots: DUAL_SECTIONS, supply: DUAL_SUPPLY },
      { slots: QUAD_SECTIONS, supply: QUAD_SUPPLY },
    ].find((t) => t.supply['V+'] === first['V+'] && t.supply['V-'] === first['V-'] && members.length <= t.slots.length && (design.parts[part]?.pinNames.length ?? 0) === (t.slots.length === 2 ? 8 : 14));
    if (!table) continue;
    const slots = table.slots.map((s) => PIN_ROLES.map((r) => s[r]));
    const sections = slots.map((pins) => members.find((m) => m.pins['+'] === pins[0])?.section);
    out.push({ part, ref, slots, sections, supply: { ...table.supply } });
  }
  return out;
}

/** The packing map for the slots as assigned (`slotSections[t][s]` = section in slot s). */
export function packingOf(tables: SectionTable[], slotSections: (string | undefined)[][], original: Packing | undefined): Packing | undefined {
  if (!original) return undefined;
  const packing: Packing = {};
  for (const [section, entry] of Object.entries(original)) packing[section] = { part: entry.part, pins: { ...entry.pins } };
  tables.forEach((t, ti) => {
    slotSections[ti]!.forEach((section, s) => {
      if (!section) return;
      const pins = t.slots[s]!;
      packing[section] = { part: t.ref, pins: { '+': pins[0]!, '-': pins[1]!, out: pins[2]!, 'V+': t.supply['V+'], 'V-': t.supply['V-'] } };
    });
  });
  return packing;
}

/** The spares map: nets on the pins of every slot that holds no section. */
export function sparesOf(tables: SectionTable[], slotSections: (string | undefined)[][], netsOf: (part: number, pin: string) => string | undefined, original: Record<string, Record<string, string>> | undefined): Record<string, Record<string, string>> | undefined {
  if (!original) return undefined;
  const spares: Record<string, Record<string, string>> = {};
  for (const [ref, pins] of Object.entries(original)) if (!tables.some((t) => t.ref === ref)) spares[ref] = { ...pins };
  tables.forEach((t, ti) => {
    slotSections[ti]!.forEach((section, s) => {
      if (section) return;
      for (const pin of t.slots[s]!) {
        const net = netsOf(t.part, pin);
        if (net !== undefined) (spares[t.ref] ??= {})[pin] = net;
      }
    });
  });
  return Object.keys(spares).length ? spares : undefined;
}
