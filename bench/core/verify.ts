/**
 * Verifier speed (`npm run bench`). Planted strip boards (src/lib/verify/planted.ts: parts
 * tiled on the board, scored cuts and links from a seeded generator) measure:
 * - full verification of a 300-part layout, from the documents alone (goal < 10 ms);
 * - incremental re-verification after one part moves one column, at 100 parts (goal < 2 ms).
 * Prints median wall-clock time, median process CPU time (less disturbed by other work on
 * the machine) and the ratio of the median to the goal (below 1 meets it).
 */
import { plantLayout, seededRandom, shiftPart } from '../../src/lib/verify/planted.ts';
import { createVerifier, verifyLayout } from '../../src/lib/verify/index.ts';

const FULL_GOAL_MS = 10;
const RECHECK_GOAL_MS = 2;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Wall and CPU milliseconds of each call. */
function sample(n: number, f: (i: number) => void): { wall: number[]; cpu: number[] } {
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < n; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    f(i);
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall, cpu };
}

function line(what: string, s: { wall: number[]; cpu: number[] }, goal: number): string {
  const w = median(s.wall);
  const c = median(s.cpu);
  return `  ${what}: median ${w.toFixed(2)} ms wall, ${c.toFixed(2)} ms cpu; goal < ${goal} ms, ratio ${(w / goal).toFixed(2)} (cpu ${(c / goal).toFixed(2)})`;
}

export async function run(): Promise<void> {
  console.log('verify');
  const big = plantLayout({ parts: 300, seed: 1 });
  const check = verifyLayout(big.circuit, big.layout);
  if (!check.clean) throw new Error(`planted 300-part layout should verify clean: ${check.faults[0]?.message}`);
  const { cols, rows } = big.layout.board;
  sample(30, () => verifyLayout(big.circuit, big.layout));
  const full = sample(61, () => verifyLayout(big.circuit, big.layout));
  console.log(`  board ${cols}×${rows} strip, ${big.layout.parts.length} parts, ${big.layout.cuts.length} cuts, ${big.layout.links.length} links`);
  console.log(line('full check, 300 parts', full, FULL_GOAL_MS));

  const mid = plantLayout({ parts: 100, seed: 2 });
  const v = createVerifier(mid.circuit);
  v.check(mid.layout);
  const rnd = seededRandom(3);
  const moves = Array.from({ length: 200 }, () => Math.floor(rnd() * mid.layout.parts.length));
  // drag one part a column right, then back: every call is a one-part recheck
  const step = (i: number) => {
    const k = moves[i % moves.length]!;
    const ref = mid.layout.parts[k]!.ref;
    v.recheck(i % 2 === 0 ? shiftPart(mid.layout, k, 1, 0) : mid.layout, [ref]);
  };
  sample(60, step);
  const re = sample(201, step);
  console.log(line('recheck after one move, 100 parts', re, RECHECK_GOAL_MS));
  const fullMid = sample(31, () => verifyLayout(mid.circuit, mid.layout));
  console.log(`  (full check at 100 parts: median ${median(fullMid.wall).toFixed(2)} ms wall; recheck is ${(median(fullMid.wall) / median(re.wall)).toFixed(0)}× faster)`);
}
