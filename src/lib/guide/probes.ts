/**
 * The continuity checklist from the verifier (verify/probeChecklist): pairs of holes that
 * must beep (each net whole across its copper pieces) and pairs that must stay silent
 * (neighbouring pieces of different nets across each cut), named from both sides since the
 * probes go on the copper side.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import { probeChecklist } from '../verify/index.ts';
import { holeName } from './placed.ts';
import type { ProbeItem } from './types.ts';

export function probeList(circuit: Circuit, layout: Layout): { beep: ProbeItem[]; silent: ProbeItem[] } {
  const list = probeChecklist(circuit, layout);
  const cols = layout.board.cols;
  const item = (p: (typeof list.beep)[number]): ProbeItem => ({ a: holeName(p.a, cols), b: holeName(p.b, cols), nets: [...p.nets], note: p.note });
  return { beep: list.beep.map(item), silent: list.silent.map(item) };
}
