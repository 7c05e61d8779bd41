/**
 * `sceneToSvgString(scene, opts?: { scale?: number }): string` — the Node adapter for the
 * renderer: svgdom provides the window, svg.js draws the Scene through the same drawSvg the
 * app uses, and the result is serialised. The svg's width and height are in mm (true scale
 * by default) so the file prints at board size.
 */
import { createSVGWindow } from 'svgdom';
import { SVG, registerWindow } from '@svgdotjs/svg.js';
import { drawSvg, type Scene } from '../lib/render/index.ts';

let registered = false;

export function sceneToSvgString(scene: Scene, opts: { scale?: number } = {}): string {
  if (!registered) {
    const window = createSVGWindow();
    registerWindow(window, window.document);
    registered = true;
  }
  const root = SVG();
  // svg.js sets a plain `xmlns` attribute that svgdom refuses to serialise; the element's
  // namespace already puts xmlns on the output.
  root.node.removeAttribute('xmlns');
  const scale = opts.scale ?? 1;
  const v = scene.view;
  root.attr({ width: `${round(v.width * scale)}mm`, height: `${round(v.height * scale)}mm`, 'data-side': scene.side });
  drawSvg(scene, root);
  return root.svg();
}

function round(v: number): number {
  return Math.round(v * 1000) / 1000;
}
