/** The bench guide as plain data (what `buildGuide` returns and `guideHtml` prints). */
import type { Hole, Problem } from '../model/problem.ts';
import type { HeightClass } from '../parts/footprint.ts';
import type { Scene } from '../render/index.ts';
import type { WireStock } from './awg.ts';

/** A hole named from both sides of the board: "C7" from the component side, "C18" from the copper side. */
export interface HoleName {
  hole: Hole;
  component: string;
  copper: string;
}

export interface BoardPrep {
  kind: string;
  /** One line for people: "strip board: copper strips run along the rows". */
  describe: string;
  pattern?: string;
  cols: number;
  rows: number;
  pitchMm: number;
  widthMm: number;
  heightMm: number;
  /** The rectangle to keep: everything used plus a margin, inclusive corners. */
  trim: { from: HoleName; to: HoleName; cols: number; rows: number; widthMm: number; heightMm: number; whole: boolean };
}

export interface CutItem {
  id: string;
  style: 'drilled' | 'scored';
  /** As read from the copper side (the board turned over), then from the component side. */
  copper: string;
  component: string;
}

export interface CutRow {
  row: string;
  items: CutItem[];
}

export interface SegmentItem {
  id: string;
  from: HoleName;
  to: HoleName;
  /** Hole centre to hole centre. */
  lengthMm: number;
  /** Length of wire to cut: the span plus a lead through each hole (common practice). */
  cutMm: number;
  net?: string;
  /** A link that must be insulated wire (bent, over a pin, or crossing another would-be bare link): sleeved, laid along the grid (cut to the row-plus-column span). */
  insulated?: true;
}

export interface PartGroup {
  kind: string;
  /** Value in IEC 60062 letter form where it is a number ("4k7", "100n"), else as written. */
  value: string;
  written: string;
  count: number;
  refs: string[];
  bands4?: string[];
  bands5?: string[];
  capCode?: string;
  polarity?: string;
  footprint: string;
  footprintTitle: string;
  leadSpacing: string;
  height: HeightClass;
}

export interface BuildStep {
  step: number;
  stage: HeightClass | 'insulated' | 'wires';
  title: string;
  items: string[];
  note: string;
}

export interface OffBoardPad {
  pin: string;
  hole: HoleName;
  net?: string;
  label?: string;
}

export interface OffBoardPart {
  ref: string;
  value?: string;
  pads: OffBoardPad[];
}

export interface ProbeItem {
  a: HoleName;
  b: HoleName;
  nets: string[];
  note: string;
}

export interface Caution {
  text: string;
}

export interface Guide {
  title: string;
  board: BoardPrep;
  cuts: CutRow[];
  cutCount: number;
  links: SegmentItem[];
  wires: SegmentItem[];
  wireStock: WireStock;
  parts: PartGroup[];
  buildOrder: BuildStep[];
  offBoard: OffBoardPart[];
  probes: { beep: ProbeItem[]; silent: ProbeItem[] };
  cautions: Caution[];
  scenes: { copper: Scene; component: Scene };
  /** Things to check before building (defaulted lead orders, single-pin nets …). */
  warnings: Problem[];
}
