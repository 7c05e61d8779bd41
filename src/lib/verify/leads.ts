/**
 * Faults of one hole's leads: two or more leads through one hole (`verify.shared-hole`;
 * pins and link ends count, copper-side wires do not), and leads in a hole whose copper a
 * cut removed (`verify.lead-in-cut`).
 */
import { holeAt } from '../board/index.ts';
import type { Problem } from '../model/problem.ts';
import type { Lead } from './stage.ts';
import { at, listText, problem } from './words.ts';

export function leadName(l: Lead): string {
  return l.kind === 'pin' ? `${l.ref} pin ${l.pin}` : `link ${l.link + 1} (${l.end === 'from' ? 'start' : 'end'})`;
}

export function leadPath(l: Lead): (string | number)[] {
  return l.kind === 'pin' ? ['parts', l.part, 'pins', l.j, 'at'] : ['links', l.link, l.end];
}

function order(a: Lead, b: Lead): number {
  if (a.kind === 'pin' && b.kind === 'pin') return a.part - b.part || a.j - b.j;
  if (a.kind === 'link' && b.kind === 'link') return a.link - b.link || (a.end < b.end ? 1 : a.end > b.end ? -1 : 0);
  return a.kind === 'pin' ? -1 : 1;
}

export function leadFaults(hole: number, leads: Lead[] | undefined, cutAt: boolean, cols: number): Problem[] {
  if (!leads?.length || (leads.length < 2 && !cutAt)) return [];
  const out: Problem[] = [];
  const sorted = [...leads].sort(order);
  const h = holeAt({ cols }, hole);
  const refs = [...new Set(sorted.flatMap((l) => (l.kind === 'pin' ? [l.ref] : [])))];
  if (sorted.length > 1)
    out.push(
      problem('verify.shared-hole', 'error', leadPath(sorted[0]!), `${sorted.length} leads in one hole ${at(h, cols)}: ${listText(sorted.map(leadName))}`, {
        hint: 'give every lead its own hole: move a part or a link end',
        refs,
        holes: [h],
      }),
    );
  if (cutAt)
    for (const l of sorted)
      out.push(
        problem('verify.lead-in-cut', 'error', leadPath(l), `${leadName(l)} sits in ${at(h, cols)}, where a cut removed the copper`, {
          hint: 'move the lead to a hole with copper, or move the cut next to it (a cut between holes leaves both holes usable)',
          refs: l.kind === 'pin' ? [l.ref] : [],
          holes: [h],
        }),
      );
  return out;
}
