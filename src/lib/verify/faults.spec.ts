/**
 * One hand-built fixture per fault and warning kind. Each starts from a clean job and
 * breaks one thing, then checks the code, the subjects and the bench-term details.
 */
import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import { circuit, codes, divider, layout, warningCodes, type XY } from './spec-kit.ts';
import { verifyLayout } from './verify.ts';

const edit = (l: Layout, f: (l: Layout) => void): Layout => {
  const copy = structuredClone(l);
  f(copy);
  return copy;
};
const pinsOf = (l: Layout, ref: string) => l.parts.find((p) => p.ref === ref)!.pins;

describe('the clean starting point', () => {
  it('verifies clean, with a polarity note for the electrolytic', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, l);
    expect(r.faults).toEqual([]);
    expect(r.clean).toBe(true);
    const note = r.warnings.find((w) => w.code === 'verify.polarity');
    expect(note?.refs).toEqual(['C1']);
    expect(note?.holes).toEqual([[6, 1]]);
    expect(note?.message).toContain('B7 (copper B4)');
  });
});

describe('connectivity faults', () => {
  it('open: lists the islands and the nearest pair of free holes one link would join', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.cuts.push({ between: [[1, 1], [2, 1]] })));
    expect(codes(r)).toEqual(['verify.open']);
    const f = r.faults[0]!;
    expect(f.nets).toEqual(['MID']);
    const islands = (f.data as { islands: { pins: { ref: string; pin: string }[] }[] }).islands;
    expect(islands.map((i) => i.pins.map((p) => `${p.ref}.${p.pin}`))).toEqual([['J1.2'], ['R1.2', 'R2.1', 'C1.+']]);
    // free holes: (1,1) on the left island, (3,1) the first free one right of the cut
    expect(f.data?.fix).toEqual({ from: [1, 1], to: [3, 1] });
    expect(f.hint).toContain('B2 (copper B9)');
    expect(f.hint).toContain('B4 (copper B7)');
  });

  it('short: traces the copper, wire and copper that join two nets and says where to cut', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.wires.push({ from: [8, 0], to: [8, 1] })));
    expect(codes(r)).toEqual(['verify.short']);
    const f = r.faults[0]!;
    expect(f.nets).toEqual(['MID', 'VCC']);
    const path = (f.data as { paths: { from: string; to: string; holes: XY[] }[] }).paths[0]!;
    expect([path.from, path.to]).toEqual(['MID', 'VCC']);
    // from C1 + (nearest MID lead) along row B, over the solder bridge, along row A to R1 pin 1
    expect(path.holes[0]).toEqual([6, 1]);
    expect(path.holes.at(-1)).toEqual([2, 0]);
    expect(path.holes).toContainEqual([8, 1]);
    expect(path.holes).toContainEqual([8, 0]);
    expect(f.message).toContain('copper-side wire 1');
    expect(f.hint).toBe('cut the copper between B7 (copper B4) and B8 (copper B3) (or anywhere on that run between the two leads), then re-check');
  });

  it('short: an unconnected transistor lead may not touch another pin’s copper', () => {
    const { circuit: base, layout: l } = divider();
    const c = circuit(
      [...base.parts, { ref: 'Q1', kind: 'npn', pinout: 'EBC', pins: { C: 'VCC', B: 'MID' } }],
      base.nets,
    );
    // flat face turned round: C on row A, B on row B, E (unconnected) on the GND strip
    const placed = edit(l, (d) => d.parts.push({ ref: 'Q1', footprint: 'to92-EBC', pins: [{ pin: 'E', at: [8, 2] }, { pin: 'B', at: [8, 1] }, { pin: 'C', at: [8, 0] }] }));
    const r = verifyLayout(c, placed);
    expect(codes(r)).toEqual(['verify.short']);
    expect(r.faults[0]!.nets).toEqual(['GND']);
    expect(r.faults[0]!.message).toContain('Q1 pin E (unconnected)');
    expect(warningCodes(r)).toContain('verify.unconnected-pin');
  });

  it('bad cut: a cut between holes that are not neighbours along a strip cuts nothing', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.cuts.push({ between: [[3, 0], [3, 1]] }, { between: [[3, 2], [5, 2]] })));
    expect(codes(r)).toEqual(['verify.bad-cut', 'verify.bad-cut']);
    expect(r.faults.map((f) => f.path)).toEqual([
      ['cuts', 0, 'between'],
      ['cuts', 1, 'between'],
    ]);
  });

  it('diagonal wire: a fault, and it joins nothing', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.wires.push({ from: [8, 0], to: [9, 1] })));
    expect(codes(r)).toEqual(['verify.diagonal-wire']);
  });
});

