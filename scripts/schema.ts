/**
 * `npm run schema` — write the JSON Schemas of the documents that cross our boundary:
 * static/schema/circuit.schema.json, layout.schema.json, project.schema.json.
 *
 * `schemaFiles(): Record<fileName, text>` builds them in memory from the zod schemas with
 * zod 4's `z.toJSONSchema` in input form (what a writer may put in a file: defaulted
 * fields optional), so a test can compare the checked-in files with the code.
 * Outside checkers use these files; exchange.md describes the same documents in words.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { z } from 'zod';
import { CircuitSchema, LayoutSchema, ProjectSchema } from '../src/lib/model/index.ts';

export const SCHEMA_DIR = resolve(dirname(fileURLToPath(import.meta.url)), '..', 'static', 'schema');

const DOCUMENTS: { file: string; schema: z.ZodType; title: string; description: string }[] = [
  { file: 'circuit.schema.json', schema: CircuitSchema, title: 'Kerfline circuit document', description: 'A circuit netlist for the layout planner: parts with pin-to-net maps, and net roles (format kerfline.circuit, version 1).' },
  { file: 'layout.schema.json', schema: LayoutSchema, title: 'Kerfline resolved layout document', description: 'A placed and wired board: parts with pin holes, track cuts, component-side links and copper-side wires; coordinates [col, row], 0-based, seen from the component side (format kerfline.layout, version 1).' },
  { file: 'project.schema.json', schema: ProjectSchema, title: 'Kerfline project file', description: 'What the app saves: the source text, the circuit, the layout, plan options and view state (format kerfline.project, version 1).' },
];

/** Rewrite a case-insensitive regex source so it means the same without the `i` flag. */
export function foldCase(source: string): string {
  let out = '';
  for (let i = 0; i < source.length; i++) {
    const c = source[i]!;
    if (c === '\\') {
      out += source.slice(i, i + 2);
      i++;
    } else if (c === '[') {
      let j = i + 1;
      let body = '';
      let swapped = '';
      for (; j < source.length && source[j] !== ']'; j++) {
        const d = source[j]!;
        if (d === '\\') {
          body += source.slice(j, j + 2);
          j++;
        } else {
          body += d;
          swapped += /[a-z]/.test(d) ? d.toUpperCase() : /[A-Z]/.test(d) ? d.toLowerCase() : d;
        }
      }
      out += `[${body}${swapped.replace(/^\^/, '')}]`;
      i = j;
    } else if (/[A-Za-z]/.test(c)) out += `[${c.toUpperCase()}${c.toLowerCase()}]`;
    else out += c;
  }
  return out;
}

type Ctx = { zodSchema: unknown; jsonSchema: Record<string, unknown> };

/** JSON Schema patterns carry no flags: spell out case-insensitive ones. */
function keepCaseRule(ctx: Ctx): void {
  const checks = (ctx.zodSchema as { _zod?: { def?: { checks?: { _zod?: { def?: { pattern?: unknown } } }[] } } })._zod?.def?.checks ?? [];
  for (const c of checks) {
    const re = c._zod?.def?.pattern;
    if (re instanceof RegExp && re.flags.includes('i') && ctx.jsonSchema.pattern === re.source) ctx.jsonSchema.pattern = foldCase(re.source);
  }
}

export function schemaFiles(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const d of DOCUMENTS) {
    const json = z.toJSONSchema(d.schema, { io: 'input', target: 'draft-2020-12', unrepresentable: 'any', override: keepCaseRule }) as Record<string, unknown>;
    const { $schema, ...rest } = json;
    const doc = { $schema, title: d.title, description: d.description, ...rest };
    out[d.file] = JSON.stringify(doc, null, 2) + '\n';
  }
  return out;
}

function main(): void {
  mkdirSync(SCHEMA_DIR, { recursive: true });
  for (const [file, text] of Object.entries(schemaFiles())) {
    writeFileSync(join(SCHEMA_DIR, file), text, 'utf8');
    process.stdout.write(`wrote static/schema/${file}\n`);
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) main();
