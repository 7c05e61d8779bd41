/**
 * `verifyLayout(circuit, layout): VerifyReport` — the tool's source of truth. Reads only the
 * two exchange documents (plus the footprint library and the board's copper patterns) and
 * answers every fault at once, in a fixed order: `clean` is true when `faults` is empty.
 * Fault codes: verify.open, verify.short, verify.missing-part, verify.extra-part,
 * verify.duplicate-part, verify.missing-pin, verify.unknown-pin, verify.duplicate-pin,
 * verify.off-board, verify.shared-hole, verify.lead-in-cut, verify.bad-cut,
 * verify.diagonal-wire, verify.geometry, verify.overlap, verify.packing, verify.circuit.
 * Warnings: verify.polarity (a note), verify.pinout-defaulted, verify.unconnected-pin,
 * verify.single-pin-net, verify.link-over-body, verify.link-dangling.
 * Shares no code with the router or the planner.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import type { VerifyReport } from './types.ts';
import { checkOnce } from './verifier.ts';

export function verifyLayout(circuit: Circuit, layout: Layout): VerifyReport {
  return checkOnce(circuit, layout);
}
