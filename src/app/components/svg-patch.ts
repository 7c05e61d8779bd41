/**
 * Redrawing the board without rebuilding it. The render module paints a Scene as a plain
 * tree (paintScene); the first picture is drawn by drawSvg, later ones are patched in place:
 * `patchDrawing(drawn, next)` compares the new tree with the one on screen and touches only
 * what differs, so moving one part or lighting one net changes a few dozen elements rather
 * than re-creating ten thousand (a 100-part board: about 60 ms of svg.js work plus the
 * browser's restyle of every element, per redraw).
 *
 * - `adoptDrawing(el, tree)` → Drawn: pair a tree with the DOM drawSvg made from it.
 * - `patchDrawing(drawn, next)` → Drawn: the same element, now showing `next`.
 * Children are matched by `data-id` where the painter gives one (parts, holes, cuts, links),
 * else by position and tag. New elements are made with svg.js exactly as drawSvg makes
 * them: attributes set one by one and text as text nodes (svg.js `words`), never markup.
 */
import { SVG, type Dom } from '@svgdotjs/svg.js';
import type { SvgNode } from '../../lib/render/index.ts';

export interface Drawn {
  node: SvgNode;
  el: Element;
  kids: Drawn[];
}

export function adoptDrawing(el: Element, node: SvgNode): Drawn {
  const kids = (node.children ?? []).map((c, i) => {
    const child = el.children[i];
    if (!child) throw new Error(`adoptDrawing: <${node.tag}> has ${el.children.length} children, the tree ${node.children!.length}`);
    return adoptDrawing(child, c);
  });
  return { node, el, kids };
}

function build(parent: Dom, node: SvgNode): Drawn {
  // svg.js types say element() returns the parent; it returns the new child.
  const d = parent.element(node.tag) as unknown as Dom;
  d.attr(node.attrs);
  if (node.text !== undefined) d.words(node.text);
  return { node, el: d.node, kids: (node.children ?? []).map((c) => build(d, c)) };
}

function sameAttrs(a: SvgNode['attrs'], b: SvgNode['attrs']): boolean {
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  for (const k of ka) if (a[k] !== b[k]) return false;
  return true;
}

/** Deep equality of painted trees (cheap: a few small objects per element). */
export function sameNode(a: SvgNode, b: SvgNode): boolean {
  if (a === b) return true;
  if (a.tag !== b.tag || a.text !== b.text || !sameAttrs(a.attrs, b.attrs)) return false;
  const ca = a.children ?? [];
  const cb = b.children ?? [];
  if (ca.length !== cb.length) return false;
  for (let i = 0; i < ca.length; i++) if (!sameNode(ca[i]!, cb[i]!)) return false;
  return true;
}

function keyOf(n: SvgNode, i: number): string {
  const id = n.attrs['data-id'];
  return id !== undefined ? `id:${n.tag}:${String(id)}` : `at:${n.tag}:${i}`;
}

/** Keys for a child list; a repeated id gets its occurrence number, so none is lost. */
function keysOf(list: readonly SvgNode[]): string[] {
  const seen = new Map<string, number>();
  return list.map((n, i) => {
    const k = keyOf(n, i);
    const c = seen.get(k) ?? 0;
    seen.set(k, c + 1);
    return c ? `${k}#${c}` : k;
  });
}

export function patchDrawing(drawn: Drawn, next: SvgNode): Drawn {
  if (sameNode(drawn.node, next)) return { ...drawn, node: next };
  const el = drawn.el;
  const d = SVG(el) as unknown as Dom;
  if (!sameAttrs(drawn.node.attrs, next.attrs)) {
    for (const k of Object.keys(drawn.node.attrs)) if (!(k in next.attrs)) el.removeAttribute(k);
    d.attr(next.attrs);
  }
  if (drawn.node.text !== next.text) {
    // Only leaves (text, title) carry `text`; their one child is the text node.
    while (el.firstChild) el.removeChild(el.firstChild);
    if (next.text !== undefined) d.words(next.text);
  }
  const old = new Map<string, Drawn>();
  const oldKeys = keysOf(drawn.kids.map((k) => k.node));
  drawn.kids.forEach((k, i) => old.set(oldKeys[i]!, k));
  const nextKids = next.children ?? [];
  const nextKeys = keysOf(nextKids);
  const kids = nextKids.map((c, i) => {
    const key = nextKeys[i]!;
    const prev = old.get(key);
    if (prev) {
      old.delete(key);
      return patchDrawing(prev, c);
    }
    return build(d, c);
  });
  for (const gone of old.values()) el.removeChild(gone.el);
  // Put the element children in the tree's order (moves only what is out of place).
  kids.forEach((k, i) => {
    const at = el.children[i];
    if (at !== k.el) el.insertBefore(k.el, at ?? null);
  });
  return { node: next, el, kids };
}
