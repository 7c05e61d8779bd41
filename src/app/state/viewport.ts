/**
 * Board view geometry: screen = world × scale + offset. World units are whatever the scene
 * is drawn in; the view never needs to know.
 *
 * - `fitView(box, width, height, margin = 24)` → View showing the whole box, centred.
 * - `zoomAt(view, factor, [sx, sy])` scales about a screen point, which stays over the same
 *   world point; the scale is kept within the view's [minScale, maxScale].
 * - `panBy(view, dx, dy)`, `toWorld(view, [sx, sy])`, `toScreen(view, [wx, wy])`.
 * - `centreOn(view, [wx, wy], width, height, atLeast?)` puts a world point in the middle,
 *   zooming in to `atLeast` when the view is further out than that.
 * - `frameFinding(view, fitted, points, pad, width, height)` shows a set of world points
 *   with `pad` around them: zoomed to fit them, but never further out than the fitted
 *   whole-board view nor further in than FINDING_ZOOM times it.
 */
export interface View {
  scale: number;
  x: number;
  y: number;
  minScale: number;
  maxScale: number;
}

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Zoom limits relative to the fitted scale: a fifth of it out, forty times in. */
const ZOOM_OUT = 0.2;
const ZOOM_IN = 40;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

export function fitView(box: Box, width: number, height: number, margin = 24): View {
  const w = Math.max(1, width - 2 * margin);
  const h = Math.max(1, height - 2 * margin);
  const scale = Math.max(1e-6, Math.min(w / Math.max(box.width, 1e-6), h / Math.max(box.height, 1e-6)));
  return {
    scale,
    x: (width - box.width * scale) / 2 - box.x * scale,
    y: (height - box.height * scale) / 2 - box.y * scale,
    minScale: scale * ZOOM_OUT,
    maxScale: scale * ZOOM_IN,
  };
}

export function toWorld(v: View, p: readonly [number, number]): [number, number] {
  return [(p[0] - v.x) / v.scale, (p[1] - v.y) / v.scale];
}

export function toScreen(v: View, p: readonly [number, number]): [number, number] {
  return [p[0] * v.scale + v.x, p[1] * v.scale + v.y];
}

export function zoomAt(v: View, factor: number, at: readonly [number, number]): View {
  const scale = clamp(v.scale * factor, v.minScale, v.maxScale);
  const [wx, wy] = toWorld(v, at);
  return { ...v, scale, x: at[0] - wx * scale, y: at[1] - wy * scale };
}

export function panBy(v: View, dx: number, dy: number): View {
  return { ...v, x: v.x + dx, y: v.y + dy };
}

export function centreOn(v: View, p: readonly [number, number], width: number, height: number, atLeast = v.scale): View {
  const scale = clamp(Math.max(v.scale, atLeast), v.minScale, v.maxScale);
  return { ...v, scale, x: width / 2 - p[0] * scale, y: height / 2 - p[1] * scale };
}

/** The svg transform attribute for a view. */
export function viewTransform(v: View): string {
  return `translate(${v.x} ${v.y}) scale(${v.scale})`;
}

/** How far in a located finding may be shown, relative to the whole-board view. */
export const FINDING_ZOOM = 2.5;

export function frameFinding(v: View, fitted: View, points: readonly (readonly [number, number])[], pad: number, width: number, height: number): View {
  if (points.length === 0) return v;
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const box = { x: Math.min(...xs) - pad, y: Math.min(...ys) - pad, width: Math.max(...xs) - Math.min(...xs) + 2 * pad, height: Math.max(...ys) - Math.min(...ys) + 2 * pad };
  const want = fitView(box, width, height, 0).scale;
  const scale = clamp(want, fitted.scale, fitted.scale * FINDING_ZOOM);
  const centre: [number, number] = [box.x + box.width / 2, box.y + box.height / 2];
  return { ...v, scale, x: width / 2 - centre[0] * scale, y: height / 2 - centre[1] * scale };
}
