/**
 * `paintScene(scene, theme = THEME): SvgNode` — the one place that decides how a Scene
 * looks: a plain tree of SVG element names, attributes and text, in drawing order (board,
 * copper, holes and joints, cuts, wires, links, parts, insulated links (sleeved, over the
 * parts), labels, highlights, faults). Both
 * back ends walk this tree: drawSvg builds svg.js nodes from it and svgMarkup writes an
 * escaped string, so the app, the CLI and the printed guide show the same picture.
 * Text stays text (never markup); ids, refs, nets and holes ride along as data-* attributes.
 */
import { round } from './frame.ts';
import type { Scene, SceneCopper, SceneCut, ScenePart, SceneSegment, SceneShape, SceneText } from './scene.ts';
import { THEME, type SideStyle, type Theme } from './theme.ts';

export interface SvgNode {
  tag: string;
  attrs: Record<string, string | number>;
  text?: string;
  children?: SvgNode[];
}

const n = (tag: string, attrs: SvgNode['attrs'], children?: SvgNode[]): SvgNode => (children ? { tag, attrs, children } : { tag, attrs });
const group = (cls: string, children: SvgNode[], attrs: SvgNode['attrs'] = {}): SvgNode => n('g', { class: cls, ...attrs }, children);
const pts = (p: [number, number][]) => p.map(([x, y]) => `${x},${y}`).join(' ');

function text(t: SceneText, fill: string, font: string, extra: SvgNode['attrs'] = {}): SvgNode {
  const attrs: SvgNode['attrs'] = { x: t.x, y: t.y, 'font-size': t.size, 'font-family': font, 'text-anchor': 'middle', 'dominant-baseline': 'central', fill, ...extra };
  if (t.rotate) attrs.transform = `rotate(${t.rotate} ${t.x} ${t.y})`;
  return { tag: 'text', attrs, text: t.text };
}

/** TO-92 body: a circle with a flat chord at 0.55 r (check-values §4: 3.56 mm flat-to-back on a 4.6 mm body). */
function deePath(cx: number, cy: number, r: number, flat: 'down' | 'up' | 'left' | 'right'): string {
  const f = { down: [0, 1], up: [0, -1], left: [-1, 0], right: [1, 0] }[flat] as [number, number];
  const d = 0.55 * r;
  const h = Math.sqrt(r * r - d * d);
  const p = [-f[1], f[0]];
  const x1 = round(cx + f[0] * d + p[0]! * h);
  const y1 = round(cy + f[1] * d + p[1]! * h);
  const x2 = round(cx + f[0] * d - p[0]! * h);
  const y2 = round(cy + f[1] * d - p[1]! * h);
  return `M${x1} ${y1} A${r} ${r} 0 1 1 ${x2} ${y2} Z`;
}

function shape(s: SceneShape, style: SvgNode['attrs']): SvgNode {
  switch (s.shape) {
    case 'rect':
      return n('rect', { x: s.x, y: s.y, width: s.w, height: s.h, rx: round(Math.min(s.w, s.h) * 0.2), ...style });
    case 'circle':
      return n('circle', { cx: s.cx, cy: s.cy, r: s.r, ...style });
    case 'line':
      return n('line', { x1: s.x1, y1: s.y1, x2: s.x2, y2: s.y2, ...style, fill: 'none' });
    case 'dee':
      return n('path', { d: deePath(s.cx, s.cy, s.r, s.flat), ...style });
  }
}

function copperNode(c: SceneCopper, scene: Scene, st: SideStyle): SvgNode {
  const data = { 'data-id': c.id, ...(c.net !== undefined ? { 'data-net': c.net } : {}) };
  if (c.points.length === 1) {
    const [x, y] = c.points[0]!;
    return n('circle', { cx: x, cy: y, r: scene.sizes.padR, fill: st.copper, ...data });
  }
  return n('polyline', { points: pts(c.points), fill: 'none', stroke: st.copper, 'stroke-width': scene.sizes.stripWidth, 'stroke-linecap': 'round', 'stroke-linejoin': 'round', ...data });
}

