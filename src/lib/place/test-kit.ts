/** Shared helpers for the place tests: circuits by hand, designs from them. */
import { CircuitSchema, type Circuit, type CircuitInput } from '../model/circuit.ts';
import { prepareDesign, type Design } from '../netlist/design.ts';

export function circuitOf(parts: CircuitInput['parts'], nets: CircuitInput['nets'] = {}): Circuit {
  return CircuitSchema.parse({ format: 'kerfline.circuit', version: 1, title: 'test', parts, nets });
}

export function designOf(circuit: Circuit): Design {
  const d = prepareDesign(circuit);
  if (!d.ok) throw new Error(d.problems.map((p) => p.message).join('; '));
  return d.value;
}
