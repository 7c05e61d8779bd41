/**
 * Op-amp packing: single sections (kind `opamp`, pins + − out V+ V−) go into dual DIP-8 or
 * quad DIP-14 packages. Pin maps follow the industry-standard pinouts named in
 * ../shared/design/exchange.md: dual 1 outA 2 −A 3 +A 4 V− 5 +B 6 −B 7 outB 8 V+; quad
 * 1 outA 2 −A 3 +A 4 V+ 5 +B 6 −B 7 outB 8 outC 9 −C 10 +C 11 V− 12 +D 13 −D 14 outD.
 * Sections sharing a package must share supply nets. A spare section is tied off as a
 * follower with its + input on ground (common practice), reported under `spares`.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Packing } from '../model/layout.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import type { DesignPart } from './design.ts';

type SectionPins = Record<'+' | '-' | 'out', string>;
export const DUAL_SECTIONS: SectionPins[] = [
  { out: '1', '-': '2', '+': '3' },
  { '+': '5', '-': '6', out: '7' },
];
export const DUAL_SUPPLY = { 'V+': '8', 'V-': '4' };
export const QUAD_SECTIONS: SectionPins[] = [
  { out: '1', '-': '2', '+': '3' },
  { '+': '5', '-': '6', out: '7' },
  { out: '8', '-': '9', '+': '10' },
  { '+': '12', '-': '13', out: '14' },
];
export const QUAD_SUPPLY = { 'V+': '4', 'V-': '11' };

export interface Packed {
  parts: DesignPart[];
  packing: Packing;
  spares: Record<string, Record<string, string>>;
}

function groundNet(circuit: Circuit): string | undefined {
  for (const [name, info] of Object.entries(circuit.nets)) if (info.role === 'ground') return name;
  const used = new Set(circuit.parts.flatMap((p) => Object.values(p.pins)));
  for (const guess of ['GND', 'gnd', '0', 'AGND']) if (used.has(guess)) return guess;
  return undefined;
}

/** Package sizes for n sections: as many quads as fill up, a dual for a remainder of 1–2. */
export function packageSizes(n: number): (2 | 4)[] {
  const out: (2 | 4)[] = [];
  let left = n;
  while (left > 2) {
    out.push(4);
    left -= 4;
  }
  if (left > 0) out.push(2);
  return out;
}

export function packOpamps(circuit: Circuit, indices: number[], taken: Set<string>): Result<Packed> {
  const problems: Problem[] = [];
  const warnings: Problem[] = [];
  const gnd = groundNet(circuit);
  // Group by supply pair, keeping the order the user wrote the sections in.
  const groups = new Map<string, number[]>();
  for (const i of indices) {
    const p = circuit.parts[i]!;
    const key = `${p.pins['V+']}\u0000${p.pins['V-']}`;
    (groups.get(key) ?? groups.set(key, []).get(key)!).push(i);
  }
  const refs = new Set(taken);
  for (const i of indices) refs.add(circuit.parts[i]!.ref);
  let next = 1;
  const freshRef = (): string => {
    while (refs.has(`U${next}`)) next++;
    const r = `U${next}`;
    refs.add(r);
    return r;
  };
  const parts: DesignPart[] = [];
  const packing: Packing = {};
  const spares: Record<string, Record<string, string>> = {};
  for (const members of groups.values()) {
    let at = 0;
    for (const size of packageSizes(members.length)) {
      const chunk = members.slice(at, at + size);
      at += size;
      const ref = freshRef();
      const layout = size === 2 ? DUAL_SECTIONS : QUAD_SECTIONS;
      const supply = size === 2 ? DUAL_SUPPLY : QUAD_SUPPLY;
      const first = circuit.parts[chunk[0]!]!;
      const nets: Record<string, string> = { [supply['V+']]: first.pins['V+']!, [supply['V-']]: first.pins['V-']! };
      const values = new Set<string>();
      chunk.forEach((idx, s) => {
        const sec = circuit.parts[idx]!;
        if (sec.value) values.add(sec.value);
        const map = layout[s]!;
        packing[sec.ref] = { part: ref, pins: { '+': map['+'], '-': map['-'], out: map.out, 'V+': supply['V+'], 'V-': supply['V-'] } };
        for (const k of ['+', '-', 'out'] as const) nets[map[k]] = sec.pins[k]!;
      });
      for (let s = chunk.length; s < size; s++) {
        const map = layout[s]!;
        const letter = String.fromCharCode(65 + s);
        if (!gnd) {
          problems.push({
            code: 'packing.no-ground',
            severity: 'error',
            path: ['nets'],
            message: `package ${ref} has a spare section ${letter} to tie off, but no net has role "ground"`,
            hint: 'mark the ground net: "nets": { "GND": { "role": "ground" } }',
          });
          continue;
        }
        const spareNet = `${ref}_SPARE_${letter}`;
        nets[map['+']] = gnd;
        nets[map['-']] = spareNet;
        nets[map.out] = spareNet;
        spares[ref] = { ...(spares[ref] ?? {}), [map['+']]: gnd, [map['-']]: spareNet, [map.out]: spareNet };
        warnings.push({
          code: 'packing.spare-tied',
          severity: 'note',
          path: [],
          message: `${ref} section ${letter} is spare: tied off as a follower with + on ${gnd}`,
          refs: [ref],
        });
      }
      const pkg = size === 2 ? 'DIP-8' : 'DIP-14';
      parts.push({
        ref,
        kind: 'ic',
        value: values.size === 1 ? [...values][0]! : size === 2 ? 'dual op-amp' : 'quad op-amp',
        footprint: size === 2 ? 'dip-8' : 'dip-14',
        pinNames: Array.from({ length: size === 2 ? 8 : 14 }, (_, k) => String(k + 1)),
        nets,
        package: pkg,
        polarized: true,
        source: chunk,
      });
    }
  }
  if (problems.length) return fail(problems, warnings);
  return ok({ parts, packing, spares }, warnings);
}
