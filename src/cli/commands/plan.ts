/**
 * `kerfline plan <circuit> [--board strip:WxH|pads:WxH|bus:breadboard-N|auto] [--seed N]
 *   [--effort quick|normal|thorough] [--no-insulated] --out DIR`
 *
 * Places, routes and verifies a circuit (a JSON circuit document or a SPICE deck, see
 * ../io.ts) with planLayout (src/lib/place), checks the result once more against the
 * circuit as written, and writes DIR/<name>.layout.json (the exchange layout document,
 * with `meta` { program, seed, effort, attempt }) and DIR/<name>.svg (the component side
 * above the copper side, drawn by the renderer). <name> is the circuit file's name without
 * `.circuit.json` / its extension. Prints the board, cuts, links (and how many must be
 * insulated wire), link length, holes used and time, and the plan's warnings (each insulated
 * link) on stderr; shows a progress bar on stderr when stderr is a terminal.
 *
 * Defaults: --board auto, --seed 1, --effort normal; insulated wire links allowed as a last
 * resort (--no-insulated: bare straight links only, or no layout).
 * Exit: 0 success, 1 no routable layout (with the reason), 2 bad input or usage.
 */
import { basename, join } from 'node:path';
import { parseBoardSpec } from '../../lib/board/index.ts';
import type { Layout, PlanOptionsInput, Problem } from '../../lib/model/index.ts';
import type { Design } from '../../lib/netlist/index.ts';
import { planLayout, type PlanProgress } from '../../lib/place/index.ts';
import { drawScene, insulatedLinks } from '../../lib/render/index.ts';
import { verifyLayout } from '../../lib/verify/index.ts';
import { loadCircuit, printProblems, writeTextFile } from '../io.ts';
import { sceneToSvgString } from '../svg-node.ts';

const USAGE = 'usage: kerfline plan <circuit.json|netlist.cir> [--board strip:WxH|pads:WxH|bus:breadboard-N|auto] [--seed N] [--effort quick|normal|thorough] [--no-insulated] --out DIR\n';
const EFFORTS = ['quick', 'normal', 'thorough'] as const;

interface Args {
  circuit?: string;
  board: string;
  seed: number;
  effort: (typeof EFFORTS)[number];
  /** Insulated wire links allowed as a last resort (--no-insulated: never). */
  insulated: boolean;
  out?: string;
  error?: string;
}

export function parseArgs(args: string[]): Args {
  const out: Args = { board: 'auto', seed: 1, effort: 'normal', insulated: true };
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    const value = (): string | undefined => {
      const v = args[++i];
      if (v === undefined || v.startsWith('--')) out.error = `${a} needs a value`;
      return v;
    };
    if (a === '--board') out.board = value() ?? out.board;
    else if (a === '--seed') {
      const v = value();
      if (v !== undefined && !/^\d{1,10}$/.test(v)) out.error = `--seed takes a whole number, not "${v}"`;
      else if (v !== undefined) out.seed = Number(v) % 2 ** 31;
    } else if (a === '--effort') {
      const v = value();
      if (v !== undefined && !(EFFORTS as readonly string[]).includes(v)) out.error = `--effort is quick, normal or thorough, not "${v}"`;
      else if (v !== undefined) out.effort = v as Args['effort'];
    } else if (a === '--no-insulated') out.insulated = false;
    else if (a === '--out') out.out = value();
    else if (a.startsWith('-')) out.error = `unknown option ${a}`;
    else if (!out.circuit) out.circuit = a;
    else out.error = `too many files (${a}): give one circuit`;
  }
  if (!out.error && !out.circuit) out.error = 'name the circuit file';
  if (!out.error && !out.out) out.error = 'say where to write the layout: --out DIR';
  return out;
}

/** The summary's links line: how many, how many must be insulated wire, and their length. */
export function linksLine(layout: Layout, lengthMm: number): string {
  const insulated = insulatedLinks(layout).filter(Boolean).length;
  return `links      ${layout.links.length}${insulated ? ` (${insulated} insulated wire)` : ''}, ${lengthMm.toFixed(1)} mm in all`;
}

/** `twin-lfo.circuit.json` → `twin-lfo`; `deck.cir` → `deck`. */
export function layoutName(path: string): string {
  return basename(path).replace(/\.circuit\.json$/i, '').replace(/\.[^.]+$/, '') || 'layout';
}

