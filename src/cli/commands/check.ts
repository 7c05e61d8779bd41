/**
 * `kerfline check <circuit.json | netlist.cir> [--json] [--overrides answers.json]`
 *
 * Reads a circuit (JSON document or SPICE deck, see ../io.ts) and prints its title, parts
 * (ref, kind, value, footprint), nets with their pins, op-amp packing and spares, then
 * warnings and notes. `--json` prints the same as one machine-readable object. Exit 0
 * when the circuit is readable (warnings allowed), 2 when it is not (each problem on one
 * line, `file:line:column: message (fix: hint)`, or with its JSON path) or on a usage error.
 */
import type { Problem } from '../../lib/model/index.ts';
import type { SpiceOverride } from '../../lib/netlist/index.ts';
import { readArgs } from '../args.ts';
import { loadCircuit, loadOverrides, printProblems, problemLine, type LoadedCircuit } from '../io.ts';

const USAGE = 'usage: kerfline check <circuit.json|netlist.cir> [--json] [--overrides answers.json]\n';

function parseArgs(args: string[]): { file?: string; json: boolean; overrides?: string; error?: string } {
  const r = readArgs(args, { flags: ['--json'], options: ['--overrides'] });
  const out: { file?: string; json: boolean; overrides?: string; error?: string } = { json: r.flags.has('--json') };
  const overrides = r.options.get('--overrides');
  if (overrides !== undefined) out.overrides = overrides;
  if (r.files[0] !== undefined) out.file = r.files[0];
  if (r.error) out.error = r.error;
  else if (r.files.length > 1) out.error = `one circuit at a time (got ${r.files[0]} and ${r.files[1]})`;
  else if (!out.file) out.error = 'name the circuit file to check';
  return out;
}

function pad(s: string, n: number): string {
  return s.length >= n ? `${s} ` : s.padEnd(n);
}

/** Summary object printed by --json. */
export function summary(file: string, c: LoadedCircuit): Record<string, unknown> {
  const d = c.design;
  return {
    file,
    ok: true,
    source: c.source,
    title: d.title,
    parts: d.parts.map((p) => ({ ref: p.ref, kind: p.kind, value: p.value ?? null, footprint: p.footprint, ...(p.package ? { package: p.package } : {}), ...(p.labels ? { labels: p.labels } : {}) })),
    nets: d.nets.map((n) => ({ name: n.name, ...n.info, pins: n.pins.map((p) => `${p.ref}.${p.pin}`) })),
    packing: d.packing ?? {},
    spares: d.spares ?? {},
    warnings: c.warnings,
    ...(c.report ? { sources: c.report.sources, skipped: c.report.skipped } : {}),
  };
}

function text(file: string, c: LoadedCircuit): string {
  const d = c.design;
  const out: string[] = [d.title, `${file} (${c.source === 'spice' ? 'SPICE netlist' : 'circuit document'})`, ''];
  out.push(`parts (${d.parts.length}):`);
  const w = Math.max(4, ...d.parts.map((p) => p.ref.length)) + 1;
  const kw = Math.max(4, ...d.parts.map((p) => p.kind.length)) + 1;
  const vw = Math.min(32, Math.max(5, ...d.parts.map((p) => (p.value ?? '').length)) + 1);
  for (const p of d.parts) out.push(`  ${pad(p.ref, w)}${pad(p.kind, kw)}${pad(p.value ?? '—', vw)}${p.footprint}`);
  out.push('', `nets (${d.nets.length}):`);
  for (const n of d.nets) {
    const role = n.info.role ? ` (${n.info.role}${n.info.volts !== undefined ? `, ${n.info.volts > 0 ? '+' : ''}${n.info.volts} V` : ''})` : '';
    out.push(`  ${n.name}${role}: ${n.pins.map((p) => `${p.ref}.${p.pin}`).join(' ')}`);
  }
  const packing = Object.entries(d.packing ?? {});
  if (packing.length) {
    out.push('', 'op-amp packing (section → package pins):');
    for (const [sec, m] of packing) out.push(`  ${sec} → ${m.part}: ${Object.entries(m.pins).map(([k, v]) => `${k}=${v}`).join(' ')}`);
  }
  const spares = Object.entries(d.spares ?? {});
  if (spares.length) {
    out.push('', 'spare sections tied off:');
    for (const [ref, pins] of spares) out.push(`  ${ref}: ${Object.entries(pins).map(([pin, net]) => `pin ${pin}→${net}`).join(', ')}`);
  }
  if (c.report?.sources.length) {
    out.push('', 'sources:');
    for (const s of c.report.sources) out.push(`  ${s.name} (line ${s.line}): ${s.use}${s.part ? ` → ${s.part}${s.pads ? ` (+ pad ${s.pads['+']}, − pad ${s.pads['-']})` : ''}` : ''}`);
  }
  const warnings = c.warnings.filter((p) => p.severity !== 'note');
  const notes = c.warnings.filter((p) => p.severity === 'note');
  if (warnings.length) out.push('', `warnings (${warnings.length}):`, ...warnings.map((p) => `  ${problemLine(p, file)}`));
  if (notes.length) out.push('', `notes (${notes.length}):`, ...notes.map((p) => `  ${problemLine(p, file)}`));
  return out.join('\n') + '\n';
}

export async function run(args: string[]): Promise<number> {
  const a = parseArgs(args);
  if (a.error || !a.file) {
    process.stderr.write(`kerfline check: ${a.error}\n${USAGE}`);
    return 2;
  }
  let overrides: Record<string, SpiceOverride> | undefined;
  if (a.overrides) {
    const o = await loadOverrides(a.overrides);
    if (!o.ok) {
      printProblems(o.problems, process.stderr, a.overrides);
      return 2;
    }
    overrides = o.value;
  }
  const r = await loadCircuit(a.file, overrides ? { overrides } : {});
  if (!r.ok) {
    if (a.json) process.stdout.write(JSON.stringify({ file: a.file, ok: false, problems: r.problems, warnings: r.warnings }, null, 2) + '\n');
    else {
      const questions = r.problems.filter((p: Problem) => p.code.startsWith('spice.ask-'));
      printProblems(r.problems, process.stderr, a.file);
      if (r.warnings.length) printProblems(r.warnings, process.stderr, a.file);
      if (questions.length) process.stderr.write(`${questions.length} question(s) to answer: add "* kerfline:" notes to the deck or pass --overrides answers.json\n`);
    }
    return 2;
  }
  // Refs, values and net names come from the file: no control character reaches the terminal.
  process.stdout.write(a.json ? JSON.stringify(summary(a.file, r.value), null, 2) + '\n' : text(a.file, r.value).replace(/[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/g, ' '));
  return 0;
}