function cutNode(c: SceneCut, scene: Scene, st: SideStyle, theme: Theme): SvgNode {
  const data = { 'data-id': c.id, 'data-cut': c.label };
  if (c.style === 'drilled')
    return group('cut', [
      n('circle', { cx: c.x, cy: c.y, r: c.r, fill: st.board, stroke: st.cut, 'stroke-width': theme.stroke.cut }),
      n('circle', { cx: c.x, cy: c.y, r: scene.sizes.holeR, fill: st.hole }),
    ], data);
  return group('cut', [
    n('line', { x1: c.x1, y1: c.y1, x2: c.x2, y2: c.y2, stroke: st.board, 'stroke-width': theme.stroke.cut * 2 }),
    n('line', { x1: c.x1, y1: c.y1, x2: c.x2, y2: c.y2, stroke: st.cut, 'stroke-width': theme.stroke.cut }),
  ], data);
}

function segmentNode(s: SceneSegment, colour: string, width: number, opacity: number, dash: string | undefined, endR: number, sleeve?: { colour: string; width: number }): SvgNode {
  const line: SvgNode['attrs'] = { x1: s.x1, y1: s.y1, x2: s.x2, y2: s.y2, stroke: colour, 'stroke-width': width, 'stroke-linecap': 'round' };
  if (dash) line['stroke-dasharray'] = dash;
  const attrs: SvgNode['attrs'] = { 'data-id': s.id, opacity };
  if (s.net !== undefined) attrs['data-net'] = s.net;
  const kids = [n('line', line), n('circle', { cx: s.x1, cy: s.y1, r: endR, fill: colour }), n('circle', { cx: s.x2, cy: s.y2, r: endR, fill: colour })];
  // Insulated wire: the sleeve under the conductor.
  if (s.insulated && sleeve) {
    attrs['data-insulated'] = 'true';
    kids.unshift(n('line', { x1: s.x1, y1: s.y1, x2: s.x2, y2: s.y2, stroke: sleeve.colour, 'stroke-width': sleeve.width, 'stroke-linecap': 'round' }));
  }
  return group(s.id.split(':')[0]!, kids, attrs);
}

function partNode(p: ScenePart, scene: Scene, st: SideStyle, theme: Theme): SvgNode {
  const body: SvgNode['attrs'] = { fill: st.bodyFill, stroke: p.broken ? theme.fault : st.bodyStroke, 'stroke-width': theme.stroke.body };
  if (st.bodyDash || p.broken) body['stroke-dasharray'] = st.bodyDash ?? '0.6 0.4';
  const kids: SvgNode[] = [{ tag: 'title', attrs: {}, text: p.value ? `${p.ref} ${p.value}` : p.ref }];
  for (const s of p.shapes) kids.push(shape(s, s.shape === 'line' ? { stroke: st.lead, 'stroke-width': theme.stroke.body * 1.5 } : body));
  if (!st.joints)
    for (const pin of p.pins) kids.push(n('circle', { cx: pin.x, cy: pin.y, r: round(scene.sizes.leadR * 0.6), fill: st.lead, 'data-pin': pin.pin, ...(pin.net !== undefined ? { 'data-net': pin.net } : {}) }));
  if (st.details) {
    for (const m of p.marks) {
      if (m.mark === 'pin1') kids.push(n('circle', { cx: m.cx, cy: m.cy, r: m.r, fill: st.text }));
      else if (m.mark === 'plus') kids.push(text({ x: m.x, y: m.y, text: '+', size: m.size, rotate: 0 }, st.text, theme.font, { 'font-weight': 'bold' }));
      else kids.push(n('line', { x1: m.x1, y1: m.y1, x2: m.x2, y2: m.y2, stroke: st.text, 'stroke-width': theme.stroke.band }));
    }
    for (const pin of p.pins) if (pin.tag) kids.push(text(pin.tag, st.text, theme.font));
    if (p.valueText) kids.push(text(p.valueText, st.text, theme.font));
  }
  kids.push(text(p.refText, st.text, theme.font, { 'font-weight': 'bold', ...(st.details ? {} : { opacity: 0.55 }) }));
  return group('part', kids, { 'data-id': p.id, 'data-ref': p.ref });
}

