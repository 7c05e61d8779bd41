/**
 * Build order, lowest parts first so the board can lie flat while each is soldered (common
 * practice): wire links, resistors and diodes, IC sockets, small capacitors, transistors
 * and trimmers, electrolytics and LEDs, then insulated wire links (they lie over the parts
 * they pass, so they go in after them), then copper-side wires (pad boards: they are
 * soldered to the leads), then off-board pads and wires. Steps follow the footprint height
 * classes of the parts contract (parts/footprint HEIGHT_CLASSES); empty steps are left out.
 */
import { HEIGHT_CLASSES, type HeightClass } from '../parts/footprint.ts';
import { byRef, type Placed } from './placed.ts';
import type { BuildStep, SegmentItem } from './types.ts';

const STEPS: Record<HeightClass | 'insulated' | 'wires', { title: string; note: string }> = {
  link: { title: 'Wire links', note: 'bare solid wire, straight and flat on the board; check both end holes before soldering' },
  low: { title: 'Resistors and diodes', note: 'bend the leads to the span shown; diode bands towards the marked end' },
  socket: { title: 'IC sockets', note: 'notch towards the pin-1 mark; fit the ICs only after the board has been checked' },
  small: { title: 'Small capacitors', note: 'ceramic and film capacitors, leads straight through' },
  transistor: { title: 'Transistors and trimmers', note: 'flat or printed face as drawn; keep the leads a few mm long' },
  tall: { title: 'Electrolytics and LEDs', note: 'observe polarity: + and the cathode as marked on the drawing' },
  insulated: { title: 'Insulated wire links', note: 'sleeved hook-up wire, laid along the rows and columns over the parts between its ends, without tension' },
  wires: { title: 'Copper-side wires', note: 'bare wire laid over the pads, soldered at every hole it passes' },
  offboard: { title: 'Off-board pads and wires', note: 'tin the pads; wire to the panel parts last (see the off-board wiring list)' },
};

export function buildOrder(placed: Placed[], links: SegmentItem[], wires: SegmentItem[]): BuildStep[] {
  const byClass = new Map<HeightClass, string[]>();
  for (const p of placed) {
    const h = p.fp?.height ?? 'offboard';
    (byClass.get(h) ?? byClass.set(h, []).get(h)!).push(p.lp.ref);
  }
  const linkText = (l: SegmentItem) => `${l.id} ${l.from.component}–${l.to.component}`;
  byClass.set('link', links.filter((l) => !l.insulated).map(linkText));
  const insulated = links.filter((l) => l.insulated).map((l) => `${linkText(l)} (insulated wire, sleeved)`);
  const order: (HeightClass | 'insulated' | 'wires')[] = [...HEIGHT_CLASSES.filter((h) => h !== 'offboard'), 'insulated', 'wires', 'offboard'];
  const steps: BuildStep[] = [];
  for (const stage of order) {
    const items =
      stage === 'wires' ? wires.map((w) => `${w.id} ${w.from.copper}–${w.to.copper} (copper side)`) : stage === 'insulated' ? insulated : stage === 'link' ? byClass.get('link')! : [...(byClass.get(stage) ?? [])].sort(byRef);
    if (!items.length) continue;
    steps.push({ step: steps.length + 1, stage, title: STEPS[stage].title, items, note: STEPS[stage].note });
  }
  return steps;
}