describe('placement faults', () => {
  it('missing part', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => (d.parts = d.parts.filter((p) => p.ref !== 'C1'))));
    expect(codes(r)).toEqual(['verify.missing-part']);
    expect(r.faults[0]!.refs).toEqual(['C1']);
    expect(r.faults[0]!.path).toEqual(['parts', 2]);
  });

  it('extra part and a second copy of a part', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(
      c,
      edit(l, (d) => {
        d.parts.push({ ref: 'R9', footprint: 'upright', pins: [{ pin: '1', at: [8, 0] }, { pin: '2', at: [8, 1] }] });
        d.parts.push({ ref: 'R1', footprint: 'upright', pins: [{ pin: '1', at: [9, 2] }, { pin: '2', at: [9, 3] }] });
      }),
    );
    expect(codes(r).sort()).toEqual(['verify.duplicate-part', 'verify.extra-part']);
  });

  it('missing, unknown and repeated pins', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(
      c,
      edit(l, (d) => {
        pinsOf(d, 'R1').pop();
        pinsOf(d, 'R2')[1]!.pin = '3';
        pinsOf(d, 'J1').push({ pin: '1', at: [9, 3] });
      }),
    );
    const got = codes(r);
    expect(got).toContain('verify.missing-pin');
    expect(got).toContain('verify.unknown-pin');
    expect(got).toContain('verify.duplicate-pin');
    const unknown = r.faults.find((f) => f.code === 'verify.unknown-pin')!;
    expect(unknown.path).toEqual(['parts', 2, 'pins', 1, 'pin']);
  });

  it('off the board: pins, cuts, links and wires', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(
      c,
      edit(l, (d) => {
        d.parts.find((p) => p.ref === 'R1')!.pins = [
          { pin: '1', at: [10, 0] },
          { pin: '2', at: [10, 1] },
        ];
        d.cuts.push({ at: [3, 9] });
        d.links.push({ from: [9, 3], to: [9, 12] });
        d.wires.push({ from: [12, 3], to: [9, 3] });
      }),
    );
    const off = r.faults.filter((f) => f.code === 'verify.off-board').map((f) => f.path);
    expect(off).toEqual([
      ['cuts', 0, 'at'],
      ['links', 0, 'to'],
      ['parts', 1, 'pins', 0, 'at'],
      ['parts', 1, 'pins', 1, 'at'],
      ['wires', 0, 'from'],
    ]);
  });

  it('two leads in one hole: a pin and a link end count alike', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.links.push({ from: [2, 0], to: [2, 3] })));
    const f = r.faults.find((x) => x.code === 'verify.shared-hole')!;
    expect(f.holes).toEqual([[2, 0]]);
    expect(f.message).toContain('R1 pin 1');
    expect(f.message).toContain('link 1 (start)');
  });

  it('lead in a drilled-out hole', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => d.cuts.push({ at: [2, 0] })));
    expect(codes(r)).toContain('verify.lead-in-cut');
    expect(r.faults.find((f) => f.code === 'verify.lead-in-cut')!.refs).toEqual(['R1']);
  });
});

