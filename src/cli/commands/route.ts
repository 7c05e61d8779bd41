/**
 * `kerfline route <circuit> <layout> --out FILE [--cut hole|between|either] [--links-over-bodies]`
 *
 * Reads a circuit (JSON circuit document or SPICE deck, see ../io.ts) and a placed layout
 * (every part placed; any cuts, links and wires in it are ignored), computes the track cuts,
 * links and copper-side wires with the router (src/lib/route), checks the result from scratch
 * with the verifier, writes the resolved layout to FILE and prints a summary: cuts, links and
 * their total length, copper-side wires. `--cut` overrides the board's cutting style
 * (default: the board's, else `either`); `--links-over-bodies` lets links pass over parts.
 *
 * Exit: 0 routed and verified clean; 1 unroutable (each reason printed) or, which would be a
 * bug, a routed layout that does not verify (nothing is written then); 2 unreadable input,
 * an output file that cannot be written, or a usage error.
 */
import { CutStyleSchema, type CutStyle, type Problem } from '../../lib/model/index.ts';
import { routeLayout } from '../../lib/route/index.ts';
import { verifyLayout } from '../../lib/verify/index.ts';
import { readArgs } from '../args.ts';
import { loadCircuit, loadLayout, printProblems, writeTextFile } from '../io.ts';

const USAGE = 'usage: kerfline route <circuit.json|netlist.cir> <layout.json> --out FILE [--cut hole|between|either] [--links-over-bodies]\n';

interface Out {
  write(s: string): unknown;
}

interface Args {
  circuit?: string;
  layout?: string;
  out?: string;
  cut?: CutStyle;
  linksOverBodies: boolean;
  error?: string;
}

function parseArgs(args: string[]): Args {
  const r = readArgs(args.map((x) => (x === '-o' ? '--out' : x)), { flags: ['--links-over-bodies'], options: ['--out', '--cut'] });
  const a: Args = { linksOverBodies: r.flags.has('--links-over-bodies') };
  const out = r.options.get('--out');
  if (out !== undefined) a.out = out;
  const cut = r.options.get('--cut');
  if (cut !== undefined) {
    const v = CutStyleSchema.safeParse(cut);
    if (v.success) a.cut = v.data;
    else a.error = '--cut takes hole, between or either';
  }
  if (r.files[0] !== undefined) a.circuit = r.files[0];
  if (r.files[1] !== undefined) a.layout = r.files[1];
  if (r.error) a.error = r.error;
  else if (r.files.length > 2) a.error = `too many files (${r.files[2]}): give one circuit and one layout`;
  if (!a.error && (!a.circuit || !a.layout)) a.error = 'name the circuit file and the placed layout file';
  if (!a.error && !a.out) a.error = 'say where to write the routed layout with --out FILE';
  return a;
}

export async function run(args: string[], out: Out = process.stdout, err: Out = process.stderr): Promise<number> {
  const a = parseArgs(args);
  if (a.error) {
    err.write(`kerfline route: ${a.error}\n${USAGE}`);
    return 2;
  }
  const circuit = await loadCircuit(a.circuit!);
  if (!circuit.ok) {
    printProblems(circuit.problems, err, a.circuit);
    return 2;
  }
  const placement = await loadLayout(a.layout!);
  if (!placement.ok) {
    printProblems(placement.problems, err, a.layout);
    return 2;
  }
  const routed = routeLayout(circuit.value.design, placement.value, { ...(a.cut ? { cutStyle: a.cut } : {}), linksOverBodies: a.linksOverBodies });
  if (!routed.ok) {
    printProblems(routed.problems, err, a.layout);
    // A placement the router cannot read is bad input; one it cannot route is a result.
    const unroutable = routed.problems.every((p: Problem) => p.code === 'route.unroutable');
    err.write(unroutable ? `kerfline route: not routable as placed (${routed.problems.length} problem${routed.problems.length === 1 ? '' : 's'})\n` : '');
    return unroutable ? 1 : 2;
  }
  const { layout, stats } = routed.value;
  const report = verifyLayout(circuit.value.circuit, layout);
  if (!report.clean) {
    printProblems(report.faults, err, a.out);
    err.write('kerfline route: the routed layout does not verify; nothing written. Please report this with the input files.\n');
    return 1;
  }
  const written = await writeTextFile(a.out!, JSON.stringify(layout, null, 2) + '\n');
  if (!written.ok) {
    printProblems(written.problems, err);
    return 2;
  }
  const mm = (x: number) => `${x.toFixed(1)} mm`;
  out.write(
    [
      `routed ${a.layout} → ${a.out}`,
      `  cuts:  ${stats.cuts}`,
      `  links: ${stats.links} (total ${mm(stats.linkLengthMm)})`,
      `  wires: ${stats.wires} copper-side${stats.wires ? ` (total ${mm(stats.wireLengthMm)})` : ''}`,
      `  verified clean (${report.warnings.length} warning${report.warnings.length === 1 ? '' : 's'} and notes)`,
      '',
    ].join('\n'),
  );
  return 0;
}