/** Both sides, one above the other, in one svg whose units are millimetres. */
export function bothSidesSvg(layout: Layout, design: Design): string {
  const gap = 6;
  const parts = (['component', 'copper'] as const).map((side) => {
    const scene = drawScene(layout, design, { side });
    return { svg: sceneToSvgString(scene), w: scene.view.width, h: scene.view.height };
  });
  const width = Math.max(...parts.map((p) => p.w));
  const height = parts.reduce((a, p) => a + p.h, 0) + gap;
  let y = 0;
  const inner = parts.map((p) => {
    // Nested svgs take user units (mm here) for their place and size.
    const svg = p.svg.replace(/^<svg([^>]*?) width="[^"]*" height="[^"]*"/, `<svg$1 x="0" y="${y}" width="${p.w}" height="${p.h}"`);
    y += p.h + gap;
    return svg;
  });
  const r = (v: number) => Math.round(v * 1000) / 1000;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${r(width)}mm" height="${r(height)}mm" viewBox="0 0 ${r(width)} ${r(height)}">\n${inner.join('\n')}\n</svg>\n`;
}

interface Out {
  write(s: string): unknown;
  isTTY?: boolean;
}

function progressBar(stream: Out): (p: PlanProgress) => void {
  let last = '';
  return (p) => {
    const filled = Math.round(Math.min(1, Math.max(0, p.fraction)) * 20);
    const line = `\r${p.phase.padEnd(8)} [${'#'.repeat(filled)}${'.'.repeat(20 - filled)}] best ${p.best.toFixed(1)}`;
    if (line !== last) stream.write(line);
    last = line;
  };
}

export async function run(args: string[], out: Out = process.stdout, err: Out = process.stderr): Promise<number> {
  const a = parseArgs(args);
  if (a.error) {
    err.write(`kerfline plan: ${a.error}\n${USAGE}`);
    return 2;
  }
  const spec = parseBoardSpec(a.board);
  if (!spec.ok) {
    printProblems(spec.problems, err);
    return 2;
  }
  const loaded = await loadCircuit(a.circuit!);
  if (!loaded.ok) {
    printProblems([...loaded.problems, ...loaded.warnings], err, a.circuit);
    return 2;
  }
  printProblems(loaded.warnings.filter((w) => w.severity === 'warning'), err, a.circuit);
  const { circuit, design } = loaded.value;
  const options: PlanOptionsInput = { seed: a.seed, effort: a.effort, insulatedLinks: a.insulated };
  if (spec.value.kind === 'fixed') {
    const b = spec.value.board;
    options.board = { kind: b.kind, cols: b.cols, rows: b.rows, ...(b.pattern ? { pattern: b.pattern } : {}) };
  }
  const tty = err.isTTY === true;
  const started = performance.now();
  const planned = planLayout(design, options, tty ? { onProgress: progressBar(err) } : {}, { circuit });
  if (tty) err.write('\r\u001b[K');
  const seconds = (performance.now() - started) / 1000;
  if (!planned.ok) {
    printProblems(planned.problems, err, a.circuit);
    return planned.problems.some((p: Problem) => p.code === 'place.no-layout') ? 1 : 2;
  }
  const { layout, stats } = planned.value;
  // Belt and braces: check against the circuit as the user wrote it before writing anything.
  const report = verifyLayout(circuit, layout);
  if (!report.clean) {
    printProblems(report.faults, err, a.circuit);
    err.write('kerfline plan: the planned layout did not verify; nothing written\n');
    return 1;
  }
  const name = layoutName(a.circuit!);
  const jsonPath = join(a.out!, `${name}.layout.json`);
  const svgPath = join(a.out!, `${name}.svg`);
  // An --out that cannot be written is bad input (exit 2), not an internal error.
  for (const [path, text] of [
    [jsonPath, JSON.stringify(layout, null, 2) + '\n'],
    [svgPath, bothSidesSvg(layout, planned.value.design)],
  ] as const) {
    const written = await writeTextFile(path, text);
    if (!written.ok) {
      printProblems(written.problems, err);
      return 2;
    }
  }
  // Insulated wire links and other warnings: the builder should know before cutting wire.
  printProblems(planned.warnings.filter((w) => w.severity === 'warning'), err, a.circuit);
  const b = stats.board;
  out.write(
    [
      `board      ${b.kind} ${b.cols} × ${b.rows} holes (${(b.cols * layout.board.pitchMm).toFixed(1)} × ${(b.rows * layout.board.pitchMm).toFixed(1)} mm)`,
      `cuts       ${stats.cuts}`,
      linksLine(layout, stats.linkLengthMm),
      ...(stats.wires ? [`wires      ${stats.wires}, ${stats.wireLengthMm.toFixed(1)} mm in all`] : []),
      `holes used ${stats.holesUsed}`,
      `time       ${seconds.toFixed(2)} s (seed ${a.seed}, effort ${a.effort}, attempt ${stats.attempts})`,
      `wrote      ${jsonPath}, ${svgPath}`,
      '',
    ].join('\n'),
  );
  return 0;
}
