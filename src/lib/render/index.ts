/**
 * Render: one side of a layout as a plain Scene (board mm), and two ways to draw it.
 *
 * - `drawScene(layout, design | undefined, { side, highlightNet?, faults? }): Scene`
 * - `drawSvg(scene, container, theme?)` draws with @svgdotjs/svg.js (browser, or Node via
 *   src/cli/svg-node.ts); `sceneSvgMarkup(scene, { scale? })` writes an escaped SVG string
 *   with no DOM at all (the printed guide). Both walk `paintScene`, so they match.
 * - `THEME` holds every colour and line weight.
 * - `insulatedLinks(layout): boolean[]` — which links must be insulated wire, read off the
 *   geometry, and `insulatedNotes(layout)` a warning for each; `lineHoles(from, to)` — the
 *   holes a straight run passes over.
 */
export { drawScene } from './draw-scene.ts';
export type { DrawOptions } from './draw-scene.ts';
export { drawSvg } from './draw-svg.ts';
export { paintScene } from './paint.ts';
export type { SvgNode } from './paint.ts';
export { svgMarkup, sceneSvgMarkup, escapeXml } from './markup.ts';
export type { MarkupOptions } from './markup.ts';
export { THEME } from './theme.ts';
export { insulatedLinks, insulatedNotes, lineHoles } from './insulated.ts';
export type { Theme, SideStyle } from './theme.ts';
export type {
  Scene,
  SceneSide,
  SceneHole,
  SceneCopper,
  SceneCut,
  SceneSegment,
  ScenePart,
  ScenePin,
  SceneShape,
  SceneMark,
  SceneText,
  SceneRuler,
  SceneFault,
  SceneSizes,
  Point,
} from './scene.ts';
