/**
 * The command line: a thin adapter. Each command lives in ./commands/<name>.ts and exports
 * `run(args): Promise<number>` returning the exit code (0 ok, 1 faults or no result,
 * 2 unreadable input). Commands never let an exception escape as a stack trace.
 */
const COMMANDS: Record<string, { summary: string; load: () => Promise<{ run: (args: string[]) => Promise<number> }> }> = {
  check: { summary: 'check <circuit.json|netlist.cir>    read a circuit, print parts, nets, packing and warnings', load: () => import('./commands/check.ts') },
  plan: { summary: 'plan <circuit> [--board …] [--seed N] [--effort …] --out DIR   place, route, verify, draw', load: () => import('./commands/plan.ts') },
  route: { summary: 'route <circuit> <layout> --out FILE   compute cuts, links and wires for a placement', load: () => import('./commands/route.ts') },
  verify: { summary: 'verify <circuit> <layout> [--json]   check a layout against the circuit', load: () => import('./commands/verify.ts') },
  guide: { summary: 'guide <circuit> <layout> --out guide.html [--pdf guide.pdf]   the bench guide', load: () => import('./commands/guide.ts') },
  footprints: { summary: 'footprints                          list the footprint library', load: () => import('./commands/footprints.ts') },
};

export function usage(): string {
  return ['kerfline — stripboard and perfboard layout planner', '', 'usage: kerfline <command> …', '', ...Object.values(COMMANDS).map((c) => `  ${c.summary}`), ''].join('\n');
}

export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(usage());
    return name ? 0 : 2;
  }
  const cmd = COMMANDS[name];
  if (!cmd) {
    process.stderr.write(`kerfline: unknown command "${name}"\n\n${usage()}`);
    return 2;
  }
  try {
    const mod = await cmd.load();
    return await mod.run(rest);
  } catch (e) {
    // A bug, not bad input: say so plainly, one line, and ask for a report.
    process.stderr.write(`kerfline: internal error in "${name}": ${e instanceof Error ? e.message : String(e)}\nPlease report this with the input files.\n`);
    return 70;
  }
}
