/**
 * Bodies in each other's way: two parts whose body cells share holes (`verify.overlap`), a
 * link end under a part's body (`verify.overlap`), and a link passing over a body
 * (`verify.link-over-body`, a warning: a link can often lie under a raised part).
 */
import { holeAt } from '../board/index.ts';
import type { Segment } from '../model/layout.ts';
import type { Problem } from '../model/problem.ts';
import type { PlacedPart } from './part-check.ts';
import { at, listText, problem } from './words.ts';

/** Overlap of the bodies of parts p and q (p.index < q.index), or undefined. */
export function pairOverlap(p: PlacedPart, q: PlacedPart, cols: number): Problem | undefined {
  const shared = intersect(p.body, q.body);
  if (!shared.length) return undefined;
  const holes = shared.map((i) => holeAt({ cols }, i));
  return problem('verify.overlap', 'error', ['parts', p.index], `${p.ref} and ${q.ref} are in each other's way: their bodies share ${listText(holes.map((h) => at(h, cols)), 4)}`, {
    hint: `move ${q.ref} or ${p.ref} so the bodies keep apart`,
    refs: [p.ref, q.ref],
    holes,
  });
}

/** A link end inside a part's body (not in one of its lead holes: that is a shared hole). */
export function linkEndInBody(link: number, end: 'from' | 'to', hole: number, p: PlacedPart, cols: number): Problem | undefined {
  if (p.pins.some((pin) => pin.hole === hole)) return undefined;
  const h = holeAt({ cols }, hole);
  return problem('verify.overlap', 'error', ['links', link, end], `link ${link + 1} ${end === 'from' ? 'starts' : 'ends'} at ${at(h, cols)}, under the body of ${p.ref}`, {
    hint: `move the link end out from under ${p.ref}`,
    refs: [p.ref],
    holes: [h],
  });
}

export function linkOverBody(link: number, seg: Segment, cells: number[], p: PlacedPart, cols: number): Problem {
  const holes = cells.map((i) => holeAt({ cols }, i));
  return problem('verify.link-over-body', 'warning', ['links', link], `link ${link + 1} from ${at(seg.from, cols)} to ${at(seg.to, cols)} passes over ${p.ref} (${listText(holes.map((h) => at(h, cols)), 3)})`, {
    hint: `fit the link before ${p.ref} and keep it flat, or move it clear`,
    refs: [p.ref],
    holes,
  });
}

function intersect(a: number[], b: number[]): number[] {
  const out: number[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    if (a[i]! < b[j]!) i++;
    else if (a[i]! > b[j]!) j++;
    else {
      out.push(a[i]!);
      i++;
      j++;
    }
  }
  return out;
}
