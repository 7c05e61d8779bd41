/**
 * The list sections of the printed guide as fixed-height lines of escaped HTML (see
 * pages.ts). Every piece of user text (title, refs, values, nets, labels, messages) goes
 * through `esc`. Long text takes as many lines as it needs at `CHARS_PER_LINE` (a
 * conservative count for 9 pt type across the A4 or Letter text width).
 */
import { escapeXml as esc } from '../render/index.ts';
import { LINE_MM, type Line } from './pages.ts';
import type { Guide, HoleName, PartGroup, ProbeItem, SegmentItem } from './types.ts';

export const CHARS_PER_LINE = 84;

const tick = '<span class="tick"></span>';

/** Screen colours for band names (ours; only the names are printed as text too). */
const BAND_CSS: Record<string, string> = {
  black: '#111111', brown: '#7a4a1f', red: '#d0312d', orange: '#f28a1a', yellow: '#f6d02f', green: '#3a8d3f', blue: '#2360c4',
  violet: '#7d3fb0', grey: '#9a9a9a', white: '#ffffff', gold: '#c8a23a', silver: '#b8bec6', pink: '#f2a0bf',
};

export function unitsFor(text: string, extra = 0): number {
  return Math.max(1, Math.ceil((text.length + extra) / CHARS_PER_LINE));
}

/** One fixed-height line; `inner` is HTML already escaped. */
function line(units: number, cls: string, inner: string, sticky = false): Line {
  const out: Line = { units, html: `<div class="ln${units > 1 ? ' wrap' : ''}${cls ? ` ${cls}` : ''}" style="height:${units * LINE_MM}mm">${inner}</div>` };
  if (sticky) out.sticky = true;
  return out;
}
const head = (text: string): Line => line(1, 'hd', esc(text), true);
const para = (text: string, cls = ''): Line => line(unitsFor(text), cls, esc(text));
const both = (h: HoleName) => `${esc(h.component)} <span class="alt">(copper ${esc(h.copper)})</span>`;
const copperFirst = (h: HoleName) => `${esc(h.copper)} <span class="alt">(component ${esc(h.component)})</span>`;

export function coverLines(g: Guide, contents: { title: string; token: string }[]): Line[] {
  const b = g.board;
  const lines: Line[] = [
    line(2, 'title', esc(g.title)),
    head('The board'),
    para(`${b.describe}${b.pattern ? ` (pattern ${b.pattern})` : ''}.`),
    para(`Size: ${b.cols} × ${b.rows} holes, ${b.widthMm} × ${b.heightMm} mm at ${b.pitchMm} mm pitch.`),
    para(
      b.trim.whole
        ? 'Trim: none — the whole board is used.'
        : `Trim to ${b.trim.cols} × ${b.trim.rows} holes (${b.trim.widthMm} × ${b.trim.heightMm} mm): from ${b.trim.from.component} to ${b.trim.to.component} as seen from the component side (${b.trim.from.copper} to ${b.trim.to.copper} from the copper side).`,
    ),
  ];
  const drilled = g.cuts.flatMap((r) => r.items).filter((c) => c.style === 'drilled').length;
  const scored = g.cutCount - drilled;
  if (g.cutCount)
    lines.push(
      para(
        `Track cuts: ${g.cutCount} — ${drilled} at a hole (spot-face with a 3–4 mm drill turned by hand), ${scored} between holes (score across the strip twice with a sharp knife and lift the sliver).`,
      ),
    );
  const w = g.wireStock;
  const total = Math.round(g.links.reduce((s, l) => s + l.cutMm, 0) + g.wires.reduce((s, l) => s + l.cutMm, 0));
  lines.push(
    para(`Wire: ${w.awg} AWG solid bare copper, Ø${w.diameterMm.toFixed(3)} mm, for Ø${w.holeMm.toFixed(1)} mm holes; ${g.links.length} links and ${g.wires.length} copper-side wires, about ${total} mm in all.`),
  );
  lines.push(head('Cautions'));
  for (const c of g.cautions) lines.push(para(`• ${c.text}`));
  if (g.warnings.length) {
    lines.push(head('Check before you build'));
    for (const p of g.warnings) lines.push(para(`• ${p.message}${p.hint ? ` — ${p.hint}` : ''}`));
  }
  lines.push(head('Contents'));
  for (const c of contents) lines.push(line(1, 'toc', `<span>${esc(c.title)}</span><span>page ${c.token}</span>`));
  return lines;
}

export function cutLines(g: Guide): Line[] {
  if (!g.cutCount) return [para('No track cuts on this board.')];
  const lines: Line[] = [para('Turn the board over, copper side up. Holes are named as you now see them (columns counted from the left); the component-side name is in brackets.')];
  for (const row of g.cuts) {
    lines.push(head(`Row ${row.row}`));
    for (let i = 0; i < row.items.length; i += 3) {
      const cells = row.items
        .slice(i, i + 3)
        .map((c) => `<span class="cell">${tick}<b>${esc(c.copper)}</b> <span class="alt">(${esc(c.component)})</span> ${c.style === 'drilled' ? 'at hole' : 'between'}</span>`)
        .join('');
      lines.push(line(1, 'cells', cells));
    }
  }
  return lines;
}

