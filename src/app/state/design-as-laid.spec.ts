import { describe, expect, it } from 'vitest';
import { CircuitSchema } from '../../lib/model/index.ts';
import { prepareDesign } from '../../lib/netlist/index.ts';
import { designAsLaid } from './design-as-laid.ts';

// Two op-amp sections packed into one dual package (exchange.md: dual DIP-8 pinout).
const circuit = CircuitSchema.parse({
  format: 'kerfline.circuit',
  version: 1,
  parts: [
    { ref: 'UA', kind: 'opamp', pins: { '+': 'IN1', '-': 'FB1', out: 'OUT1', 'V+': 'VP', 'V-': 'GND' } },
    { ref: 'UB', kind: 'opamp', pins: { '+': 'IN2', '-': 'FB2', out: 'OUT2', 'V+': 'VP', 'V-': 'GND' } },
  ],
  nets: { GND: { role: 'ground' } },
});
const prepared = prepareDesign(circuit);
if (!prepared.ok) throw new Error('fixture circuit does not prepare');
const design = prepared.value;
const pkg = design.parts[0]!.ref;

describe('the design as a layout packs it', () => {
  it('is the prepared design when the layout packs the same way', () => {
    expect(designAsLaid(design, circuit, design.packing, design.spares)).toBe(design);
    expect(designAsLaid(design, circuit, undefined)).toBe(design);
  });

  it('follows a gate swap recorded in the layout', () => {
    const swapped = {
      UA: { part: pkg, pins: { '+': '5', '-': '6', out: '7', 'V+': '8', 'V-': '4' } },
      UB: { part: pkg, pins: { '+': '3', '-': '2', out: '1', 'V+': '8', 'V-': '4' } },
    };
    const d = designAsLaid(design, circuit, swapped);
    const nets = d.parts.find((p) => p.ref === pkg)!.nets;
    expect(nets).toMatchObject({ '1': 'OUT2', '2': 'FB2', '3': 'IN2', '5': 'IN1', '6': 'FB1', '7': 'OUT1', '8': 'VP', '4': 'GND' });
    expect(d.nets.find((n) => n.name === 'OUT1')!.pins).toEqual([{ ref: pkg, pin: '7' }]);
    expect(d.packing).toBe(swapped);
  });

  it('keeps the prepared design when the layout names an unknown package', () => {
    expect(designAsLaid(design, circuit, { UA: { part: 'U99', pins: { '+': '3' } } })).toBe(design);
  });
});
