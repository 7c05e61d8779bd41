import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Design } from './design.ts';
import { importSpice, parseCircuitText } from './index.ts';

const DIR = join(__dirname, '..', '..', '..', 'layouts');
const read = (f: string) => readFileSync(join(DIR, f), 'utf8');
const files = readdirSync(DIR);

function json(f: string) {
  const r = parseCircuitText(read(f));
  if (!r.ok) throw new Error(`${f}: ${r.problems.map((p) => `${p.line}:${p.column} ${p.message}`).join('; ')}`);
  return r;
}

/** Connectivity as a comparable value: net → sorted pins, plus part kinds and footprints. */
function shape(d: Design) {
  return {
    nets: Object.fromEntries(d.nets.map((n) => [n.name, n.pins.map((p) => `${p.ref}.${p.pin}`).sort()])),
    parts: Object.fromEntries(d.parts.map((p) => [p.ref, `${p.kind} ${p.footprint}`])),
  };
}

describe('demo circuits', () => {
  it.each(files.filter((f) => f.endsWith('.circuit.json')))('%s parses with no error', (f) => {
    const r = json(f);
    expect(r.warnings.filter((w) => w.severity === 'error')).toEqual([]);
    expect(r.value.design.parts.length).toBeGreaterThan(0);
  });

  it.each(files.filter((f) => f.endsWith('.cir')))('%s imports with no error', (f) => {
    const r = importSpice(read(f));
    if (!r.ok) throw new Error(r.problems.map((p) => `${p.line}:${p.column} ${p.message}`).join('; '));
    expect(r.value.report.parts.length).toBeGreaterThan(0);
  });

  it('twin-lfo.cir is the same circuit as twin-lfo.circuit.json', () => {
    const a = json('twin-lfo.circuit.json').value.design;
    const b = importSpice(read('twin-lfo.cir'));
    if (!b.ok) throw new Error('import failed');
    expect(shape(b.value.design)).toEqual(shape(a));
    expect(b.value.circuit.nets.VPOS).toEqual({ role: 'power', volts: 12 });
    expect(b.value.circuit.nets.VNEG).toEqual({ role: 'power', volts: -12 });
  });

  it('twin-lfo: about 20 parts around one DIP-14 ic, with labelled pads', () => {
    const d = json('twin-lfo.circuit.json').value.design;
    expect(d.parts.length).toBeGreaterThanOrEqual(18);
    expect(d.parts.filter((p) => p.package === 'DIP-14')).toHaveLength(1);
    expect(d.parts.filter((p) => p.kind === 'led')).toHaveLength(2);
    for (const p of d.parts.filter((x) => x.kind === 'pads')) expect(Object.keys(p.labels ?? {})).toEqual(p.pinNames);
  });

  it('four-mixer: about 40 parts; five sections pack into a quad and a dual with a tied-off spare', () => {
    const r = json('four-mixer.circuit.json');
    const c = r.value.circuit;
    const d = r.value.design;
    expect(c.parts.length).toBeGreaterThanOrEqual(38);
    expect(c.parts.filter((p) => p.kind === 'opamp')).toHaveLength(5);
    expect(d.parts.filter((p) => p.kind === 'ic').map((p) => p.package).sort()).toEqual(['DIP-14', 'DIP-8']);
    const spare = Object.entries(d.spares ?? {});
    expect(spare).toHaveLength(1);
    expect(Object.values(spare[0]![1])).toContain('GND');
    expect(c.parts.filter((p) => p.kind === 'capacitor' && p.polarized)).toHaveLength(2);
    for (const p of c.parts.filter((x) => x.kind === 'pads')) expect(Object.keys(p.labels ?? {}).length).toBe(p.count);
  });
});