describe('footprint geometry', () => {
  const ic = circuit([{ ref: 'U1', kind: 'ic', package: 'DIP-8', pins: { '4': 'GND', '8': 'VCC' } }]);
  const dipAt = (place: (k: number) => XY) => layout({ kind: 'pads', cols: 12, rows: 8 }, [{ ref: 'U1', footprint: 'dip-8', pins: Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8].map((k) => [String(k), place(k)])) }]);
  const ccw = (k: number): XY => (k <= 4 ? [2, k] : [5, 9 - k]);

  it('a DIP numbered counter-clockwise with rows 3 holes apart fits, in any quarter turn', () => {
    expect(codes(verifyLayout(ic, dipAt(ccw)))).toEqual([]);
    const turned = (k: number): XY => [8 - ccw(k)[1], ccw(k)[0]];
    expect(codes(verifyLayout(ic, dipAt(turned)))).toEqual([]);
  });

  it('a DIP drawn as seen from the copper side is a mirror image', () => {
    const r = verifyLayout(ic, dipAt((k) => [7 - ccw(k)[0], ccw(k)[1]]));
    expect(codes(r)).toEqual(['verify.geometry']);
    expect(r.faults[0]!.message).toContain('mirror image');
  });

  it('a DIP with its rows 2 holes apart does not keep its 300-mil row spacing', () => {
    // check-values.md §3: row spacing 7.62 mm (0.300 in BSC), Freescale case 738 / onsemi 646AA [C]
    const r = verifyLayout(ic, dipAt((k) => (k <= 4 ? [2, k] : [4, 9 - k])));
    expect(codes(r)).toEqual(['verify.geometry']);
    expect(r.faults[0]!.message).toContain('7.62 mm');
  });

  it('TO-92: leads adjacent in the stated order, from the circuit or the footprint', () => {
    const q = circuit([{ ref: 'Q1', kind: 'npn', pinout: 'CBE', pins: { C: 'A', B: 'B', E: 'C' } }]);
    const place = (fp: string, at: Record<string, XY>) => verifyLayout(q, layout({ kind: 'pads', cols: 8, rows: 4 }, [{ ref: 'Q1', footprint: fp, pins: at }]));
    expect(codes(place('to92-CBE', { C: [1, 1], B: [2, 1], E: [3, 1] }))).toEqual([]);
    expect(codes(place('to92-CBE', { C: [3, 1], B: [2, 1], E: [1, 1] }))).toEqual([]); // turned round
    expect(codes(place('to92-CBE', { B: [1, 1], C: [2, 1], E: [3, 1] }))).toEqual(['verify.geometry']);
    expect(codes(place('to92-CBE', { C: [1, 1], B: [3, 1], E: [4, 1] }))).toEqual(['verify.geometry']);
    const wrongOrder = place('to92-EBC', { E: [1, 1], B: [2, 1], C: [3, 1] });
    expect(codes(wrongOrder)).toEqual(['verify.geometry']);
    expect(wrongOrder.faults[0]!.message).toContain('lead order CBE');
  });

  it('two-lead spans: within the footprint’s range and the circuit’s limit', () => {
    const r = circuit([{ ref: 'R1', kind: 'resistor', span: { min: 3, max: 4 }, pins: { '1': 'A', '2': 'B' } }]);
    const at = (x2: number) => verifyLayout(r, layout({ kind: 'pads', cols: 16, rows: 2 }, [{ ref: 'R1', footprint: 'axial-small', pins: { '1': [0, 0], '2': [x2, 0] } }]));
    expect(codes(at(4))).toEqual([]);
    const tooWide = at(6);
    expect(codes(tooWide)).toEqual(['verify.geometry']);
    expect(tooWide.faults[0]!.message).toContain('the circuit allows 3–4');
    const beyond = at(12);
    expect(beyond.faults[0]!.message).toContain('axial-small body takes 3–10');
  });

  it('a footprint the library does not know', () => {
    const { circuit: c, layout: l } = divider();
    const r = verifyLayout(c, edit(l, (d) => (d.parts.find((p) => p.ref === 'C1')!.footprint = 'ecap-9.99')));
    expect(codes(r)).toEqual(['verify.geometry']);
    expect(r.faults[0]!.path).toEqual(['parts', 3, 'footprint']);
  });
});

