import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { CircuitSchema, type Layout } from '../model/index.ts';
import { prepareDesign, type Design } from '../netlist/design.ts';
import { drawScene } from './draw-scene.ts';
import { benchBufferLayout } from './fixture.ts';
import { sceneSvgMarkup } from './markup.ts';
import { insulatedNotes } from './insulated.ts';

function benchDesign(): Design {
  const circuit = CircuitSchema.parse(JSON.parse(readFileSync(new URL('../../../layouts/bench-buffer.circuit.json', import.meta.url), 'utf8')));
  const d = prepareDesign(circuit);
  if (!d.ok) throw new Error('bench-buffer circuit does not prepare');
  return d.value;
}

const empty = (cols: number, rows: number, extra: Partial<Layout> = {}): Layout => ({
  format: 'kerfline.layout',
  version: 1,
  board: { kind: 'strip', cols, rows, pitchMm: 2.54 },
  parts: [],
  cuts: [],
  links: [],
  wires: [],
  ...extra,
});

describe('drawScene geometry', () => {
  it('draws one hole per grid position, centred half a pitch in', () => {
    const s = drawScene(empty(24, 18), undefined, { side: 'component' });
    expect(s.holes).toHaveLength(24 * 18);
    expect(s.board.width).toBeCloseTo(24 * 2.54, 6);
    const first = s.holes[0]!;
    expect([first.x, first.y]).toEqual([1.27, 1.27]);
  });

  it('mirrors a cut at component column 3 of 24 to copper column 22', () => {
    const layout = empty(24, 18, { cuts: [{ at: [2, 5] }] });
    const comp = drawScene(layout, undefined, { side: 'component' });
    const copper = drawScene(layout, undefined, { side: 'copper' });
    const a = comp.cuts[0]!;
    const b = copper.cuts[0]!;
    expect(a.label).toBe('F3');
    expect(a.sideLabel).toBe('F3');
    expect(b.label).toBe('F3');
    expect(b.sideLabel).toBe('F22');
    if (a.style !== 'drilled' || b.style !== 'drilled') throw new Error('expected drilled cuts');
    // x → width − x; the column number drawn above the copper-side cut reads 22
    expect(b.x).toBeCloseTo(copper.board.width - a.x, 6);
    const ruler = copper.rulers.find((r) => r.axis === 'col' && Math.abs(r.x - b.x) < 1e-6)!;
    expect(ruler.text).toBe('22');
  });

  it('mirrors scored cuts and lists their holes left to right on each side', () => {
    const layout = empty(24, 4, { cuts: [{ between: [[2, 1], [3, 1]] }] });
    const copper = drawScene(layout, undefined, { side: 'copper' }).cuts[0]!;
    expect(copper.label).toBe('B3|B4');
    expect(copper.sideLabel).toBe('B21|B22');
    if (copper.style !== 'scored') throw new Error('expected a scored cut');
    // the bar stands across the strip, midway between the two holes
    expect(copper.x1).toBeCloseTo(copper.x2, 6);
    expect((copper.x1 + copper.x2) / 2).toBeCloseTo(24 * 2.54 - 3 * 2.54, 6);
  });

  it('mirrors every x and keeps every y on the copper side (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 30 }), fc.integer({ min: 2, max: 20 }), (cols, rows) => {
        const layout = empty(cols, rows, { links: [{ from: [0, 0], to: [cols - 1, rows - 1] }] });
        const a = drawScene(layout, undefined, { side: 'component' });
        const b = drawScene(layout, undefined, { side: 'copper' });
        a.holes.forEach((h, i) => {
          expect(b.holes[i]!.x).toBeCloseTo(a.board.width - h.x, 6);
          expect(b.holes[i]!.y).toBe(h.y);
        });
        expect(b.links[0]!.x1).toBeCloseTo(a.board.width - a.links[0]!.x1, 6);
      }),
      { numRuns: 30 },
    );
  });
});

