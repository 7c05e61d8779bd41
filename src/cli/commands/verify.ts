/**
 * `kerfline verify <circuit> <layout> [--json] [--overrides answers.json]`
 *
 * Checks a layout document against a circuit (a JSON circuit document or a SPICE deck, see
 * ../io.ts) with the verifier (src/lib/verify), which reads nothing but the two documents.
 * Plain output: one block per fault — what is wrong, where (holes from the component side
 * and the copper side), how to fix it — then the warnings, then a one-line verdict.
 *
 * `--json` prints one object on stdout:
 *   { "clean": boolean,            // true when there are no faults
 *     "faults":   Problem[],       // severity "error"
 *     "warnings": Problem[] }      // severity "warning" or "note"
 * where a Problem is { code, severity, path, message, hint?, refs?, nets?, holes?, pins?,
 * data? }: `code` is stable (verify.open, verify.short, …, see src/lib/verify/verify.ts),
 * `path` points into the layout (parts[2].pins[0].at, links[3], cuts[1]) or the circuit
 * (nets.GND, parts[4]), `holes` are 0-based [col, row] from the component side. When an input
 * cannot be read the object is { "clean": false, "faults": [], "warnings": [], "errors":
 * Problem[] } with the schema paths of what is wrong.
 *
 * Exit: 0 clean (warnings allowed), 1 faults, 2 unreadable input or a usage error.
 */
import { holeLabelBoth } from '../../lib/board/index.ts';
import { formatPath, type Problem } from '../../lib/model/index.ts';
import type { SpiceOverride } from '../../lib/netlist/index.ts';
import { verifyLayout } from '../../lib/verify/index.ts';
import { readArgs } from '../args.ts';
import { loadCircuit, loadLayout, loadOverrides } from '../io.ts';

const USAGE = 'usage: kerfline verify <circuit.json|netlist.cir> <layout.json> [--json] [--overrides answers.json]\n';

/** Most holes listed under one fault in plain output (the JSON has them all). */
const MAX_HOLES = 12;

interface Out {
  write(s: string): unknown;
}

interface Args {
  circuit?: string;
  layout?: string;
  json: boolean;
  overrides?: string;
  error?: string;
}

function parseArgs(args: string[]): Args {
  const r = readArgs(args, { flags: ['--json'], options: ['--overrides'] });
  const out: Args = { json: r.flags.has('--json') };
  const overrides = r.options.get('--overrides');
  if (overrides !== undefined) out.overrides = overrides;
  if (r.files[0] !== undefined) out.circuit = r.files[0];
  if (r.files[1] !== undefined) out.layout = r.files[1];
  if (r.error) out.error = r.error;
  else if (r.files.length > 2) out.error = `too many files (${r.files[2]}): give one circuit and one layout`;
  else if (!out.circuit || !out.layout) out.error = 'name the circuit file and the layout file';
  return out;
}

/** One line of user-derived text: no line breaks or control characters reach the terminal. */
function oneLine(s: string): string {
  return s.replace(/[\u0000-\u001f\u007f-\u009f]+/g, ' ');
}

/** `file:line:column: parts[0].footprint: message (fix: hint)` — the place and the schema path. */
function unreadableLine(p: Problem, file: string): string {
  const place = p.line !== undefined ? `${file}:${p.line}:${p.column ?? 1}` : file;
  const path = p.path.length ? `${formatPath(p.path)}: ` : '';
  return `${oneLine(place)}: ${path}${oneLine(p.message)}${p.hint ? ` (fix: ${oneLine(p.hint)})` : ''}`;
}

function block(p: Problem, cols: number): string {
  const lines = [`${p.severity === 'error' ? 'FAULT' : p.severity === 'warning' ? 'warning' : 'note'} ${p.code}: ${oneLine(p.message)}`];
  if (p.holes?.length) {
    const shown = p.holes.slice(0, MAX_HOLES).map((h) => holeLabelBoth(h, cols));
    lines.push(`  where: ${shown.join(', ')}${p.holes.length > MAX_HOLES ? ` and ${p.holes.length - MAX_HOLES} more` : ''}`);
  }
  if (p.hint) lines.push(`  fix:   ${oneLine(p.hint)}`);
  return lines.join('\n');
}

export async function run(args: string[], out: Out = process.stdout, err: Out = process.stderr): Promise<number> {
  const a = parseArgs(args);
  if (a.error) {
    err.write(`kerfline verify: ${a.error}\n${USAGE}`);
    return 2;
  }
  const unreadable = (problems: Problem[], file: string): number => {
    for (const p of problems) err.write(unreadableLine(p, file) + '\n');
    if (a.json) out.write(JSON.stringify({ clean: false, faults: [], warnings: [], errors: problems }, null, 2) + '\n');
    return 2;
  };
  let overrides: Record<string, SpiceOverride> | undefined;
  if (a.overrides) {
    const o = await loadOverrides(a.overrides);
    if (!o.ok) return unreadable(o.problems, a.overrides);
    overrides = o.value;
  }
  const circuit = await loadCircuit(a.circuit!, overrides ? { overrides } : {});
  if (!circuit.ok) return unreadable(circuit.problems, a.circuit!);
  const layout = await loadLayout(a.layout!);
  if (!layout.ok) return unreadable(layout.problems, a.layout!);

  const report = verifyLayout(circuit.value.circuit, layout.value);
  if (a.json) {
    out.write(JSON.stringify(report, null, 2) + '\n');
    return report.clean ? 0 : 1;
  }
  const cols = layout.value.board.cols;
  const text: string[] = [`${oneLine(a.layout!)} against ${oneLine(a.circuit!)}`, ''];
  for (const f of report.faults) text.push(block(f, cols), '');
  for (const w of report.warnings) text.push(block(w, cols), '');
  const n = report.faults.length;
  const w = report.warnings.length;
  text.push(report.clean ? `clean: no faults (${w} warning${w === 1 ? '' : 's'} and notes)` : `${n} fault${n === 1 ? '' : 's'}, ${w} warning${w === 1 ? '' : 's'} and notes`);
  out.write(text.join('\n') + '\n');
  return report.clean ? 0 : 1;
}