describe('bodies', () => {
  const two = circuit([
    { ref: 'U1', kind: 'ic', package: 'DIP-8', pins: {} },
    { ref: 'U2', kind: 'ic', package: 'DIP-8', pins: {} },
  ]);
  const dip = (ref: string, x: number, y: number) => ({ ref, footprint: 'dip-8', pins: Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8].map((k) => [String(k), (k <= 4 ? [x, y + k - 1] : [x + 3, y + 8 - k]) as XY])) });

  it('two bodies sharing holes overlap', () => {
    const r = verifyLayout(two, layout({ kind: 'pads', cols: 12, rows: 12 }, [dip('U1', 0, 0), dip('U2', 1, 2)]));
    expect(codes(r)).toEqual(['verify.overlap']);
    expect(r.faults[0]!.refs).toEqual(['U1', 'U2']);
  });

  it('a link end under a body is a fault; a link passing over one is a warning', () => {
    const l = layout({ kind: 'pads', cols: 12, rows: 12 }, [dip('U1', 0, 0), dip('U2', 6, 0)], {
      links: [
        { from: [1, 1], to: [1, 6] }, // starts between U1's pin rows, then runs out under it
        { from: [5, 5], to: [11, 5] }, // clear of both
        { from: [5, 1], to: [11, 1] }, // passes over U2
      ],
    });
    const r = verifyLayout(two, l);
    expect(codes(r)).toEqual(['verify.overlap']);
    expect(r.faults[0]!.path).toEqual(['links', 0, 'from']);
    expect(r.warnings.filter((w) => w.code === 'verify.link-over-body').map((w) => [w.path, w.refs])).toEqual([
      [['links', 0], ['U1']],
      [['links', 2], ['U2']],
    ]);
  });
});

