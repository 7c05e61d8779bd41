/**
 * The little auto-place plot: `costPath(points, width, height)` → SVG path data for the best
 * cost and the current cost, one point per progress report, in the order they came (the
 * planner's own fraction restarts when it tries a bigger board, so it cannot be the x axis).
 * y spans the lowest to the highest cost seen (flat when equal), high costs at the top.
 */
export interface CostPoint {
  fraction: number;
  best: number;
  cost: number;
}

export function costPath(points: readonly CostPoint[], width: number, height: number): { best: string; cost: string } {
  const finite = points.filter((p) => Number.isFinite(p.best) && Number.isFinite(p.cost));
  if (finite.length === 0) return { best: '', cost: '' };
  let lo = Infinity;
  let hi = -Infinity;
  for (const p of finite) {
    lo = Math.min(lo, p.best, p.cost);
    hi = Math.max(hi, p.best, p.cost);
  }
  const pad = 2;
  const y = (v: number) => (hi === lo ? height / 2 : pad + (1 - (v - lo) / (hi - lo)) * (height - 2 * pad));
  const x = (i: number) => (finite.length === 1 ? width / 2 : (i / (finite.length - 1)) * width);
  const line = (get: (p: CostPoint) => number) => finite.map((p, i) => `${i ? 'L' : 'M'}${x(i).toFixed(1)} ${y(get(p)).toFixed(1)}`).join(' ');
  return { best: line((p) => p.best), cost: line((p) => p.cost) };
}
