/**
 * `readPlacement(design, layout): Result<Placed>` — the placement as the router needs it:
 * every pin of every design part at a hole, numbered nets, and the holes covered by part
 * bodies. Nets are numbered in the design's order; each unconnected pin gets a net of its
 * own (numbered after the real ones) so that the cut rule isolates it like any other net.
 * Parts missing or unknown, pins missing, off the board or sharing a hole, and pins that do
 * not keep their footprint's geometry are bad input (`route.*` problems naming the part).
 */
import { holeLabel } from '../board/index.ts';
import type { Design } from '../netlist/index.ts';
import { fail, ok, type Layout, type Problem, type Result } from '../model/index.ts';
import { fitPose, getFootprint, poseBody, type Offset } from '../parts/index.ts';

export interface PlacedPin {
  ref: string;
  pin: string;
  /** Net number; ≥ realNets for an unconnected pin. */
  net: number;
  hole: number;
}

export interface Placed {
  pins: PlacedPin[];
  /** Net names by number: the design's nets, then one name per unconnected pin. */
  netNames: string[];
  realNets: number;
  /** Per hole: net of the pin in it (−1: none) and that pin's index in `pins`. */
  leadNet: Int32Array;
  leadPin: Int32Array;
  /** Per hole: 1 when a part body covers it (lead holes included). */
  body: Uint8Array;
}

function problem(code: string, path: (string | number)[], message: string, hint: string, refs: string[], extra: Partial<Problem> = {}): Problem {
  return { code, severity: 'error', path, message, hint, refs, ...extra };
}

export function readPlacement(design: Design, layout: Layout): Result<Placed> {
  const { cols, rows } = layout.board;
  const holes = cols * rows;
  const problems: Problem[] = [];
  const netIndex = new Map<string, number>();
  const netNames: string[] = [];
  for (const n of design.nets) {
    netIndex.set(n.name, netNames.length);
    netNames.push(n.name);
  }
  const realNets = netNames.length;
  const byRef = new Map(layout.parts.map((p, i) => [p.ref, i] as const));
  const designRefs = new Set(design.parts.map((p) => p.ref));
  layout.parts.forEach((p, i) => {
    if (!designRefs.has(p.ref))
      problems.push(problem('route.extra-part', ['parts', i, 'ref'], `the placement has part ${p.ref}, which the circuit does not`, `remove ${p.ref} from the placement or add it to the circuit`, [p.ref]));
    else if (byRef.get(p.ref) !== i)
      problems.push(problem('route.duplicate-part', ['parts', i, 'ref'], `part ${p.ref} is placed twice`, `keep one entry for ${p.ref}`, [p.ref]));
  });

  const pins: PlacedPin[] = [];
  const leadNet = new Int32Array(holes).fill(-1);
  const leadPin = new Int32Array(holes).fill(-1);
  const body = new Uint8Array(holes);
  for (const dp of design.parts) {
    const li = byRef.get(dp.ref);
    if (li === undefined) {
      problems.push(problem('route.missing-part', ['parts'], `part ${dp.ref} is not placed`, `place every pin of ${dp.ref} on the board`, [dp.ref]));
      continue;
    }
    const lp = layout.parts[li]!;
    const at: Record<string, Offset> = {};
    lp.pins.forEach((pp, k) => {
      if (!dp.pinNames.includes(pp.pin))
        problems.push(problem('route.unknown-pin', ['parts', li, 'pins', k, 'pin'], `${dp.ref} has no pin "${pp.pin}"`, `use the pin names ${dp.pinNames.join(', ')}`, [dp.ref]));
      else if (at[pp.pin])
        problems.push(problem('route.duplicate-pin', ['parts', li, 'pins', k], `${dp.ref} pin ${pp.pin} is placed twice`, 'keep one entry per pin', [dp.ref]));
      else at[pp.pin] = [pp.at[0], pp.at[1]];
    });
    let complete = true;
    for (const pin of dp.pinNames) {
      const h = at[pin];
      if (!h) {
        complete = false;
        problems.push(problem('route.missing-pin', ['parts', li, 'pins'], `${dp.ref} pin ${pin} has no hole`, `place every pin of ${dp.ref}, including unconnected ones`, [dp.ref], { pins: [{ ref: dp.ref, pin }] }));
        continue;
      }
      const k = lp.pins.findIndex((pp) => pp.pin === pin);
      if (h[0] >= cols || h[1] >= rows) {
        complete = false;
        problems.push(problem('route.off-board', ['parts', li, 'pins', k, 'at'], `${dp.ref} pin ${pin} at [${h[0]}, ${h[1]}] lies outside the ${cols}×${rows} board`, 'move the part onto the board or enlarge the board', [dp.ref], { pins: [{ ref: dp.ref, pin }] }));
        continue;
      }
      const i = h[0] + h[1] * cols;
      const other = leadPin[i]!;
      if (other >= 0) {
        const o = pins[other]!;
        problems.push(problem('route.shared-hole', ['parts', li, 'pins', k, 'at'], `${dp.ref} pin ${pin} and ${o.ref} pin ${o.pin} share hole ${holeLabel(h, 'component', cols)}`, 'give every lead a hole of its own', [dp.ref, o.ref], { holes: [h] }));
        continue;
      }
      const name = dp.nets[pin];
      let net = name === undefined ? undefined : netIndex.get(name);
      if (net === undefined) {
        net = netNames.length;
        netNames.push(`${dp.ref}.${pin} (unconnected)`);
      }
      leadNet[i] = net;
      leadPin[i] = pins.length;
      pins.push({ ref: dp.ref, pin, net, hole: i });
    }
    const fp = getFootprint(lp.footprint, dp.pinNames);
    if (!fp) {
      problems.push(problem('route.footprint', ['parts', li, 'footprint'], `${dp.ref}: footprint "${lp.footprint}" is unknown or does not fit its pins ${dp.pinNames.join(', ')}`, `use the footprint the circuit gives it (${dp.footprint})`, [dp.ref]));
      continue;
    }
    if (!complete) continue;
    const pose = fitPose(fp, at, dp.span);
    if (!pose) {
      problems.push(problem('route.geometry', ['parts', li, 'pins'], `${dp.ref}: its pins do not keep the shape of footprint ${fp.name}`, 'place the pins as the footprint lays them out (pitch, order, span limits)', [dp.ref]));
      continue;
    }
    for (const [x, y] of poseBody(fp, pose)) if (x >= 0 && y >= 0 && x < cols && y < rows) body[x + y * cols] = 1;
  }
  if (problems.length) return fail(problems);
  return ok({ pins, netNames, realNets, leadNet, leadPin, body });
}
