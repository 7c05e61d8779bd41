/**
 * `readArgs(args, { flags, options })`: the command line's one argument reader. Flags take
 * no value (`--json`); options take the next word (`--out DIR`); everything else is a file.
 * An unknown `-x` word or an option with no value becomes `error`, never a throw.
 */
export interface ReadArgs {
  files: string[];
  flags: Set<string>;
  options: Map<string, string>;
  error?: string;
}

export function readArgs(args: readonly string[], spec: { flags?: readonly string[]; options?: readonly string[] }): ReadArgs {
  const out: ReadArgs = { files: [], flags: new Set(), options: new Map() };
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    if (spec.flags?.includes(a)) out.flags.add(a);
    else if (spec.options?.includes(a)) {
      const v = args[++i];
      if (v === undefined || v.startsWith('--')) out.error ??= `${a} needs a value`;
      else out.options.set(a, v);
    } else if (a.startsWith('-') && a !== '-') out.error ??= `unknown option ${a}`;
    else out.files.push(a);
  }
  return out;
}