export function paintScene(scene: Scene, theme: Theme = THEME): SvgNode {
  const st = theme[scene.side];
  const sz = scene.sizes;
  const board = n('rect', { x: 0, y: 0, width: scene.board.width, height: scene.board.height, rx: round(sz.holeR), fill: st.board, stroke: st.boardEdge, 'stroke-width': theme.stroke.edge });
  const copper = group('copper', scene.copper.map((c) => copperNode(c, scene, st)), { opacity: st.copperOpacity });
  const holes = group('holes', scene.holes.map((h) => n('circle', { cx: h.x, cy: h.y, r: sz.holeR, fill: st.hole, 'data-id': h.id, 'data-hole': h.label })));
  const joints = st.joints
    ? group('joints', scene.holes.filter((h) => h.lead).map((h) => n('circle', { cx: h.x, cy: h.y, r: sz.leadR, fill: st.joint, stroke: st.jointEdge, 'stroke-width': 0.12 })))
    : group('joints', []);
  const cuts = group('cuts', scene.cuts.map((c) => cutNode(c, scene, st, theme)));
  const wires = group('wires', scene.wires.map((w) => segmentNode(w, st.wire, theme.stroke.wire, st.wireOpacity, st.wireDash, theme.stroke.wire * 0.8)));
  const linkNode = (l: SceneSegment) => segmentNode(l, st.link, theme.stroke.link, st.linkOpacity, st.linkDash, theme.stroke.link * 0.8, { colour: st.sleeve, width: theme.stroke.sleeve });
  const links = group('links', scene.links.filter((l) => !l.insulated).map(linkNode));
  // Insulated wire is fitted after the parts and lies over them: drawn above them.
  const sleeved = group('insulated-links', scene.links.filter((l) => l.insulated).map(linkNode));
  const partsLayer = group('parts', scene.parts.map((p) => partNode(p, scene, st, theme)), { opacity: st.bodyOpacity });
  const rulers = group('rulers', scene.rulers.map((r) => text({ x: r.x, y: r.y, text: r.text, size: r.size, rotate: 0 }, st.ruler, theme.font, { 'data-id': r.id })));

  const hl: SvgNode[] = [];
  const hs = { fill: 'none', stroke: theme.highlight, 'stroke-width': theme.stroke.highlight };
  for (const c of scene.copper) if (c.highlight) hl.push(c.points.length === 1 ? n('circle', { cx: c.points[0]![0], cy: c.points[0]![1], r: sz.padR, ...hs }) : n('polyline', { points: pts(c.points), ...hs, 'stroke-width': sz.stripWidth * 0.35, 'stroke-linecap': 'round', opacity: 0.6 }));
  for (const h of scene.holes) if (h.highlight) hl.push(n('circle', { cx: h.x, cy: h.y, r: round(sz.holeR + 0.15), ...hs, 'stroke-width': theme.stroke.highlight * 0.6 }));
  for (const s of [...scene.links, ...scene.wires]) if (s.highlight) hl.push(n('line', { x1: s.x1, y1: s.y1, x2: s.x2, y2: s.y2, ...hs, 'stroke-width': theme.stroke.link * 0.5 }));

  const faults: SvgNode[] = [];
  for (const f of scene.faults)
    faults.push(group('fault', [{ tag: 'title', attrs: {}, text: f.message }, ...f.points.map(([x, y]) => n('circle', { cx: x, cy: y, r: round(sz.padR + 0.3), fill: 'none', stroke: theme.fault, 'stroke-width': theme.stroke.fault }))], { 'data-id': f.id, 'data-code': f.code }));
  for (const p of scene.parts) if (p.fault) faults.push(n('rect', { x: p.box.x, y: p.box.y, width: p.box.w, height: p.box.h, fill: 'none', stroke: theme.fault, 'stroke-width': theme.stroke.fault, 'stroke-dasharray': '0.8 0.5', 'data-ref': p.ref }));

  const layers =
    scene.side === 'copper'
      ? [board, copper, holes, joints, cuts, wires, links, partsLayer, sleeved, rulers]
      : [board, copper, holes, cuts, wires, links, partsLayer, sleeved, rulers];
  const title: SvgNode[] = scene.title ? [{ tag: 'title', attrs: {}, text: scene.title }] : [];
  return group('kerfline-scene', [...title, ...layers, group('highlight', hl), group('faults', faults)], { 'data-side': scene.side });
}
