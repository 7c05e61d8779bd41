/**
 * The bundled demo project, opened on first visit: the twin-LFO circuit with its committed
 * planned layout, so the first paint needs no planning. While that layout is not in the
 * repository yet, a demo that has one stands in; failing that, the circuit is planned on open.
 *
 * `bundledDemo()` → DemoFiles (raw text, as committed); `demoDoc(files, options?)` →
 * { doc, problems }: the circuit read from its text and the layout when it is there and
 * valid (else `doc.layout` is undefined and `problems` says why).
 */
import { LayoutSchema, PlanOptionsSchema, parseDocument, type Problem } from '../../lib/model/index.ts';
import type { Doc } from './project-file.ts';
import { readSource } from './reading.ts';

export interface DemoFiles {
  name: string;
  circuitText: string;
  layoutText?: string;
}

/** Demo names in order of preference. */
export const DEMO_NAMES = ['twin-lfo', 'bench-buffer'] as const;

const files = import.meta.glob<string>(['../../../layouts/twin-lfo.*.json', '../../../layouts/bench-buffer.*.json'], {
  eager: true,
  query: '?raw',
  import: 'default',
});

function fileText(name: string, kind: 'circuit' | 'layout'): string | undefined {
  return files[`../../../layouts/${name}.${kind}.json`];
}

export function bundledDemo(): DemoFiles {
  // First choice: a demo whose planned layout is committed (no planning before first paint).
  for (const name of DEMO_NAMES) {
    const circuitText = fileText(name, 'circuit');
    const layoutText = fileText(name, 'layout');
    if (circuitText !== undefined && layoutText !== undefined) return { name, circuitText, layoutText };
  }
  for (const name of DEMO_NAMES) {
    const circuitText = fileText(name, 'circuit');
    if (circuitText !== undefined) return { name, circuitText };
  }
  throw new Error('no demo circuit is bundled: layouts/bench-buffer.circuit.json is missing');
}

export function demoDoc(demo: DemoFiles): { doc: Doc; problems: Problem[] } | { doc: undefined; problems: Problem[] } {
  const source = { kind: 'json' as const, text: demo.circuitText, name: `${demo.name}.circuit.json` };
  const read = readSource(source);
  if (!read.ok) return { doc: undefined, problems: read.problems };
  const doc: Doc = { source, circuit: read.value.circuit, options: PlanOptionsSchema.parse({}) };
  const problems: Problem[] = [];
  if (demo.layoutText !== undefined) {
    const layout = parseDocument(LayoutSchema, demo.layoutText, 'layout');
    if (layout.ok) doc.layout = layout.value;
    else problems.push(...layout.problems);
  }
  return { doc, problems };
}
