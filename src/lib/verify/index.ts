/**
 * Verify: checks a layout against its circuit from the two exchange documents alone.
 *
 * - `verifyLayout(circuit, layout)` → `{ clean, faults, warnings }` (verify.ts lists codes).
 * - `createVerifier(circuit)` → `{ check(layout), recheck(layout, changedRefs) }` for live
 *   editing: recheck redoes only what the changed parts touch, with the same answer.
 * - `probeChecklist(circuit, layout)` → holes to beep (per net, pieces − 1) and holes that
 *   must stay silent (one pair per cut between different nets).
 * - `extractNetlist(layout, circuit?)`, `expectedNetlist(circuit, layout?)`,
 *   `diffNetlists(expected, found)` → the netlist read off the copper and how it differs.
 */
export { verifyLayout } from './verify.ts';
export { createVerifier } from './verifier.ts';
export { probeChecklist } from './probe.ts';
export { extractNetlist, expectedNetlist, diffNetlists } from './extract.ts';
export type {
  VerifyReport,
  Verifier,
  PinRef,
  ProbePair,
  ProbeChecklist,
  NamedNet,
  ExtractedNet,
  ExtractedNetlist,
  NetlistDiff,
} from './types.ts';
