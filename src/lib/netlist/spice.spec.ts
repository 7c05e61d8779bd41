import { describe, expect, it } from 'vitest';
import { importSpice, type SpiceImport } from './index.ts';
import type { Problem, Result } from '../model/problem.ts';

function value(r: Result<SpiceImport>): SpiceImport {
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.line}:${p.column} ${p.code} ${p.message}`).join('\n'));
  return r.value;
}
function errors(r: Result<SpiceImport>): Problem[] {
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.problems;
}
/** net name → sorted "REF.pin" list, from the design (after packing). */
function netPins(s: SpiceImport): Record<string, string[]> {
  return Object.fromEntries(s.design.nets.map((n) => [n.name, n.pins.map((p) => `${p.ref}.${p.pin}`).sort()]));
}
const part = (s: SpiceImport, ref: string) => s.circuit.parts.find((p) => p.ref === ref);

// check-values.md §10: mini deck for a parser test [D from the SPICE3f rules]
const MINI = `common-emitter check
V1 vcc 0 DC 9
R1 vcc b 100k
R2 b 0 22K
Q1 c b e QN
RC vcc c 4.7k
RE e 0 1k
C1 in b 100n
.model QN NPN(BF=200)
.end
`;

describe('importSpice: the §10 mini deck', () => {
  const s = value(importSpice(MINI));
  it('takes line 1 as the title', () => {
    expect(s.circuit.title).toBe('common-emitter check');
    expect(s.circuit.parts.some((p) => p.ref.toLowerCase() === 'common-emitter')).toBe(false);
  });
  it('builds the expected nets (check-values §10)', () => {
    const v1 = s.report.sources.find((x) => x.name === 'V1')!;
    expect(v1.use).toBe('supply');
    const plus = `${v1.part}.${v1.pads!['+']}`;
    const minus = `${v1.part}.${v1.pads!['-']}`;
    const nets = netPins(s);
    expect(nets.vcc).toEqual([plus, 'R1.1', 'RC.1'].sort());
    expect(nets.b).toEqual(['C1.2', 'Q1.B', 'R1.2', 'R2.1'].sort());
    expect(nets.c).toEqual(['Q1.C', 'RC.2'].sort());
    expect(nets.e).toEqual(['Q1.E', 'RE.1'].sort());
    expect(nets.GND).toEqual([minus, 'R2.2', 'RE.2'].sort());
    expect(nets.in).toEqual(['C1.1']);
  });
  it('warns that net in has a single connection', () => {
    const w = s.report.notes.find((p) => p.code === 'net.single-pin' && p.nets?.includes('in'));
    expect(w).toBeDefined();
    expect(w!.line).toBe(8); // where "in" first appears
  });
  it('reads the values: R2 22 000 Ω, RC 4 700 Ω, C1 1e-7 F', () => {
    // check-values §10 [D]; shown in IEC 60062 letter form
    expect(part(s, 'R2')!.value).toBe('22k');
    expect(part(s, 'RC')!.value).toBe('4k7');
    expect(part(s, 'C1')!.value).toBe('100n');
  });
  it('marks ground and the supply net', () => {
    expect(s.circuit.nets.GND).toEqual({ role: 'ground' });
    expect(s.circuit.nets.vcc).toEqual({ role: 'power', volts: 9 });
    expect(part(s, 'Q1')!.kind).toBe('npn');
  });
  it('notes the skipped .model parameters and warns the lead order was defaulted', () => {
    expect(s.report.skipped.map((x) => x.line)).toContain(9);
    const pinout = s.report.notes.find((p) => p.code === 'part.pinout-defaulted');
    expect(pinout?.line).toBe(5);
  });
});

describe('importSpice: numbers (check-values §10 suffix table)', () => {
  // check-values.md §10 [S]: text → value; shown in letter form
  it.each([
    ['10k', 'r', '10k'],
    ['10K', 'r', '10k'],
    ['10kOhm', 'r', '10k'],
    ['10uF', 'c', '10u'],
    ['100nF', 'c', '100n'],
    ['1MEG', 'r', '1M'],
    ['1Meg', 'r', '1M'],
    ['10MOhm', 'r', '10L'], // trap: M is milli, "Ohm" ignored → 0.01 Ω (IEC 60062 letter L = mΩ)
    ['1e3', 'r', '1k'],
    ['1.0E3', 'r', '1k'],
    ['4.7k', 'r', '4k7'],
  ])('%s', (text, letter, shown) => {
    const s = value(importSpice(`t\n${letter}1 a 0 ${text}\n${letter}2 a 0 1k\n.end`));
    expect(part(s, `${letter}1`)!.value).toBe(shown);
  });
  it('reads 4k7Ω and 100µ as the writer meant, with a note', () => {
    const s = value(importSpice('t\nR1 a 0 4k7Ω\nC1 a 0 100µ\n.end'));
    expect(part(s, 'R1')!.value).toBe('4k7');
    expect(part(s, 'C1')!.value).toBe('100u');
    expect(s.report.notes.filter((p) => p.code === 'spice.letter-code')).toHaveLength(2);
  });
  it('warns about the M-is-milli and F-is-femto traps (check-values §10)', () => {
    const s = value(importSpice('t\nR1 a 0 1M\nR2 a 0 1MEG\nR3 a 0 10mohm\nC1 a 0 1F\nC2 a 0 10uF\n.end'));
    expect(part(s, 'R1')!.value).toBe('1L'); // 1 mΩ, IEC 60062 letter L
    const traps = s.report.notes.filter((p) => p.code === 'spice.suffix-trap').map((p) => p.refs![0]);
    expect(traps).toEqual(['R1', 'R3', 'C1']);
  });
  it('keeps an unreadable value as written, with a warning on its column', () => {
    const s = value(importSpice('t\nR1 a 0 {rload*2}\nR2 a 0 1k\n.end'));
    expect(part(s, 'R1')!.value).toBe('{rload*2}');
    const w = s.report.notes.find((p) => p.code === 'spice.value-unread')!;
    expect([w.line, w.column]).toEqual([2, 8]);
  });
});

describe('importSpice: lines, comments, case', () => {
  it('joins + continuations and cuts ; $ // comments', () => {
    const s = value(
      importSpice(`title
