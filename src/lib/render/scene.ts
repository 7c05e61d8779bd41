/**
 * The Scene: one side of a board as plain, serialisable drawing data. Every length is in
 * board millimetres with the origin at the board's top-left corner as seen from the side
 * drawn (the copper side is already mirrored: x → width − x). Items carry ids, refs, nets
 * and holes so the app can hit-test and hover without asking the core again.
 *
 * Holes are always given in layout coordinates ([col, row] seen from the component side);
 * labels are given both ways: `label` as seen from the component side and `sideLabel` as
 * seen from the side drawn.
 */
import type { Hole } from '../model/problem.ts';
import type { Shape } from '../parts/footprint.ts';

export type SceneSide = 'component' | 'copper';

export type Point = [number, number];

/** A body outline already posed and in mm: the footprint contract's shapes, in mm not holes. */
export type SceneShape = Shape;

export interface SceneText {
  x: number;
  y: number;
  text: string;
  /** Font size in mm. */
  size: number;
  /** Degrees; −90 reads bottom to top along a vertical body. */
  rotate: number;
}

export interface SceneHole {
  id: string;
  hole: Hole;
  x: number;
  y: number;
  label: string;
  sideLabel: string;
  /** Id of the copper run the hole lies on, if any. */
  copper?: string;
  net?: string;
  /** What goes through the hole. */
  lead?: { ref: string; pin: string } | { link: number };
  highlight: boolean;
  fault: boolean;
}

export interface SceneCopper {
  id: string;
  holes: Hole[];
  /** Centre line through the holes in copper order; one point for a lone pad. */
  points: Point[];
  /** The net it carries; undefined when no lead reaches it or when it joins two nets. */
  net?: string;
  /** Every net whose leads reach it (more than one is a short). */
  nets: string[];
  highlight: boolean;
}

export type SceneCut =
  | { id: string; index: number; style: 'drilled'; holes: [Hole]; x: number; y: number; r: number; label: string; sideLabel: string; fault: boolean }
  | { id: string; index: number; style: 'scored'; holes: [Hole, Hole]; x1: number; y1: number; x2: number; y2: number; label: string; sideLabel: string; fault: boolean };

/** A link (component side) or a copper-side wire. */
export interface SceneSegment {
  id: string;
  index: number;
  from: Hole;
  to: Hole;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  lengthMm: number;
  label: string;
  sideLabel: string;
  net?: string;
  highlight: boolean;
  /** A link that must be insulated wire (insulated.ts): drawn with a sleeve. */
  insulated?: boolean;
}

export type SceneMark =
  | { mark: 'pin1'; cx: number; cy: number; r: number }
  | { mark: 'plus'; x: number; y: number; size: number }
  | { mark: 'cathode'; x1: number; y1: number; x2: number; y2: number };

export interface ScenePin {
  pin: string;
  hole: Hole;
  x: number;
  y: number;
  net?: string;
  highlight: boolean;
  /** Pin name drawn beside the lead (three-lead parts with lettered pins). */
  tag?: SceneText;
}

export interface ScenePart {
  id: string;
  ref: string;
  value?: string;
  footprint: string;
  /** The pins did not fit the footprint: drawn as bare leads and a box. */
  broken: boolean;
  shapes: SceneShape[];
  marks: SceneMark[];
  pins: ScenePin[];
  /** Bounding box of body and leads, for hit-testing. */
  box: { x: number; y: number; w: number; h: number };
  refText: SceneText;
  valueText?: SceneText;
  highlight: boolean;
  fault: boolean;
}

export interface SceneRuler {
  id: string;
  axis: 'row' | 'col';
  /** 0-based row or column index in layout coordinates. */
  index: number;
  text: string;
  x: number;
  y: number;
  size: number;
}

export interface SceneFault {
  id: string;
  code: string;
  message: string;
  holes: Hole[];
  points: Point[];
  refs: string[];
}

/** Physical sizes used by the drawing, derived from the pitch (check-values §8). */
export interface SceneSizes {
  holeR: number;
  padR: number;
  stripWidth: number;
  leadR: number;
  textSize: number;
}

export interface Scene {
  side: SceneSide;
  title: string;
  pitchMm: number;
  board: { kind: string; cols: number; rows: number; width: number; height: number; pattern?: string };
  /** Area to show: the board plus room for row and column labels. */
  view: { x: number; y: number; width: number; height: number };
  sizes: SceneSizes;
  holes: SceneHole[];
  copper: SceneCopper[];
  cuts: SceneCut[];
  links: SceneSegment[];
  wires: SceneSegment[];
  parts: ScenePart[];
  rulers: SceneRuler[];
  faults: SceneFault[];
  highlightNet?: string;
}
