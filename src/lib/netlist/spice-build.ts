/**
 * The circuit document built from a walked deck.
 *
 * `assembleCircuit(walk, parts, decided, title): { input: CircuitInput; keyOf }`
 *
 * Node keys become net names (after probe joins); ground is net GND with role ground,
 * supply nets get role power and volts, the + nets of signal sources role input. `keyOf`
 * maps each net name back to its node key, so problems can point at where it first
 * appears. Warns when nothing touches ground (SPICE needs node 0).
 */
import type { CircuitInput, NetInfo } from '../model/circuit.ts';
import { GROUND_KEY, GROUND_NAME } from './spice-nodes.ts';
import type { Decided } from './spice-sources.ts';
import type { PendingPart, Walk } from './spice-types.ts';

export function assembleCircuit(w: Walk, parts: PendingPart[], decided: Decided, title: string): { input: CircuitInput; keyOf: Map<string, string> } {
  // Net names after probe joins; remember which key each name came from.
  const keyOf = new Map<string, string>();
  const netName = (key: string) => {
    const n = w.nodes.name(key);
    keyOf.set(n, w.nodes.find(key));
    return n;
  };
  const circuitParts: CircuitInput['parts'] = parts.map((p) => {
    const out: CircuitInput['parts'][number] = { ref: p.ref, kind: p.kind, pins: Object.fromEntries(Object.entries(p.pins).map(([pin, key]) => [pin, netName(key)])) };
    if (p.value !== undefined) out.value = p.value;
    if (p.footprint) out.footprint = p.footprint;
    if (p.package) out.package = p.package;
    if (p.pinout) out.pinout = p.pinout;
    if (p.polarized) out.polarized = true;
    if (p.count !== undefined) out.count = p.count;
    if (p.labels) out.labels = p.labels;
    return out;
  });
  const nets: Record<string, NetInfo> = {};
  const used = new Set(circuitParts.flatMap((p) => Object.values(p.pins)));
  if (used.has(GROUND_NAME) && keyOf.get(GROUND_NAME) === GROUND_KEY) nets[GROUND_NAME] = { role: 'ground' };
  for (const [key, volts] of decided.supplies) nets[netName(key)] = { role: 'power', volts };
  for (const key of decided.inputs) if (!(netName(key) in nets)) nets[netName(key)] = { role: 'input' };
  if (!used.has(GROUND_NAME) && parts.length)
    w.warnings.push({ code: 'spice.no-ground', severity: 'warning', path: [], message: 'no element touches the ground node 0', hint: 'SPICE needs node 0 as the reference; connect the circuit ground to 0' });

  const input: CircuitInput = { format: 'kerfline.circuit', version: 1, title: (title || 'Untitled netlist').slice(0, 200), parts: circuitParts, nets };
  return { input, keyOf };
}