* a comment line
R1 a ; the rest is a comment
+ b 10k
C1 a b $ value on the next line
* comments may sit between
+ 47n
L1 a b 10u // inductor
R2 b 0 1k
.end`),
    );
    expect(part(s, 'R1')).toMatchObject({ value: '10k', pins: { '1': 'a', '2': 'b' } });
    expect(part(s, 'C1')!.value).toBe('47n');
    expect(part(s, 'L1')!.value).toBe('10u');
  });
  it('folds case: node names and keywords', () => {
    const s = value(importSpice('t\nr1 NodeA 0 1K\nR2 nodea GND 2k\nq1 NODEA x Gnd qq\n.MODEL QQ pnp\n.END'));
    expect(Object.keys(s.circuit.nets)).toEqual(['GND']);
    expect(part(s, 'R2')!.pins).toEqual({ '1': 'NodeA', '2': 'GND' });
    expect(part(s, 'q1')!.kind).toBe('pnp');
  });
  it('skips .control blocks and text after .end', () => {
    const s = value(importSpice('t\nR1 a 0 1k\nR2 a 0 2k\n.control\nrun\nR9 x y 1\n.endc\n.tran 1m 10m\n.end\nR7 a b 1k\n'));
    expect(s.circuit.parts.map((p) => p.ref)).toEqual(['R1', 'R2']);
    expect(s.report.skipped.map((x) => x.line)).toEqual([4, 8, 10]);
  });
  it('names line and column of a "+" with nothing to continue', () => {
    const e = errors(importSpice('t\n  + R1 a b 1k\n.end'));
    expect(e[0]).toMatchObject({ code: 'spice.orphan-continuation', line: 2, column: 3 });
  });
  it('warns when the title line looks like an element, not for an ordinary title', () => {
    expect(value(importSpice('R1 a 0 1k\nR2 a 0 1k\n.end')).report.notes.some((p) => p.code === 'spice.title-looks-like-element')).toBe(true);
    expect(value(importSpice('Mixer with soft clipping\nR2 a 0 1k\n.end')).report.notes.some((p) => p.code === 'spice.title-looks-like-element')).toBe(false);
  });
  it('fails on an empty deck with a problem, not an exception', () => {
    expect(errors(importSpice(''))[0]!.code).toBe('spice.empty');
    expect(errors(importSpice('only a title\n'))[0]!.code).toBe('spice.no-elements');
  });
});

describe('importSpice: semiconductors', () => {
  it('D: n+ is the anode; the model name tells LED and zener', () => {
    const s = value(importSpice('t\nD1 a 0 LED_RED\nD2 b a BZX79C5V1\nD3 b 0 D1N4148\n.model D1N4148 D(IS=2n)\n.end'));
    expect(part(s, 'D1')).toMatchObject({ kind: 'led', pins: { A: 'a', K: 'GND' } });
    expect(part(s, 'D2')).toMatchObject({ kind: 'zener', pins: { A: 'b', K: 'a' } });
    expect(part(s, 'D3')).toMatchObject({ kind: 'diode', value: 'D1N4148' });
  });
  it('Q: the 4th token is the substrate only when the 5th is a model (check-values §10 trap)', () => {
    const s = value(importSpice('t\nQ1 c b e QP\nQ2 c b e sub QN\nR1 c 0 1k\nR2 b 0 1k\nR3 e 0 1k\n.model QP PNP\n.model QN NPN\n.end'));
    expect(part(s, 'Q1')!.kind).toBe('pnp');
    expect(part(s, 'Q2')).toMatchObject({ kind: 'npn', value: 'QN', pins: { C: 'c', B: 'b', E: 'e' } });
    expect(s.report.notes.some((p) => p.code === 'spice.lead-dropped' && p.line === 3)).toBe(true);
    // a model named like a node: lookup, not position, decides
    const t = value(importSpice('t\nQ1 c b e e2\nR1 c b 1k\nR2 e 0 1k\n.model e2 NPN\n.end'));
    expect(part(t, 'Q1')!.value).toBe('e2');
  });
  it('Q: asks when neither candidate names a model', () => {
    const e = errors(importSpice('t\nQ1 c b e s QX\n.end'));
    expect(e[0]).toMatchObject({ code: 'spice.ask-model', line: 2, column: 10 });
  });
  it('Q: asks NPN or PNP when the model is not in the deck; an override answers', () => {
    const deck = 't\nQ1 c b 0 BC549\nR1 c b 1k\n.end';
    const e = errors(importSpice(deck));
    expect(e[0]).toMatchObject({ code: 'spice.ask-polarity', line: 2, column: 10 });
    const s = value(importSpice(deck, { overrides: { bc549: { kind: 'npn', pinout: 'CBE' } } }));
    expect(part(s, 'Q1')).toMatchObject({ kind: 'npn', pinout: 'CBE' });
    expect(s.report.notes.some((p) => p.code === 'part.pinout-defaulted')).toBe(false);
  });
  it('J and M: polarity from NJF/PJF, NMOS/PMOS and VDMOS pchan; bulk dropped', () => {
    const s = value(
      importSpice(
        't\nJ1 d g s JP\nM1 d g s s NM\nM2 d g s VP\nM3 d g s x NM\nR1 d 0 1k\nR2 g 0 1k\nR3 s 0 1k\n.model JP PJF\n.model NM NMOS(VTO=2)\n.model VP VDMOS(pchan)\n.end',
      ),
    );
    expect(part(s, 'J1')!.kind).toBe('jfet-p');
    expect(part(s, 'M1')!.kind).toBe('nmos');
    expect(part(s, 'M2')!.kind).toBe('pmos');
    expect(s.report.notes.filter((p) => p.code === 'spice.lead-dropped').map((p) => p.line)).toEqual([5]);
  });
});

describe('importSpice: subcircuits', () => {
  it('flattens calls: inner nodes X1.node, ground stays global, refs X1.R', () => {
    const s = value(
      importSpice(`t
