/**
 * The printed bench guide, end to end: guide → HTML → Chromium PDF (the CLI's own printing
 * path) → read back with pdfjs-dist.
 *
 * Layout used: the large demo (layouts/four-mixer.layout.json, else its hand layout) when it
 * exists, else the bench-buffer hand layout, else the bench-buffer layout built in
 * src/lib/render/fixture.ts. The test names which one it printed.
 *
 * Page-count rule (src/lib/guide/pages.ts): every section starts on a new sheet; list
 * sections fill sheets of a fixed number of fixed-height lines; each of the two drawings
 * takes one sheet. So pages = (sheets of the 7 list sections) + 2, which is 9 when every
 * list fits on one sheet. The PDF must have exactly that many pages, each headed by its
 * planned section and "page i of N".
 */
import { describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { PDFPageProxy } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { buildGuide, guideHtml, guidePages, type Guide } from '../src/lib/guide/index.ts';
import { THEME } from '../src/lib/render/index.ts';
import { benchBufferLayout } from '../src/lib/render/fixture.ts';
import { loadCircuit, loadLayout } from '../src/cli/io.ts';
import { chromiumPath, htmlToPdf } from '../src/cli/commands/guide.ts';
import type { Circuit, Layout } from '../src/lib/model/index.ts';

// A PDF point is 1/72 in (ISO 32000-1, from memory); 1 in = 25.4 mm exactly (check-values.md header).
const PT_PER_MM = 72 / 25.4;
const PITCH_MM = 2.54; // check-values.md §8: 0.1 in hole pitch [S]

async function pickDemo(): Promise<{ name: string; circuit: Circuit; layout: Layout }> {
  const candidates: [string, string][] = [
    ['layouts/four-mixer.circuit.json', 'layouts/four-mixer.layout.json'],
    ['layouts/four-mixer.circuit.json', 'layouts/four-mixer.hand.layout.json'],
    ['layouts/bench-buffer.circuit.json', 'layouts/bench-buffer.hand.layout.json'],
  ];
  for (const [c, l] of candidates) {
    if (!existsSync(c) || !existsSync(l)) continue;
    const circuit = await loadCircuit(c);
    const layout = await loadLayout(l);
    if (circuit.ok && layout.ok) return { name: l, circuit: circuit.value.circuit, layout: layout.value };
  }
  const circuit = await loadCircuit('layouts/bench-buffer.circuit.json');
  if (!circuit.ok) throw new Error('bench-buffer circuit unreadable');
  return { name: 'src/lib/render/fixture.ts', circuit: circuit.value.circuit, layout: benchBufferLayout() };
}

type Matrix = [number, number, number, number, number, number];
const times = (m: Matrix, o: Matrix): Matrix => [
  m[0] * o[0] + m[1] * o[2],
  m[0] * o[1] + m[1] * o[3],
  m[2] * o[0] + m[3] * o[2],
  m[2] * o[1] + m[3] * o[3],
  m[4] * o[0] + m[5] * o[2] + o[4],
  m[4] * o[1] + m[5] * o[3] + o[5],
];
const apply = (m: Matrix, x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

/** Centres and diameters (PDF points) of every filled path drawn in `colour`, in page space. */
async function filledShapes(page: PDFPageProxy, colour: string): Promise<{ x: number; y: number; w: number; h: number }[]> {
  const ops = await page.getOperatorList();
  const out: { x: number; y: number; w: number; h: number }[] = [];
  let ctm: Matrix = [1, 0, 0, 1, 0, 0];
  let fill = '';
  const stack: [Matrix, string][] = [];
  ops.fnArray.forEach((fn, i) => {
    const args = ops.argsArray[i] as unknown[];
    if (fn === OPS.save) stack.push([ctm, fill]);
    else if (fn === OPS.restore) [ctm, fill] = stack.pop() ?? [ctm, fill];
    else if (fn === OPS.transform) ctm = times(args as unknown as Matrix, ctm);
    else if (fn === OPS.paintFormXObjectBegin) {
      stack.push([ctm, fill]);
      const m = args[0] as Matrix | null;
      if (m) ctm = times(m, ctm);
    } else if (fn === OPS.paintFormXObjectEnd) [ctm, fill] = stack.pop() ?? [ctm, fill];
    else if (fn === OPS.setFillRGBColor) fill = String(args[0]).toLowerCase();
    else if (fn === OPS.constructPath && fill === colour) {
      const mm = args[2] as ArrayLike<number> | null;
      if (!mm) return;
      const a = apply(ctm, mm[0]!, mm[1]!);
      const b = apply(ctm, mm[2]!, mm[3]!);
      out.push({ x: (a[0] + b[0]) / 2, y: (a[1] + b[1]) / 2, w: Math.abs(b[0] - a[0]), h: Math.abs(b[1] - a[1]) });
    }
  });
  return out;
}

/** Mean spacing of equally spaced centres along one line: (last − first) / (n − 1). */
function spacing(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return (s[s.length - 1]! - s[0]!) / (s.length - 1);
}

async function pageText(page: PDFPageProxy): Promise<string> {
  const t = await page.getTextContent();
  return t.items.map((i) => ('str' in i ? i.str : '')).join(' ');
}

const hasChromium = existsSync(chromiumPath());

async function printAndCheck(name: string, circuit: Circuit, layout: Layout): Promise<void> {
  console.log(`guide e2e: printing ${name}`);
  const built = buildGuide(circuit, layout);
  if (!built.ok) throw new Error(`guide failed: ${built.problems.map((p) => p.message).join('; ')}`);
  const guide: Guide = built.value;
  const plan = guidePages(guide, { paper: 'a4' });
  const pdf = await htmlToPdf(guideHtml(guide, { paper: 'a4' }));
  const doc = await getDocument({ data: pdf, isEvalSupported: false, useSystemFonts: false }).promise;

  // Page count: 7 list sections + 2 drawings, plus one per extra sheet a long list needs.
  const extra = plan.filter((p) => p.part > 1).length;
  expect(plan.length).toBe(9 + extra);
  expect(doc.numPages).toBe(plan.length);
  const texts: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const text = await pageText(await doc.getPage(i));
    texts.push(text);
    expect(text).toContain(`page ${i} of ${plan.length}`);
    expect(text).toContain(plan[i - 1]!.title);
  }

  // True scale: hole centres of the copper drawing 2.54 mm apart within 0.5 %.
  const copperPage = plan.findIndex((p) => p.section === 'copper') + 1;
  const page = await doc.getPage(copperPage);
  const holeDia = 2 * guide.scenes.copper.sizes.holeR * PT_PER_MM;
  const holes = (await filledShapes(page, THEME.copper.hole.toLowerCase())).filter((s) => Math.abs(s.w - holeDia) < 0.05 * holeDia && Math.abs(s.h - holeDia) < 0.05 * holeDia);
  const { cols, rows } = guide.board;
  expect(holes.length).toBeGreaterThanOrEqual(cols * rows);
  const byRow = new Map<number, number[]>();
  const byCol = new Map<number, number[]>();
  for (const h of holes) {
    const ry = Math.round(h.y * 10);
    const cx = Math.round(h.x * 10);
    byRow.set(ry, [...(byRow.get(ry) ?? []), h.x]);
    byCol.set(cx, [...(byCol.get(cx) ?? []), h.y]);
  }
  const fullRow = [...byRow.values()].find((xs) => xs.length === cols)!;
  const fullCol = [...byCol.values()].find((ys) => ys.length === rows)!;
  const pitchX = spacing(fullRow) / PT_PER_MM;
  const pitchY = spacing(fullCol) / PT_PER_MM;
  console.log(`guide e2e: ${doc.numPages} pages; copper drawing pitch ${pitchX.toFixed(4)} × ${pitchY.toFixed(4)} mm on page ${copperPage}`);
  expect(Math.abs(pitchX - PITCH_MM) / PITCH_MM).toBeLessThan(0.005);
  expect(Math.abs(pitchY - PITCH_MM) / PITCH_MM).toBeLessThan(0.005);

  // The 50 mm check bar measures 50 mm.
  const bar = (await filledShapes(page, '#111111')).filter((s) => s.w > 100);
  expect(bar).toHaveLength(1);
  expect(Math.abs(bar[0]!.w / PT_PER_MM - 50)).toBeLessThan(0.25);

  // Every cut (copper side, with its component-side name) and every link appears.
  const all = texts.join(' ').replace(/\s+/g, '');
  for (const row of guide.cuts) for (const c of row.items) expect(all).toContain(`${c.copper}(${c.component})`);
  for (const l of guide.links) {
    expect(all).toContain(`${l.id}${l.from.component}(copper${l.from.copper})→${l.to.component}(copper${l.to.copper})`);
    expect(all).toContain(`${l.id}${l.from.component}–${l.to.component}`);
  }
  await doc.destroy();
}

describe.skipIf(!hasChromium)('bench guide printed to PDF through Chromium', () => {
  it('prints the large demo with the planned pages, a true-scale copper drawing and every cut and link', async () => {
    const demo = await pickDemo();
    await printAndCheck(demo.name, demo.circuit, demo.layout);
  });

  it('prints drilled and scored cuts and links of the hand-built bench-buffer layout', async () => {
    const circuit = await loadCircuit('layouts/bench-buffer.circuit.json');
    if (!circuit.ok) throw new Error('bench-buffer circuit unreadable');
    const layout = benchBufferLayout();
    expect(layout.cuts.length).toBeGreaterThan(0);
    await printAndCheck('src/lib/render/fixture.ts', circuit.value.circuit, layout);
  });

  it('prints long lists over the planned number of Letter sheets', async () => {
    const circuit = await loadCircuit('layouts/bench-buffer.circuit.json');
    if (!circuit.ok) throw new Error('bench-buffer circuit unreadable');
    const built = buildGuide(circuit.value.circuit, benchBufferLayout());
    if (!built.ok) throw new Error('guide failed');
    // Stretch the lists (data only) so several sections need more than one sheet.
    const g = built.value;
    const long: Guide = {
      ...g,
      links: Array.from({ length: 90 }, (_, i) => ({ ...g.links[0]!, id: `L${i + 1}` })),
      probes: { beep: Array.from({ length: 70 }, () => g.probes.beep[0]!), silent: g.probes.silent },
      cuts: Array.from({ length: 30 }, (_, r) => ({ row: `R${r}`, items: g.cuts[0]!.items })),
    };
    const plan = guidePages(long, { paper: 'letter' });
    expect(plan.filter((p) => p.part > 1).length).toBeGreaterThanOrEqual(3);
    const doc = await getDocument({ data: await htmlToPdf(guideHtml(long, { paper: 'letter' })), isEvalSupported: false }).promise;
    expect(doc.numPages).toBe(plan.length);
    const first = await doc.getPage(1);
    // US Letter is 8.5 × 11 in (ANSI/ASME Y14.1 size A, from memory) = 612 × 792 pt
    expect(first.view.map((v) => Math.round(v))).toEqual([0, 0, 612, 792]);
    for (let i = 1; i <= doc.numPages; i++) expect(await pageText(await doc.getPage(i))).toContain(`page ${i} of ${plan.length}`);
    await doc.destroy();
  });
});
