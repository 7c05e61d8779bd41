/** Public shapes of the verifier's answers (see index.ts for the functions). */
import type { Hole, Problem } from '../model/problem.ts';
import type { Layout } from '../model/layout.ts';

/** The verdict on one layout: `clean` when there are no faults (warnings allowed). */
export interface VerifyReport {
  clean: boolean;
  faults: Problem[];
  warnings: Problem[];
}

/** A pin as the layout names it: a part reference and one of its pin names. */
export interface PinRef {
  ref: string;
  pin: string;
}

/** Two holes to touch with a continuity tester, labelled from both sides of the board. */
export interface ProbePair {
  a: Hole;
  b: Hole;
  /** holeLabelBoth of a and b: "C7 (copper C18)". */
  labels: [string, string];
  /** The net proven whole (beep), or the two nets proven apart (silent). */
  nets: string[];
  /** What the pair proves, in bench words. */
  note: string;
}

export interface ProbeChecklist {
  /** Pairs that must beep: per net, (conductor pieces − 1) pairs. */
  beep: ProbePair[];
  /** Pairs that must stay silent: one per cut between pieces of different nets. */
  silent: ProbePair[];
}

/** A verifier bound to one circuit, keeping its work between calls. */
export interface Verifier {
  /** Full verification of a layout (same answer as verifyLayout). */
  check(layout: Layout): VerifyReport;
  /**
   * Re-verify after the parts named in `changedRefs` moved or changed. Anything else that
   * changed (board, cuts, links, wires, packing, parts added or removed) is detected and
   * answered by a full check; parts left out of `changedRefs` but moved anyway are found
   * by a cheap comparison, so the answer always equals a full check.
   */
  recheck(layout: Layout, changedRefs: string[]): VerifyReport;
}

/** A named group of pins. */
export interface NamedNet {
  name: string;
  pins: PinRef[];
}

/** One connectivity class of placed pins, as read off the board. */
export interface ExtractedNet extends NamedNet {
  /** True when the class is exactly one circuit net (then `name` is that net). */
  matched: boolean;
  /** The holes of its pins. */
  holes: Hole[];
}

export interface NetlistDiff {
  /** True when nothing below is listed. */
  same: boolean;
  /** Expected nets whose pins lie in more than one found net. */
  split: { net: string; groups: { name: string; pins: PinRef[] }[] }[];
  /** Found nets holding pins of more than one expected net. */
  merged: { name: string; nets: string[]; pins: PinRef[] }[];
  /** Expected pins found in no net at all (not placed). */
  missing: { net: string; pins: PinRef[] }[];
  /** Pins without an expected net that share copper with other pins. */
  extra: { name: string; pins: PinRef[] }[];
}

export interface ExtractedNetlist {
  nets: ExtractedNet[];
  /** Present when a circuit was given: how the board differs from it. */
  diff?: NetlistDiff;
}
