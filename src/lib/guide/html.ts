/**
 * `guidePages(guide, { paper }): GuidePage[]` — the page plan: which section each printed
 * page holds, in order (pages.ts gives the rule).
 * `guideHtml(guide, { paper: 'a4' | 'letter' }): string` — one self-contained HTML file:
 * print CSS with @page size and margins, one fixed-height block per page (so printing
 * gives exactly the planned pages), user text escaped everywhere. The copper side is drawn
 * at true scale — an inline SVG whose width and height are in mm and whose viewBox is in
 * board mm, so 2.54 mm on the board is 2.54 mm on paper — beside a 50 mm check bar; the
 * component side is drawn as large as fits. Both come from the guide's Scenes through
 * render's string back end, so the page matches the app and the CLI pictures.
 */
import { escapeXml as esc, sceneSvgMarkup, type Scene } from '../render/index.ts';
import { guideCss } from './css.ts';
import { HEADER_MM, LINE_MM, SLACK_MM, contentBox, linesPerPage, paginate, type Line, type Paper } from './pages.ts';
import { buildLines, coverLines, cutLines, linkLines, offBoardLines, partsLines, probeLines } from './sections.ts';
import type { Guide } from './types.ts';

export type SectionId = 'prepare' | 'cuts' | 'copper' | 'links' | 'parts' | 'build' | 'component' | 'offboard' | 'probes';

export const SECTION_TITLES: Record<SectionId, string> = {
  prepare: 'Board preparation',
  cuts: 'Track cuts, copper side',
  copper: 'Copper side at true scale',
  links: 'Links and wires',
  parts: 'Parts list',
  build: 'Build order',
  component: 'Component side',
  offboard: 'Off-board wiring',
  probes: 'Continuity checklist',
};

const ORDER: SectionId[] = ['prepare', 'cuts', 'copper', 'links', 'parts', 'build', 'component', 'offboard', 'probes'];

export interface GuidePage {
  section: SectionId;
  title: string;
  /** 1-based page within its section, and the section's page count. */
  part: number;
  parts: number;
  landscape: boolean;
  body: string;
}

/** Lines kept above a drawing: two explanation lines, and on the copper page the check bar. */
const DRAWING_NOTE_LINES = 2;
const BAR_MM = 12;

/** A 50 mm check bar (the rect is exactly 50 mm long) with ticks every 10 mm. */
function scaleBar(): string {
  const ticks = [0, 10, 20, 30, 40, 50]
    .map((x) => `<line x1="${x}" y1="-1.6" x2="${x}" y2="1.4" stroke="#111" stroke-width="0.3"/><text x="${x}" y="5" font-size="2.8" text-anchor="${x === 0 ? 'start' : 'middle'}" font-family="Helvetica, Arial, sans-serif">${x}</text>`)
    .join('');
  return `<svg class="bar" xmlns="http://www.w3.org/2000/svg" width="60mm" height="8mm" viewBox="0 -2 60 8"><rect x="0" y="0" width="50" height="1.2" fill="#111"/>${ticks}<text x="52.5" y="1.6" font-size="2.8" font-family="Helvetica, Arial, sans-serif">mm</text></svg>`;
}

function drawingPage(guide: Guide, side: 'copper' | 'component', paper: Paper): { landscape: boolean; body: string } {
  const scene: Scene = guide.scenes[side];
  const room = (landscape: boolean) => {
    const box = contentBox(paper, landscape);
    return { w: box.width, h: box.height - SLACK_MM - HEADER_MM - DRAWING_NOTE_LINES * LINE_MM - (side === 'copper' ? BAR_MM : 0) };
  };
  const v = scene.view;
  const fits = (r: { w: number; h: number }, s: number) => v.width * s <= r.w && v.height * s <= r.h;
  let landscape = false;
  let scale = 1;
  let note: string;
  if (side === 'copper') {
    if (!fits(room(false), 1) && fits(room(true), 1)) landscape = true;
    const r = room(landscape);
    if (!fits(r, 1)) scale = Math.floor(Math.min(r.w / v.width, r.h / v.height) * 1000) / 1000;
    note =
      scale === 1
        ? 'Print at 100 % (no "fit to page"): the bar must measure 50 mm and the holes 2.54 mm apart. Lay the board on it copper side up, rows and columns matching, to mark the cuts.'
        : `This board is larger than the page: drawn at ${Math.round(scale * 100)} % — not a template; use the cut list.`;
  } else {
    const r = room(false);
    scale = Math.floor(Math.min(r.w / v.width, r.h / v.height, 3) * 1000) / 1000;
    note = `Seen from the component side, drawn at ${Math.round(scale * 100)} % of board size. Links are green; strips show faintly through the board.`;
  }
  const lines = `<div class="ln wrap" style="height:${DRAWING_NOTE_LINES * LINE_MM}mm">${esc(note)}</div>`;
  const bar = side === 'copper' ? `<div class="barbox" style="height:${BAR_MM}mm">${scaleBar()}</div>` : '';
  return { landscape, body: `${lines}${bar}<div class="drawing" data-scale="${scale}">${sceneSvgMarkup(scene, { scale })}</div>` };
}

function sectionLines(guide: Guide, id: SectionId, contents: { title: string; token: string }[]): Line[] {
  switch (id) {
    case 'prepare':
      return coverLines(guide, contents);
    case 'cuts':
      return cutLines(guide);
    case 'links':
      return linkLines(guide);
    case 'parts':
      return partsLines(guide);
    case 'build':
      return buildLines(guide);
    case 'offboard':
      return offBoardLines(guide);
    case 'probes':
      return probeLines(guide);
    default:
      return [];
  }
}

const token = (id: SectionId) => `\u0001${id}\u0001`;

export function guidePages(guide: Guide, opts: { paper: Paper }): GuidePage[] {
  const per = linesPerPage(opts.paper);
  const contents = ORDER.map((id) => ({ title: SECTION_TITLES[id], token: token(id) }));
  const pages: GuidePage[] = [];
  for (const id of ORDER) {
    const title = SECTION_TITLES[id];
    if (id === 'copper' || id === 'component') {
      const d = drawingPage(guide, id, opts.paper);
      pages.push({ section: id, title, part: 1, parts: 1, landscape: d.landscape, body: d.body });
      continue;
    }
    const chunks = paginate(sectionLines(guide, id, contents), per);
    chunks.forEach((chunk, k) => pages.push({ section: id, title, part: k + 1, parts: chunks.length, landscape: false, body: chunk.map((l) => l.html).join('') }));
  }
  const first = new Map<SectionId, number>();
  pages.forEach((p, i) => first.has(p.section) || first.set(p.section, i + 1));
  return pages.map((p) => ({ ...p, body: p.body.replace(/\u0001(\w+)\u0001/g, (_, id: string) => String(first.get(id as SectionId) ?? '?')) }));
}

export function guideHtml(guide: Guide, opts: { paper: Paper }): string {
  const pages = guidePages(guide, opts);
  const body = pages
    .map((p, i) => {
      const cont = p.parts > 1 ? ` (${p.part} of ${p.parts})` : '';
      return (
        `<section class="page${p.landscape ? ' wide' : ''}" data-section="${p.section}">` +
        `<header><span>${esc(guide.title)} — bench guide</span><span>page ${i + 1} of ${pages.length}</span></header>` +
        `<h2>${esc(p.title)}${cont}</h2>${p.body}</section>`
      );
    })
    .join('\n');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="generator" content="Kerfline">
<title>${esc(guide.title)} — bench guide</title>
<style>${guideCss(opts.paper)}</style></head>
<body>
${body}
</body></html>
`;
}
