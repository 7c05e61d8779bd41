/** `kerfline footprints`: list the footprint library with spans and height classes. */
import { getFootprint, footprintNames } from '../../lib/parts/index.ts';

export async function run(_args: string[]): Promise<number> {
  const lines: string[] = [];
  for (const name of footprintNames()) {
    const sample = name.replace('<order>', 'EBC').replace('<n>', '3');
    const fp = getFootprint(sample, ['1', '2']);
    if (!fp) continue;
    const span = fp.span ? `  span ${fp.span.min}–${fp.span.max} holes (usually ${fp.span.preferred})` : '';
    lines.push(`${name.padEnd(18)} ${fp.title}; height: ${fp.height}${span}`);
  }
  process.stdout.write(lines.join('\n') + '\n');
  return 0;
}
