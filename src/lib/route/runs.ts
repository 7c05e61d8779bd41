/**
 * `wireRuns(st): { from: number; to: number; net: number }[]` — copper-side wire steps
 * (neighbouring holes) merged into maximal straight runs, row runs first, then column runs,
 * each in board order. Steps of one net that meet end to end in a line become one run.
 */
import type { RouteState } from './state.ts';

export interface Run {
  from: number;
  to: number;
  net: number;
}

export function wireRuns(st: RouteState): Run[] {
  const { cols, rows, holes } = st.copper;
  // Per hole: net + 1 of a step to the right (across) and downwards (down); 0 for none.
  const across = new Int32Array(holes);
  const down = new Int32Array(holes);
  const w = st.wires;
  for (let i = 0; i < w.length; i += 3) {
    const a = Math.min(w[i]!, w[i + 1]!);
    const b = Math.max(w[i]!, w[i + 1]!);
    if (b - a === 1) across[a] = w[i + 2]! + 1;
    else if (b - a === cols) down[a] = w[i + 2]! + 1;
    else throw new Error(`route: wire step ${a}→${b} joins holes that are not neighbours`);
  }
  const out: Run[] = [];
  for (let y = 0; y < rows; y++)
    for (let x = 0; x < cols; ) {
      const h = x + y * cols;
      const n = across[h]!;
      if (!n) {
        x++;
        continue;
      }
      let e = x;
      while (e < cols - 1 && across[e + y * cols] === n) e++;
      out.push({ from: h, to: e + y * cols, net: n - 1 });
      x = e;
    }
  for (let x = 0; x < cols; x++)
    for (let y = 0; y < rows; ) {
      const h = x + y * cols;
      const n = down[h]!;
      if (!n) {
        y++;
        continue;
      }
      let e = y;
      while (e < rows - 1 && down[x + e * cols] === n) e++;
      out.push({ from: h, to: x + e * cols, net: n - 1 });
      y = e;
    }
  return out;
}
