/**
 * `drawSvg(scene, container, theme = THEME): Dom` — draws a Scene with @svgdotjs/svg.js
 * into the given svg.js container and returns the group it made. When the container is the
 * root <svg>, its viewBox is set to the scene's view (board mm). Text goes in as text nodes
 * (svg.js `words`), never as markup. Needs a window svg.js can use: the browser's, or
 * svgdom's registered with `registerWindow` in Node (see src/cli/svg-node.ts).
 */
import type { Container, Dom } from '@svgdotjs/svg.js';
import { paintScene, type SvgNode } from './paint.ts';
import type { Scene } from './scene.ts';
import { THEME, type Theme } from './theme.ts';

function build(parent: Dom, node: SvgNode): Dom {
  // svg.js types say element() returns the parent; it returns the new child.
  const el = parent.element(node.tag) as unknown as Dom;
  el.attr(node.attrs);
  if (node.text !== undefined) el.words(node.text);
  for (const child of node.children ?? []) build(el, child);
  return el;
}

export function drawSvg(scene: Scene, container: Container, theme: Theme = THEME): Dom {
  if (container.type === 'svg') {
    const v = scene.view;
    (container as Container & { viewbox(x: number, y: number, w: number, h: number): unknown }).viewbox(v.x, v.y, v.width, v.height);
  }
  return build(container, paintScene(scene, theme));
}
