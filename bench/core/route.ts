/**
 * Router speed (`npm run bench`): a 300-part placement on a 100 × 80 strip board (parts
 * standing across the strips, DIPs straddling them; the netlist is planted — read off random
 * cuts and links — so the placement is known to be routable; src/lib/route/testing/planted.ts).
 * Two nets mixes: many small nets (few links), and fewer larger nets (links are most of the
 * work). Goal: median routing time under 20 ms. Prints the median wall-clock time, the median
 * process CPU time (less disturbed by other work on the machine), the ratio of the median to
 * the goal (below 1 meets it), and what the router made. A last figure routes the large demo.
 */
import { readFileSync } from 'node:fs';
import { makeBoard } from '../../src/lib/board/index.ts';
import { LayoutSchema } from '../../src/lib/model/index.ts';
import { parseCircuitText } from '../../src/lib/netlist/index.ts';
import { routeLayout } from '../../src/lib/route/index.ts';
import { plantedCase } from '../../src/lib/route/testing/planted.ts';

const GOAL_MS = 20;
const RUNS = 41;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function sample(n: number, f: () => void): { wall: number; cpu: number } {
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < n; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    f();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

/** Route one planted placement many times and print the figures. */
function measure(label: string, c: ReturnType<typeof plantedCase>): void {
  const first = routeLayout(c.design, c.placement);
  if (!first.ok) throw new Error(`bench placement did not route: ${first.problems[0]?.message}`);
  for (let i = 0; i < 5; i++) routeLayout(c.design, c.placement); // warm up
  const t = sample(RUNS, () => routeLayout(c.design, c.placement));
  const s = first.value.stats;
  console.log(`route, ${label}: ${c.placement.parts.length} parts, ${c.design.nets.length} nets on a 100×80 strip board`);
  console.log(`  median ${t.wall.toFixed(2)} ms wall, ${t.cpu.toFixed(2)} ms CPU (goal < ${GOAL_MS} ms; ratio ${(t.wall / GOAL_MS).toFixed(2)} wall, ${(t.cpu / GOAL_MS).toFixed(2)} CPU)`);
  console.log(`  made ${s.cuts} cuts and ${s.links} links (${s.linkLengthMm.toFixed(1)} mm); the planted layout has ${c.planted.cuts.length} cuts and ${c.planted.links.length} links`);
}

export async function run(): Promise<void> {
  const board = makeBoard('strip', 100, 80);
  measure('many small nets', plantedCase(2, board, 300, { acrossStrips: true }));
  measure('fewer, larger nets', plantedCase(2, board, 300, { acrossStrips: true, links: 600, cutChance: 0.4 }));

  const dir = new URL('../../layouts/', import.meta.url);
  const demo = parseCircuitText(readFileSync(new URL('four-mixer.circuit.json', dir), 'utf8'));
  if (!demo.ok) return;
  const placement = LayoutSchema.parse(JSON.parse(readFileSync(new URL('four-mixer.placement.json', dir), 'utf8')));
  const d = sample(RUNS, () => routeLayout(demo.value.design, placement));
  console.log(`route, four-mixer demo placement (${placement.parts.length} parts): median ${d.wall.toFixed(2)} ms wall, ${d.cpu.toFixed(2)} ms CPU`);
}