function segmentLine(s: SegmentItem, copperSide: boolean): Line {
  const name = copperSide ? copperFirst : both;
  const net = s.net !== undefined ? ` · net ${esc(s.net)}` : '';
  const text = `${s.id} ${s.from.component} ${s.from.copper} ${s.to.component} ${s.to.copper} ${s.lengthMm} ${s.cutMm} ${s.net ?? ''}`;
  const units = unitsFor(text, 40);
  return line(units, '', `${tick}<b>${esc(s.id)}</b> ${name(s.from)} → ${name(s.to)} · span ${s.lengthMm.toFixed(2)} mm · cut ${s.cutMm} mm${net}`);
}

export function linkLines(g: Guide): Line[] {
  const w = g.wireStock;
  const lines: Line[] = [para(`Component side. Use ${w.awg} AWG solid bare wire (Ø${w.diameterMm.toFixed(3)} mm); "cut" is the length to cut, with a lead for each hole.`)];
  lines.push(head(`Links (${g.links.length})`));
  if (!g.links.length) lines.push(para('No links on this board.'));
  for (const l of g.links) lines.push(segmentLine(l, false));
  if (g.wires.length) {
    lines.push(head(`Copper-side wires (${g.wires.length}) — lay bare wire over the pads and solder it at every hole it crosses`));
    for (const wire of g.wires) lines.push(segmentLine(wire, true));
  }
  return lines;
}

function bands(names: string[]): string {
  return names.map((n) => `<span class="band" style="background:${BAND_CSS[n] ?? '#ffffff'}"></span>${esc(n)}`).join(' ');
}

function partLines(p: PartGroup): Line[] {
  const refs = p.refs.join(', ');
  const main = `${p.count}× ${p.value} ${p.kind} ${refs}`;
  const mu = unitsFor(main, 8);
  const out: Line[] = [
    line(mu, 'pmain', `${tick}<b>${p.count}×</b> <b class="val">${esc(p.value)}</b> ${esc(p.kind)}${p.value !== p.written && p.written ? ` <span class="alt">(written ${esc(p.written)})</span>` : ''} — ${esc(refs)}`, true),
  ];
  const marks: string[] = [];
  if (p.bands4) marks.push(`4 bands: ${bands(p.bands4)}`);
  if (p.bands5) marks.push(`5 bands: ${bands(p.bands5)}`);
  if (p.capCode) marks.push(`code <b>${esc(p.capCode)}</b>`);
  if (marks.length) out.push(line(1, 'sub', marks.join(' &nbsp;·&nbsp; ')));
  if (p.polarity) out.push(line(unitsFor(p.polarity, 10), 'sub', `Polarity: ${esc(p.polarity)}`));
  const fpText = `${p.footprintTitle}${p.leadSpacing ? `; leads ${p.leadSpacing}` : ''}`;
  const fu = unitsFor(fpText, 10);
  out.push(line(fu, 'sub', `Footprint ${esc(p.footprint)}: ${esc(fpText)}`));
  return out;
}

export function partsLines(g: Guide): Line[] {
  const total = g.parts.reduce((s, p) => s + p.count, 0);
  return [para(`${total} parts in ${g.parts.length} groups. Values in IEC 60062 letter form (4k7 = 4.7 kΩ, 100n = 100 nF).`), ...g.parts.flatMap(partLines)];
}

export function buildLines(g: Guide): Line[] {
  const lines: Line[] = [para('Lowest parts first, so the board lies flat on each part while you solder it.')];
  for (const s of g.buildOrder) {
    lines.push(line(1, 'hd', `${tick}Step ${s.step}: ${esc(s.title)} (${s.items.length})`, true));
    lines.push(para(s.note, 'sub'));
    lines.push(para(s.items.join(', ')));
  }
  return lines;
}

export function offBoardLines(g: Guide): Line[] {
  if (!g.offBoard.length) return [para('No off-board wiring.')];
  const lines: Line[] = [para('Wires from the board to the panel. Pads are named from both sides.')];
  for (const part of g.offBoard) {
    lines.push(head(`${part.ref}${part.value ? ` — ${part.value}` : ''}`));
    for (const pad of part.pads) {
      const text = `pad ${pad.pin} ${pad.hole.component} ${pad.hole.copper} net ${pad.net ?? ''} to ${pad.label ?? ''}`;
      const units = unitsFor(text, 20);
      lines.push(line(units, '', `${tick}pad <b>${esc(pad.pin)}</b> at ${both(pad.hole)}${pad.net !== undefined ? ` · net <b>${esc(pad.net)}</b>` : ' · unconnected'}${pad.label !== undefined ? ` → ${esc(pad.label)}` : ''}`));
    }
  }
  return lines;
}

function probeLine(p: ProbeItem): Line {
  const text = `${p.a.copper} ${p.a.component} ${p.b.copper} ${p.b.component} ${p.nets.join(' ')} ${p.note}`;
  const units = unitsFor(text, 30);
  return line(units, '', `${tick}${copperFirst(p.a)} ↔ ${copperFirst(p.b)} · ${esc(p.nets.join(' / '))} <span class="alt">${esc(p.note)}</span>`);
}

export function probeLines(g: Guide): Line[] {
  const lines: Line[] = [para('Meter on continuity (beep), board unpowered and ICs out of their sockets. Probe on the copper side; holes are named as seen from there.')];
  lines.push(head(`Must beep (${g.probes.beep.length})`));
  if (!g.probes.beep.length) lines.push(para('Nothing to check: every net lies on one piece of copper.'));
  for (const p of g.probes.beep) lines.push(probeLine(p));
  lines.push(head(`Must stay silent (${g.probes.silent.length})`));
  if (!g.probes.silent.length) lines.push(para('Nothing to check.'));
  for (const p of g.probes.silent) lines.push(probeLine(p));
  return lines;
}
