/**
 * Independent sources (`V`, `I`): read now, decided once all nodes are known.
 *
 * `readSource(walk, site)` records a PendingSource; `decideSources(walk)` applies the rule:
 * a voltage source of plain DC (no AC, no transient shape) between a node and ground marks
 * that node a supply net (role power, volts signed as seen from ground) and all supplies
 * share one power-entry pads part (pads in falling voltage, ground among them at 0 V); a
 * 0 V DC source is a current probe and joins its two nodes; any other source becomes a
 * two-pad signal entry (pad 1 the + node, pad 2 the − node), its + net marked input.
 */
import type { Problem } from '../model/problem.ts';
import { GROUND_KEY } from './spice-nodes.ts';
import { problem, type PendingPart, type Site, type Walk } from './spice-types.ts';
import { spiceNumber } from './spice-value.ts';

const SHAPES = new Set(['pulse', 'sin', 'exp', 'pwl', 'sffm', 'am', 'trnoise', 'trrandom', 'pat']);

export function readSource(w: Walk, site: Site): void {
  const words = site.card.words;
  if (words.length < 3) {
    problem(w, 'error', site.card, 'spice.missing-node', `${site.name} needs two nodes`, `write "${site.name} plus minus DC 12"`, { refs: [site.name] });
    return;
  }
  const plus = w.nodes.resolve(words[1]!, site.scope);
  const minus = w.nodes.resolve(words[2]!, site.scope);
  let dc: number | undefined;
  let shaped = false;
  const rest = words.slice(3);
  for (let i = 0; i < rest.length; i++) {
    const t = rest[i]!.text.toLowerCase();
    if (t === 'dc') {
      dc = spiceNumber(rest[i + 1]?.text ?? '', 'voltage')?.value;
      i++;
    } else if (t === 'ac' || t === 'distof1' || t === 'distof2' || SHAPES.has(t)) {
      shaped = true;
      break;
    } else if (i === 0) dc = spiceNumber(rest[0]!.text, 'voltage')?.value;
  }
  const dcParam = site.card.params.find((p) => p.key.text.toLowerCase() === 'dc');
  if (dcParam) dc = spiceNumber(dcParam.value.text, 'voltage')?.value;
  const current = site.card.words[0]!.text[0]!.toLowerCase() === 'i';
  const src = { name: site.name, line: site.card.line, column: site.card.column, plus, minus, current, ...(rest.length === 0 && !current ? { dc: 0 } : {}) };
  if (!shaped && dc !== undefined && !current) Object.assign(src, { dc });
  w.sources.push(src);
}

export interface SourceUse {
  name: string;
  line: number;
  use: 'supply' | 'probe' | 'signal' | 'ignored';
  part?: string;
  /** Source terminal (+ or -) → pad of the part. */
  pads?: Record<string, string>;
  volts?: number;
}

export interface Decided {
  parts: PendingPart[];
  /** Net key → supply volts. */
  supplies: Map<string, number>;
  inputs: Set<string>;
  uses: SourceUse[];
}

function fmtVolts(v: number): string {
  return `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(Number(v.toPrecision(6)))} V`;
}

export function decideSources(w: Walk, freeRef: (letter: string) => string): Decided {
  const out: Decided = { parts: [], supplies: new Map(), inputs: new Set(), uses: [] };
  const note = (p: Omit<Problem, 'severity' | 'path'>, severity: 'note' | 'warning' | 'error' = 'note') =>
    (severity === 'error' ? w.problems : w.warnings).push({ severity, path: [], ...p });
  for (const s of w.sources)
    if (s.dc === 0) {
      const [a, b] = [w.nodes.name(s.plus), w.nodes.name(s.minus)];
      w.nodes.join(s.plus, s.minus);
      out.uses.push({ name: s.name, line: s.line, use: 'probe' });
      note({ code: 'spice.probe-joined', line: s.line, column: s.column, message: `${s.name} is a 0 V source (a current probe): its nodes ${a} and ${b} are one net, ${w.nodes.name(s.plus)}, on the board` });
    }
  const supplyBy = new Map<string, { volts: number; from: string }>();
  const signal: typeof w.sources = [];
  for (const s of w.sources) {
    if (s.dc === 0) continue;
    const p = w.nodes.find(s.plus);
    const m = w.nodes.find(s.minus);
    if (p === m) {
      out.uses.push({ name: s.name, line: s.line, use: 'ignored' });
      note({ code: 'spice.source-shorted', line: s.line, column: s.column, message: `${s.name} has both ends on net ${w.nodes.name(p)}; left out`, hint: 'check its two nodes' }, 'warning');
      continue;
    }
    if (s.dc !== undefined && (p === GROUND_KEY) !== (m === GROUND_KEY)) {
      const net = p === GROUND_KEY ? m : p;
      const volts = p === GROUND_KEY ? -s.dc : s.dc;
      const prev = supplyBy.get(net);
      if (prev && prev.volts !== volts) {
        note({ code: 'spice.supply-conflict', line: s.line, column: s.column, message: `${s.name} drives net ${w.nodes.name(net)} to ${fmtVolts(volts)} but ${prev.from} drives it to ${fmtVolts(prev.volts)}`, hint: 'give the net one supply voltage', nets: [w.nodes.name(net)] }, 'error');
        continue;
      }
      if (!prev) supplyBy.set(net, { volts, from: s.name });
      out.uses.push({ name: s.name, line: s.line, use: 'supply', volts });
      continue;
    }
    signal.push(s);
  }
  if (supplyBy.size) {
    const ref = freeRef('J');
    const entries = [...supplyBy.entries()].map(([net, v]) => ({ net, volts: v.volts }));
    entries.push({ net: GROUND_KEY, volts: 0 });
    entries.sort((a, b) => b.volts - a.volts || (a.net === GROUND_KEY ? -1 : 1));
    const part: PendingPart = { ref, from: 'supply sources', line: w.sources[0]!.line, column: 1, kind: 'pads', value: 'power entry', pins: {}, count: entries.length, labels: {} };
    entries.forEach((e, i) => {
      part.pins[String(i + 1)] = e.net;
      part.labels![String(i + 1)] = e.net === GROUND_KEY ? '0 V' : `${fmtVolts(e.volts)} (${w.nodes.name(e.net)})`;
      out.supplies.set(e.net, e.volts);
    });
    out.supplies.delete(GROUND_KEY);
    for (const u of out.uses)
      if (u.use === 'supply') {
        const s = w.sources.find((x) => x.name === u.name)!;
        const padOf = (k: string) => String(entries.findIndex((e) => e.net === w.nodes.find(k)) + 1);
        u.part = ref;
        u.pads = { '+': padOf(s.plus), '-': padOf(s.minus) };
      }
    out.parts.push(part);
  }
  for (const s of signal) {
    const ref = freeRef('J');
    out.parts.push({ ref, from: s.name, line: s.line, column: s.column, kind: 'pads', value: `signal entry (${s.name})`.slice(0, 64), pins: { '1': s.plus, '2': s.minus }, count: 2, labels: { '1': `${s.name} +`, '2': `${s.name} −` } });
    out.uses.push({ name: s.name, line: s.line, use: 'signal', part: ref, pads: { '+': '1', '-': '2' } });
    out.inputs.add(w.nodes.find(s.plus));
  }
  return out;
}
