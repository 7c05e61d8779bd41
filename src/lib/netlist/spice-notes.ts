/**
 * Layout notes inside a SPICE deck: comment lines `* kerfline: [target] key=value …`.
 *
 * `parseNote(card): { target?: Tok; override: SpiceOverride; problems }`
 *
 * A simulator reads them as comments. At the top level a note names its target first
 * (an element name such as `C5`, a model name or a subcircuit name); inside a `.subckt`
 * body it may leave the target out and then speaks for that subcircuit. Keys are the
 * fields of SpiceOverride; `pins` and `labels` are comma-separated lists; a value holding
 * blanks is written in double quotes. Problems name the line and column of the bad field.
 */
import { PART_KINDS, type PartKind } from '../model/circuit.ts';
import type { Problem } from '../model/problem.ts';
import type { Tok, Card } from './spice-lines.ts';
import type { SpiceOverride } from './spice-override.ts';

const KEYS = ['kind', 'value', 'footprint', 'package', 'pinout', 'pins', 'labels', 'polarized'];

function fields(t: Tok): { key?: Tok; value: Tok }[] {
  const out: { key?: Tok; value: Tok }[] = [];
  const re = /([^\s=]+)\s*=\s*("([^"]*)"?|[^\s"]*)|"([^"]*)"?|(\S+)/g;
  for (let m = re.exec(t.text); m; m = re.exec(t.text)) {
    const col = t.column + m.index;
    if (m[1] !== undefined) {
      const raw = m[2] ?? '';
      const value = m[3] ?? raw;
      out.push({ key: { text: m[1], line: t.line, column: col }, value: { text: value, line: t.line, column: col + m[0].length - raw.length } });
    } else out.push({ value: { text: m[4] ?? m[5] ?? '', line: t.line, column: col } });
  }
  return out;
}

export function parseNote(card: Card): { target?: Tok; override: SpiceOverride; problems: Problem[] } {
  const problems: Problem[] = [];
  const override: SpiceOverride = {};
  const body = card.words[0] ?? { text: '', line: card.line, column: card.column };
  const bad = (t: Tok, message: string, hint: string) =>
    problems.push({ code: 'spice.bad-note', severity: 'error', path: [], line: t.line, column: t.column, message, hint });
  let target: Tok | undefined;
  const list = fields(body);
  list.forEach((f, i) => {
    if (!f.key) {
      if (i === 0) target = f.value;
      else bad(f.value, `layout note: "${f.value.text}" is not a key=value field`, `write it as key=value with a key from: ${KEYS.join(', ')}`);
      return;
    }
    const key = f.key.text.toLowerCase();
    const v = f.value.text;
    switch (key) {
      case 'kind':
        if ((PART_KINDS as readonly string[]).includes(v.toLowerCase())) override.kind = v.toLowerCase() as PartKind;
        else bad(f.value, `layout note: "${v}" is not a part kind`, `use one of: ${PART_KINDS.join(', ')}`);
        break;
      case 'value':
      case 'footprint':
      case 'package':
      case 'pinout':
        if (v === '') bad(f.value, `layout note: ${key} is empty`, `give a ${key} after "${key}="`);
        else override[key] = key === 'value' ? v.slice(0, 64) : v;
        break;
      case 'pins':
      case 'labels': {
        const items = v.split(',').map((x) => x.trim());
        if (key === 'pins' && items.some((x) => x === '')) bad(f.value, 'layout note: pins has an empty entry', 'list one pin name per node, separated by commas: pins=+,-,V+,V-,out');
        else override[key] = key === 'labels' ? items.map((x) => x.slice(0, 80)) : items;
        break;
      }
      case 'polarized':
        if (/^(true|yes|1)$/i.test(v)) override.polarized = true;
        else if (/^(false|no|0)$/i.test(v)) override.polarized = false;
        else bad(f.value, `layout note: polarized must be true or false, not "${v}"`, 'write polarized=true');
        break;
      default:
        bad(f.key, `layout note: unknown key "${f.key.text}"`, `use a key from: ${KEYS.join(', ')}`);
    }
  });
  const out: { target?: Tok; override: SpiceOverride; problems: Problem[] } = { override, problems };
  if (target) out.target = target;
  return out;
}
