/**
 * Node names of a flattened SPICE deck. Names compare without case (SPICE folds case);
 * the first spelling seen is the one shown. `0` and `gnd` are the ground net `GND`;
 * `.global` names stay global; other names inside a subcircuit call get the call's path
 * as a prefix (`X1.mid`). Zero-volt sources join two nodes (a union-find keeps that).
 */
import type { Tok } from './spice-lines.ts';

export const GROUND_KEY = 'gnd';
export const GROUND_NAME = 'GND';

export interface Scope {
  /** Display prefix for local names and refs, e.g. "X1." ("" at top level). */
  prefix: string;
  /** Port name (lower case) → node key in the caller. */
  ports: Map<string, string>;
}

export class NodeTable {
  private display = new Map<string, string>();
  private first = new Map<string, { line: number; column: number }>();
  private parent = new Map<string, string>();

  constructor(private globals: Set<string>) {}

  /** Node key for a token in a scope, registering its spelling and first position. */
  resolve(tok: Tok, scope: Scope): string {
    const lower = tok.text.toLowerCase();
    let key: string;
    let shown: string;
    if (lower === '0' || lower === GROUND_KEY) {
      key = GROUND_KEY;
      shown = GROUND_NAME;
    } else if (this.globals.has(lower)) {
      key = lower;
      shown = tok.text;
    } else {
      const mapped = scope.ports.get(lower);
      if (mapped !== undefined) return mapped;
      key = (scope.prefix + tok.text).toLowerCase();
      shown = scope.prefix + tok.text;
    }
    if (!this.display.has(key)) {
      this.display.set(key, shown);
      this.first.set(key, { line: tok.line, column: tok.column });
    }
    return key;
  }

  find(key: string): string {
    let k = key;
    for (let p = this.parent.get(k); p !== undefined && p !== k; p = this.parent.get(k)) k = p;
    return k;
  }

  /** Join two nodes (a 0 V source); ground wins as the representative, else the older name. */
  join(a: string, b: string): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return;
    const keepA = ra === GROUND_KEY || (rb !== GROUND_KEY && this.order(ra) <= this.order(rb));
    this.parent.set(keepA ? rb : ra, keepA ? ra : rb);
  }

  private order(key: string): number {
    const f = this.first.get(key);
    return f ? f.line * 10000 + f.column : Number.MAX_SAFE_INTEGER;
  }

  /** Net name of a node after joins. */
  name(key: string): string {
    const r = this.find(key);
    return this.display.get(r) ?? r;
  }

  position(key: string): { line: number; column: number } | undefined {
    return this.first.get(this.find(key));
  }
}
