/**
 * `svgMarkup(node): string` and `sceneSvgMarkup(scene, opts?): string` — the pure string
 * back end (for the printed guide, in the browser as well as in Node). Every attribute
 * value and every text is escaped; attribute names come from paint.ts and are checked.
 *
 * `sceneSvgMarkup` options: `scale` (paper mm per board mm, default 1 = true scale: the
 * svg's width and height are given in mm and its viewBox is in board mm), `theme`.
 */
import { paintScene, type SvgNode } from './paint.ts';
import { round } from './frame.ts';
import type { Scene } from './scene.ts';
import { THEME, type Theme } from './theme.ts';

const ESC: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escape text for XML/HTML text and double-quoted attribute values. */
export function escapeXml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ESC[c]!);
}

const NAME = /^[a-zA-Z][a-zA-Z0-9:_-]*$/;

export function svgMarkup(node: SvgNode): string {
  if (!NAME.test(node.tag)) throw new Error(`svgMarkup: bad element name ${node.tag}`);
  let out = `<${node.tag}`;
  for (const [k, v] of Object.entries(node.attrs)) {
    if (!NAME.test(k)) throw new Error(`svgMarkup: bad attribute name ${k}`);
    out += ` ${k}="${escapeXml(String(v))}"`;
  }
  const inner = (node.text !== undefined ? escapeXml(node.text) : '') + (node.children ?? []).map(svgMarkup).join('');
  return `${out}>${inner}</${node.tag}>`;
}

export interface MarkupOptions {
  scale?: number;
  theme?: Theme;
}

export function sceneSvgMarkup(scene: Scene, opts: MarkupOptions = {}): string {
  const scale = opts.scale ?? 1;
  const v = scene.view;
  const root: SvgNode = {
    tag: 'svg',
    attrs: {
      xmlns: 'http://www.w3.org/2000/svg',
      viewBox: `${v.x} ${v.y} ${v.width} ${v.height}`,
      width: `${round(v.width * scale)}mm`,
      height: `${round(v.height * scale)}mm`,
      'data-side': scene.side,
    },
    children: [paintScene(scene, opts.theme ?? THEME)],
  };
  return svgMarkup(root);
}