.subckt stage in out
R1 in mid 10k
C1 mid 0 100n
R2 mid out 1k
.ends stage
X1 a b stage
X2 b c stage
R9 a 0 1k
.end`),
    );
    expect(part(s, 'X1.R1')!.pins).toEqual({ '1': 'a', '2': 'X1.mid' });
    expect(part(s, 'X1.C1')!.pins).toEqual({ '1': 'X1.mid', '2': 'GND' });
    expect(part(s, 'X2.R2')!.pins).toEqual({ '1': 'X2.mid', '2': 'c' });
    expect(netPins(s)['b']).toEqual(['X1.R2.2', 'X2.R1.1']);
  });
  it('flattens nested calls and keeps .global names global', () => {
    const s = value(
      importSpice(`t
.global vbus
.subckt inner p
R1 p vbus 1k
.ends
.subckt outer q
Xa q inner
Xb q inner
.ends
X1 n outer
R2 n 0 1k
.end`),
    );
    expect(part(s, 'X1.Xa.R1')!.pins).toEqual({ '1': 'n', '2': 'vbus' });
    expect(part(s, 'X1.Xb.R1')!.pins['2']).toBe('vbus');
  });
  it('rejects a call with the wrong node count and a self-calling subcircuit', () => {
    const e = errors(importSpice('t\n.subckt s a b\nR1 a b 1k\n.ends\nX1 n s\n.end'));
    expect(e[0]).toMatchObject({ code: 'spice.node-count', line: 5 });
    const loop = errors(importSpice('t\n.subckt s a\nX1 a s\n.ends\nX1 n s\n.end'));
    expect(loop.some((p) => p.code === 'spice.deep-calls')).toBe(true);
  });
  it('warns about a subcircuit with no parts (nothing is placed for it)', () => {
    const s = value(importSpice('t\n.subckt jack tip sleeve\n.ends\nX1 a 0 jack\nR1 a 0 1k\n.end'));
    expect(s.report.notes.some((p) => p.code === 'spice.empty-subckt' && p.line === 4)).toBe(true);
  });
  it('a note inside the body makes every call one part (pads with labels)', () => {
    const s = value(importSpice('t\n.subckt jack tip sleeve\n* kerfline: kind=pads labels="jack tip,jack sleeve"\n.ends\nXJ1 a 0 jack\nR1 a 0 1k\n.end'));
    expect(part(s, 'J1')).toMatchObject({ kind: 'pads', count: 2, pins: { '1': 'a', '2': 'GND' }, labels: { '1': 'jack tip', '2': 'jack sleeve' } });
  });
});

describe('importSpice: op-amps and unknown packages', () => {
  const OPAMP = `.subckt opamp_x inp inn vcc vee out