describe('drawScene nets and marks on the bench-buffer layout', () => {
  const design = benchDesign();
  const layout = benchBufferLayout();

  it('names the net of each strip segment from the pins on it', () => {
    const s = drawScene(layout, design, { side: 'component' });
    const netsByRow = new Map<number, string[]>();
    for (const c of s.copper) netsByRow.set(c.holes[0]![1], [...(netsByRow.get(c.holes[0]![1]) ?? []), c.net ?? '-']);
    expect(Object.fromEntries(netsByRow)).toEqual({
      0: ['GND'],
      1: ['OUT'],
      2: ['IN'],
      3: ['V+'],
      4: ['BASE'],
      5: ['OUT_E'],
      6: ['IN', 'OUT'],
      7: ['BASE', '-'],
    });
    expect(s.links.map((l) => l.net)).toEqual(['IN', 'OUT', 'BASE']);
  });

  it('highlights exactly the holes joined to the chosen net', () => {
    const s = drawScene(layout, design, { side: 'copper', highlightNet: 'BASE' });
    // row E whole (14 holes) and row H up to the scored cut (10 holes)
    expect(s.holes.filter((h) => h.highlight)).toHaveLength(14 + 10);
    expect(s.parts.filter((p) => p.highlight).map((p) => p.ref).sort()).toEqual(['C1', 'Q1', 'R1', 'R2']);
    expect(s.links.filter((l) => l.highlight).map((l) => l.id)).toEqual(['link:2']);
  });

  it('draws the TO-92 flat, the + of the electrolytic and the pin-1 dot of the pads', () => {
    const comp = drawScene(layout, design, { side: 'component' });
    const copper = drawScene(layout, design, { side: 'copper' });
    const q = comp.parts.find((p) => p.ref === 'Q1')!;
    const dee = q.shapes.find((s) => s.shape === 'dee');
    // to92 rotation 1 turns the flat from facing down to facing left; the copper side mirrors it
    expect(dee && dee.shape === 'dee' && dee.flat).toBe('left');
    const deeCopper = copper.parts.find((p) => p.ref === 'Q1')!.shapes.find((s) => s.shape === 'dee');
    expect(deeCopper && deeCopper.shape === 'dee' && deeCopper.flat).toBe('right');
    expect(q.pins.map((p) => p.tag?.text)).toEqual(['C', 'B', 'E']);
    expect(comp.parts.find((p) => p.ref === 'C2')!.marks.map((m) => m.mark)).toEqual(['plus']);
    expect(comp.parts.find((p) => p.ref === 'J1')!.marks.map((m) => m.mark)).toEqual(['pin1']);
    expect(comp.parts.every((p) => !p.broken)).toBe(true);
  });

  it('gives every item an id and is plain data that survives JSON', () => {
    const s = drawScene(layout, design, { side: 'component', highlightNet: 'OUT' });
    const ids = [...s.holes, ...s.copper, ...s.cuts, ...s.links, ...s.parts, ...s.rulers].map((i) => i.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
    expect(drawScene(layout, design, { side: 'component', highlightNet: 'OUT' })).toEqual(s);
  });
});

describe('drawScene insulated links', () => {
  it('sleeves a bent link and a straight one over a pin on both sides, and leaves bare links bare', () => {
    const l = benchBufferLayout();
    // R1 has a pin at [7, 3] (benchBufferLayout); row 1 from column 10 to 12 holds no pin.
    expect(l.parts.flatMap((p) => p.pins.map((q) => q.at.join()))).toContain('7,3');
    const links = [
      { from: [2, 2], to: [5, 6] },
      { from: [7, 2], to: [7, 4] },
      { from: [10, 1], to: [12, 1] },
    ] as Layout['links'];
    for (const side of ['component', 'copper'] as const) {
      const s = drawScene({ ...l, links }, undefined, { side });
      expect(s.links.map((k) => k.insulated ?? false)).toEqual([true, true, false]);
      const svg = sceneSvgMarkup(s);
      expect(svg.match(/data-insulated="true"/g)).toHaveLength(2);
      // One note per sleeved link, naming it and its holes from both sides.
      expect(insulatedNotes({ ...l, links }).map((n) => [n.code, n.path, n.holes])).toEqual([
        ['layout.insulated-link', ['links', 0], [links[0]!.from, links[0]!.to]],
        ['layout.insulated-link', ['links', 1], [links[1]!.from, links[1]!.to]],
      ]);
      // Sleeved links lie over the parts: drawn after them.
      expect(svg.indexOf('class="insulated-links"')).toBeGreaterThan(svg.indexOf('class="parts"'));
      expect(svg.indexOf('class="links"')).toBeLessThan(svg.indexOf('class="parts"'));
    }
  });
});

describe('drawScene other boards and faults', () => {
  it('puts a cathode band on a diode, a pin-1 dot on a DIP and marks fault holes and parts', () => {
    const layout = empty(12, 8, {
      parts: [
        { ref: 'D1', footprint: 'do35', pins: [{ pin: 'A', at: [1, 1] }, { pin: 'K', at: [5, 1] }] },
        { ref: 'U1', footprint: 'dip-8', pins: Array.from({ length: 8 }, (_, i) => ({ pin: String(i + 1), at: (i < 4 ? [7, 2 + i] : [10, 2 + (7 - i)]) as [number, number] })) },
        { ref: 'R9', footprint: 'axial-small', pins: [{ pin: '1', at: [0, 6] }, { pin: '2', at: [1, 7] }] },
      ],
    });
    const s = drawScene(layout, undefined, {
      side: 'component',
      faults: [{ code: 'verify.short', severity: 'error', path: [], message: 'short', holes: [[5, 1]], refs: ['U1'] }],
    });
    const d1 = s.parts.find((p) => p.ref === 'D1')!;
    const band = d1.marks.find((m) => m.mark === 'cathode');
    if (!band || band.mark !== 'cathode') throw new Error('no cathode band');
    // the band sits on the cathode (right) half of the body
    expect(band.x1).toBeGreaterThan((1.5 + 5.5) / 2 * 2.54);
    expect(s.parts.find((p) => p.ref === 'U1')!.marks.map((m) => m.mark)).toEqual(['pin1']);
    expect(s.parts.find((p) => p.ref === 'R9')!.broken).toBe(true);
    expect(s.holes.filter((h) => h.fault).map((h) => h.label)).toEqual(['B6']);
    expect(s.parts.filter((p) => p.fault).map((p) => p.ref).sort()).toEqual(['D1', 'U1']);
    expect(s.faults[0]!.points).toHaveLength(1);
  });

  it('joins pads on a pad board only through copper-side wires', () => {
    const layout: Layout = {
      ...empty(6, 3),
      board: { kind: 'pads', cols: 6, rows: 3, pitchMm: 2.54 },
      parts: [{ ref: 'R1', footprint: 'axial-small', pins: [{ pin: '1', at: [0, 0] }, { pin: '2', at: [4, 0] }] }],
      wires: [{ from: [0, 0], to: [0, 2] }],
    };
    const design: Design = {
      title: 't',
      nets: [],
      parts: [{ ref: 'R1', kind: 'resistor', footprint: 'axial-small', pinNames: ['1', '2'], nets: { '1': 'A', '2': 'B' }, polarized: false, source: [0] }],
    };
    const s = drawScene(layout, design, { side: 'copper', highlightNet: 'A' });
    expect(s.copper).toHaveLength(18);
    expect(s.copper.every((c) => c.points.length === 1)).toBe(true);
    expect(s.holes.filter((h) => h.highlight).map((h) => h.label)).toEqual(['A1', 'B1', 'C1']);
    expect(s.wires[0]!.net).toBe('A');
    expect(s.wires[0]!.lengthMm).toBeCloseTo(2 * 2.54, 6);
  });
});