describe('op-amp sections through the packing map', () => {
  const sections = circuit(
    [
      { ref: 'A1', kind: 'opamp', pins: { '+': 'IN', '-': 'FB', out: 'FB', 'V+': 'VCC', 'V-': 'GND' } },
      { ref: 'A2', kind: 'opamp', pins: { '+': 'FB', '-': 'OUT', out: 'OUT', 'V+': 'VCC', 'V-': 'GND' } },
    ],
    { GND: { role: 'ground' } },
  );
  // exchange.md: dual DIP-8 — 1 out A, 2 −A, 3 +A, 4 V−, 5 +B, 6 −B, 7 out B, 8 V+
  const packing = {
    A1: { part: 'U1', pins: { '+': '3', '-': '2', out: '1', 'V+': '8', 'V-': '4' } },
    A2: { part: 'U1', pins: { '+': '5', '-': '6', out: '7', 'V+': '8', 'V-': '4' } },
  };
  const u1 = { ref: 'U1', footprint: 'dip-8', pins: Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8].map((k) => [String(k), (k <= 4 ? [0, k - 1] : [3, 8 - k]) as XY])) };
  const board = { kind: 'pads' as const, cols: 6, rows: 5 };

  it('reads the nets of package pins through the packing and checks them', () => {
    // copper-side wires: out A–−A (pins 1–2) and out B–−B (pins 7–6); +B (pin 5, net FB) left alone
    const l = layout(board, [u1], { packing, wires: [{ from: [0, 0], to: [0, 1] }, { from: [3, 1], to: [3, 2] }] });
    const r = verifyLayout(sections, l);
    expect(codes(r)).toEqual(['verify.open']);
    expect(r.faults[0]!.nets).toEqual(['FB']);
    expect(r.faults[0]!.pins).toEqual([
      { ref: 'U1', pin: '1' },
      { ref: 'U1', pin: '2' },
      { ref: 'U1', pin: '5' },
    ]);
  });

  it('a section left out of the packing is missing; a non-standard section is a packing fault', () => {
    const r = verifyLayout(sections, layout(board, [u1], { packing: { A1: packing.A1 } }));
    expect(codes(r)).toContain('verify.missing-part');
    const bad = verifyLayout(sections, layout(board, [u1], { packing: { A1: packing.A1, A2: { part: 'U1', pins: { '+': '6', '-': '5', out: '7', 'V+': '8', 'V-': '4' } } } }));
    expect(codes(bad)).toContain('verify.packing');
  });

  it('a section placed as a part of its own is extra, and the message says where it belongs', () => {
    const l = layout(board, [u1, { ref: 'A2', footprint: 'dip-8', pins: {} }], { packing });
    const f = verifyLayout(sections, l).faults.find((x) => x.code === 'verify.extra-part')!;
    expect(f.refs).toEqual(['A2']);
    expect(f.message).toContain('op-amp section');
  });

  it('spares give unused package pins their nets', () => {
    const one = circuit([{ ref: 'A1', kind: 'opamp', pins: { '+': 'IN', '-': 'OUT', out: 'OUT', 'V+': 'VCC', 'V-': 'GND' } }]);
    const l = layout(board, [u1], {
      packing: { A1: packing.A1 },
      spares: { U1: { '5': 'GND', '6': 'U1_SPARE', '7': 'U1_SPARE' } },
      wires: [
        { from: [0, 0], to: [0, 1] },
        { from: [3, 1], to: [3, 2] },
        { from: [0, 3], to: [1, 3] },
        { from: [1, 3], to: [1, 4] },
        { from: [1, 4], to: [3, 4] },
        { from: [3, 4], to: [3, 3] },
      ],
    });
    // V− (pin 4 at (0,3)) reaches +B (pin 5 at (3,3)) round the bottom: GND joined; spare follower B tied
    expect(codes(verifyLayout(one, l))).toEqual([]);
  });
});

describe('circuit and warning kinds', () => {
  it('a reference used twice in the circuit is a circuit fault', () => {
    const { circuit: c, layout: l } = divider();
    const twice = { ...c, parts: [...c.parts, { ...c.parts[0]! }] };
    expect(codes(verifyLayout(twice, l))).toEqual(['verify.circuit']);
  });

  it('warns of a defaulted lead order, a single-pin net and unconnected IC pins', () => {
    const c = circuit([
      { ref: 'Q1', kind: 'npn', pins: { C: 'A', B: 'B', E: 'LONE' } },
      { ref: 'U1', kind: 'ic', package: 'DIP-8', pins: { '1': 'A', '2': 'B' } },
    ]);
    const l = layout({ kind: 'pads', cols: 12, rows: 6 }, [
      { ref: 'Q1', footprint: 'to92-EBC', pins: { E: [8, 0], B: [9, 0], C: [10, 0] } },
      { ref: 'U1', footprint: 'dip-8', pins: Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8].map((k) => [String(k), (k <= 4 ? [0, k - 1] : [3, 8 - k]) as XY])) },
    ], {
      wires: [
        { from: [0, 0], to: [0, 5] },
        { from: [0, 5], to: [10, 5] },
        { from: [10, 5], to: [10, 0] },
      ],
    });
    const r = verifyLayout(c, l);
    // U1 pin 2 (B) is still apart from Q1 B: an open, and the wire passes over U1 pins 2–4
    expect(warningCodes(r)).toEqual(expect.arrayContaining(['verify.pinout-defaulted', 'verify.single-pin-net', 'verify.unconnected-pin']));
    expect(r.warnings.find((w) => w.code === 'verify.unconnected-pin')!.pins!.map((p) => p.pin)).toEqual(['3', '4', '5', '6', '7', '8']);
  });
});