E1 out 0 inp inn 1e5
.ends
`;
  it('a 5-port subcircuit named like an op-amp becomes a section; ports named by role', () => {
    const s = value(importSpice(`t\n${OPAMP}VP vp 0 12\nVN vn 0 -12\nXU3A 0 fb vp vn fb opamp_x\nR1 fb 0 10k\n.end`));
    expect(part(s, 'U3A')).toMatchObject({ kind: 'opamp', pins: { '+': 'GND', '-': 'fb', out: 'fb', 'V+': 'vp', 'V-': 'vn' } });
    // one section → a dual package with the spare tied off
    expect(s.report.packing).toEqual({ U3A: { part: 'U1', pins: { '+': '3', '-': '2', out: '1', 'V+': '8', 'V-': '4' } } });
    expect(s.report.spares).toEqual({ U1: { '5': 'GND', '6': 'U1_SPARE_B', '7': 'U1_SPARE_B' } });
  });
  it('ports that do not say their role: the usual order + − V+ V− out, with a warning', () => {
    const s = value(importSpice('t\n.subckt myopamp a b c d e\n.ends\nXU1 p n vp vn o myopamp\nR1 p n 1k\nR2 vp vn 1k\nR3 o 0 1k\n.end'));
    expect(part(s, 'U1')!.pins).toEqual({ '+': 'p', '-': 'n', 'V+': 'vp', 'V-': 'vn', out: 'o' });
    expect(s.report.notes.some((p) => p.code === 'spice.opamp-order-assumed')).toBe(true);
  });
  it('an undefined subcircuit is a question with line and column, not a guess', () => {
    const e = errors(importSpice('t\nXU1 in fb vp vn out AMP9000\nR1 in 0 1k\n.end'));
    expect(e).toHaveLength(1);
    expect(e[0]).toMatchObject({ code: 'spice.ask-package', line: 2, column: 21 });
    expect(e[0]!.message).toMatch(/which package and pin map/);
  });
  it('an override answers with package and pin map', () => {
    const deck = 't\nXU1 in fb vp vn out AMP9000\nR1 in 0 1k\nR2 fb out 1k\nV1 vp 0 5\nV2 vn 0 -5\n.end';
    const s = value(importSpice(deck, { overrides: { AMP9000: { kind: 'ic', package: 'DIP-8', pins: ['3', '2', '8', '4', '1'] } } }));
    expect(part(s, 'U1')).toMatchObject({ kind: 'ic', package: 'DIP-8', pins: { '3': 'in', '2': 'fb', '8': 'vp', '4': 'vn', '1': 'out' } });
    const bad = errors(importSpice(deck, { overrides: { XU1: { kind: 'ic', package: 'DIP-8', pins: ['3', '2', '9', '4', '1'] } } }));
    expect(bad[0]!.code).toBe('spice.bad-pin-map');
  });
  it('the same answer works as a note in the deck; element notes beat model notes', () => {
    const s = value(
      importSpice(
        't\n* kerfline: AMP9000 kind=ic package=DIP-8 pins=3,2,8,4,1\n* kerfline: XU2 kind=opamp\nXU1 in fb vp vn out AMP9000\nXU2 in fb vp vn out AMP9000\nR1 in 0 1k\n.end',
      ),
    );
    expect(part(s, 'U1')!.kind).toBe('ic');
    expect(part(s, 'U2')!.kind).toBe('opamp');
  });
  it('rejects bad notes and bad options with their place', () => {
    const e = errors(importSpice('t\n* kerfline: R1 kind=resistr\nR1 a 0 1k\n.end'));
    expect(e[0]).toMatchObject({ code: 'spice.bad-note', line: 2, column: 21 });
    const o = importSpice('t\nR1 a 0 1k\n.end', { overrides: { R1: { kind: 'blob' } } } as never);
    expect(o.ok).toBe(false);
  });
});

describe('importSpice: sources', () => {
  it('DC sources to ground become one power entry: falling volts, 0 V among them', () => {
    const s = value(importSpice('t\nVNEG vn 0 DC -12\nVPOS vp 0 12V\nV5 0 v5n 5\nR1 vp vn 1k\nR2 v5n 0 1k\n.end'));
    const entry = s.circuit.parts.find((p) => p.value === 'power entry')!;
    expect(entry.pins).toEqual({ '1': 'vp', '2': 'GND', '3': 'v5n', '4': 'vn' });
    expect(s.circuit.nets).toMatchObject({ vp: { role: 'power', volts: 12 }, vn: { role: 'power', volts: -12 }, v5n: { role: 'power', volts: -5 } });
  });
  it('a 0 V source is a probe that joins its nodes; AC and transient sources are signal pads', () => {
    const s = value(importSpice('t\nVin in 0 AC 1 SIN(0 1 1k)\nVsense a b 0\nIb b 0 DC 1m\nR1 in a 1k\nR2 b 0 1k\n.end'));
    expect(netPins(s)['a']).toEqual(expect.arrayContaining(['R1.2', 'R2.1']));
    const vin = s.report.sources.find((x) => x.name === 'Vin')!;
    expect(vin.use).toBe('signal');
    expect(s.circuit.nets.in).toEqual({ role: 'input' });
    expect(s.report.sources.find((x) => x.name === 'Vsense')!.use).toBe('probe');
    expect(s.report.sources.find((x) => x.name === 'Ib')!.use).toBe('signal');
  });
  it('two supplies fighting over one net is an error', () => {
    const e = errors(importSpice('t\nV1 a 0 5\nV2 a 0 9\nR1 a 0 1k\n.end'));
    expect(e[0]).toMatchObject({ code: 'spice.supply-conflict', line: 3 });
  });
});

describe('importSpice: problems name their place', () => {
  it('a bad reference from the deck points at its line', () => {
    const e = errors(importSpice('t\nR$1 a 0 1k\nR2 a 0 1k\n.end'));
    expect(e[0]).toMatchObject({ line: 2, column: 1 });
  });
  it('a part the kind rules refuse points at its card (ic with a 3-letter pinout)', () => {
    const e = errors(importSpice('t\nR1 a 0 1k\n* kerfline: R1 pinout=EBC\n.end'));
    expect(e[0]).toMatchObject({ code: 'part.pinout-not-used', line: 2 });
  });
  it('simulation-only elements are left out with a warning naming them', () => {
    const s = value(importSpice('t\nE1 a 0 b 0 10\nR1 a b 1k\nR2 b 0 1k\n.end'));
    expect(s.report.notes.find((p) => p.code === 'spice.left-out')).toMatchObject({ line: 2, refs: ['E1'] });
  });
  it('a deck whose every element is left out is a problem, not an empty board', () => {
    const r = importSpice('t\nE1 a 0 b 0 10\nK1 L1 L2 0.9\n.end');
    expect(errors(r)[0]).toMatchObject({ code: 'spice.nothing-to-place', line: 1 });
    expect(r.warnings.filter((p) => p.code === 'spice.left-out')).toHaveLength(2);
  });
});
