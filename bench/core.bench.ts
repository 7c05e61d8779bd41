/**
 * `npm run bench`: core speed figures. Each part lives in its own file under bench/core/
 * and exports `run(): Promise<void>` printing its own lines; this runner calls them in
 * name order so the figures come out in one report.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const dir = join(dirname(fileURLToPath(import.meta.url)), 'core');
const files = readdirSync(dir).filter((f) => f.endsWith('.ts')).sort();
console.log(`kerfline bench (node ${process.version}, ${files.length} parts)`);
for (const f of files) {
  const mod = (await import(join(dir, f))) as { run: () => Promise<void> };
  await mod.run();
}
