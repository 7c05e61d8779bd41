import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Problem, Result } from '../model/problem.ts';
import { importSpice, parseCircuitText } from './index.ts';

const DIR = join(__dirname, '..', '..', '..', 'layouts');
const DECKS = [
  readFileSync(join(DIR, 'twin-lfo.cir'), 'utf8'),
  'common-emitter check\nV1 vcc 0 DC 9\nR1 vcc b 100k\nR2 b 0 22K\nQ1 c b e QN\nRC vcc c 4.7k\nRE e 0 1k\nC1 in b 100n\n.model QN NPN(BF=200)\n.end\n',
  't\n.subckt st a b\nR1 a m 1k\nX1 m b st2\n.ends\n.subckt st2 p q\nC1 p q 1u\nM1 p q 0 0 NM\n.ends\nX1 i o st\nX2 o 0 st\nVs i 0 SIN(0 1 1k)\n.model NM nmos\n.end\n',
];
const DOCS = ['twin-lfo.circuit.json', 'four-mixer.circuit.json', 'bench-buffer.circuit.json'].map((f) => readFileSync(join(DIR, f), 'utf8'));

/** Pieces that steer random text into the reader's interesting corners. */
const SPICE_BITS = ['\n', '+', '*', '* kerfline: ', 'kind=ic ', 'pins=1,2 ', 'package=DIP-8 ', '.subckt s a b\n', '.ends\n', '.model q npn\n', '.control\n', '.endc\n', '.end\n', 'X1 ', 'Q1 ', 'M1 ', 'V1 ', 'D1 ', '0 ', 'gnd ', '=', '(', ')', '{', "'", ';', '$ ', '//', '4k7', '1MEG', 'opamp', 'LED', '"'];
const JSON_BITS = ['{', '}', '[', ']', ',', ':', '"', '"pins"', '"kind"', '"opamp"', '"ic"', '"DIP-8"', 'null', '1e999', '-1', '"\\u0000"', '\n'];

function mutate(base: string, bits: string[]) {
  const edit = fc.oneof(
    fc.tuple(fc.constant('insert' as const), fc.nat(), fc.oneof(fc.constantFrom(...bits), fc.string({ maxLength: 6 }))),
    fc.tuple(fc.constant('delete' as const), fc.nat(), fc.integer({ min: 1, max: 40 })),
    fc.tuple(fc.constant('swapLines' as const), fc.nat(), fc.nat()),
  );
  return fc.array(edit, { minLength: 1, maxLength: 6 }).map((edits) => {
    let s = base;
    for (const e of edits) {
      if (e[0] === 'insert') {
        const at = e[1] % (s.length + 1);
        s = s.slice(0, at) + e[2] + s.slice(at);
      } else if (e[0] === 'delete') {
        const at = e[1] % (s.length + 1);
        s = s.slice(0, at) + s.slice(at + e[2]);
      } else {
        const lines = s.split('\n');
        const a = e[1] % lines.length;
        const b = e[2] % lines.length;
        [lines[a], lines[b]] = [lines[b]!, lines[a]!];
        s = lines.join('\n');
      }
    }
    return s;
  });
}

/** The result's shape, as one message (empty when fine), so a failure says what broke. */
function shapeFault(r: Result<unknown>, needLine: (p: Problem) => boolean): string {
  if (typeof r.ok !== 'boolean') return 'no ok flag';
  if (!r.ok && r.problems.length === 0) return 'failed with no problem';
  for (const p of r.ok ? r.warnings : [...r.problems, ...r.warnings]) {
    if (!/^[a-z]+(\.[\w-]+)+$/.test(p.code)) return `bad code ${p.code}`;
    if (typeof p.message !== 'string' || !Array.isArray(p.path)) return `bad problem ${p.code}`;
    if (!r.ok && r.problems.includes(p) && needLine(p) && !(Number(p.line) >= 1)) return `no line on ${p.code}`;
  }
  return '';
}

describe('never throws', () => {
  it('importSpice: 10 000 random and mutated decks', () => {
    const garbage = fc.oneof(fc.string({ maxLength: 200 }), fc.string({ unit: 'binary', maxLength: 120 }), fc.array(fc.constantFrom(...SPICE_BITS), { maxLength: 40 }).map((a) => a.join('')));
    // small decks weigh more than the long demo, to keep the run short
    const input = fc.oneof({ arbitrary: garbage, weight: 4 }, { arbitrary: mutate(DECKS[0]!, SPICE_BITS), weight: 1 }, { arbitrary: mutate(DECKS[1]!, SPICE_BITS), weight: 3 }, { arbitrary: mutate(DECKS[2]!, SPICE_BITS), weight: 3 });
    fc.assert(
      fc.property(input, (text) => {
        expect(shapeFault(importSpice(text), (p) => p.code.startsWith('spice.'))).toBe('');
      }),
      { numRuns: 10_000, seed: 20_241_201 },
    );
  });

  it('parseCircuitText: 10 000 random and mutated documents', () => {
    const garbage = fc.oneof(fc.string({ maxLength: 200 }), fc.json(), fc.array(fc.constantFrom(...JSON_BITS), { maxLength: 40 }).map((a) => a.join('')));
    // structural mutation: replace one value somewhere in a valid document
    const structural = fc.tuple(fc.constantFrom(...DOCS), fc.array(fc.nat(), { minLength: 1, maxLength: 5 }), fc.jsonValue()).map(([doc, steps, v]) => {
      const root = JSON.parse(doc) as unknown;
      let node = root as Record<string, unknown>;
      for (const [i, step] of steps.entries()) {
        const keys = Object.keys(node);
        if (!keys.length) break;
        const k = keys[step % keys.length]!;
        const child = node[k];
        if (i === steps.length - 1 || !child || typeof child !== 'object') {
          node[k] = v;
          break;
        }
        node = child as Record<string, unknown>;
      }
      return JSON.stringify(root, null, 2);
    });
    const input = fc.oneof({ arbitrary: garbage, weight: 4 }, { arbitrary: structural, weight: 2 }, { arbitrary: mutate(DOCS[0]!, JSON_BITS), weight: 1 }, { arbitrary: mutate(DOCS[1]!, JSON_BITS), weight: 1 }, { arbitrary: mutate(DOCS[2]!, JSON_BITS), weight: 4 });
    fc.assert(
      fc.property(input, (text) => {
        expect(shapeFault(parseCircuitText(text), () => true)).toBe('');
      }),
      { numRuns: 10_000, seed: 20_241_202 },
    );
  });

  it('the same deck gives the same result twice', () => {
    fc.assert(
      fc.property(fc.oneof(...DECKS.map((d) => mutate(d, SPICE_BITS))), (text) => {
        expect(JSON.stringify(importSpice(text))).toBe(JSON.stringify(importSpice(text)));
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
