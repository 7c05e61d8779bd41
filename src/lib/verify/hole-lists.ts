/**
 * `new HoleLists(size)`: a short list of (a, b) integer pairs per hole, kept in typed arrays
 * (a pool of linked cells) instead of a Map of arrays: the verifier files every lead, body
 * cell and link end by hole, and most holes hold one item or none. `add(h, a, b)`,
 * `remove(h, a, b)` (one matching item), `count[h]`; walk a hole's items with
 * `for (let k = lists.head[h]!; k >= 0; k = lists.next[k]!)` reading `lists.a[k]`, `lists.b[k]`
 * (newest first).
 */
export class HoleLists {
  readonly head: Int32Array;
  readonly count: Int32Array;
  next: Int32Array;
  a: Int32Array;
  b: Int32Array;
  /** Unused cells, linked through `next`. */
  private free = -1;
  private used = 0;

  constructor(size: number, capacity = 64) {
    this.head = new Int32Array(size).fill(-1);
    this.count = new Int32Array(size);
    this.next = new Int32Array(capacity);
    this.a = new Int32Array(capacity);
    this.b = new Int32Array(capacity);
  }

  add(h: number, a: number, b: number): void {
    let k = this.free;
    if (k >= 0) this.free = this.next[k]!;
    else {
      if (this.used === this.next.length) this.grow();
      k = this.used++;
    }
    this.a[k] = a;
    this.b[k] = b;
    this.next[k] = this.head[h]!;
    this.head[h] = k;
    this.count[h]!++;
  }

  /** Take out one item (a, b) of hole h; false when there is none. */
  remove(h: number, a: number, b: number): boolean {
    let prev = -1;
    for (let k = this.head[h]!; k >= 0; prev = k, k = this.next[k]!) {
      if (this.a[k] !== a || this.b[k] !== b) continue;
      if (prev < 0) this.head[h] = this.next[k]!;
      else this.next[prev] = this.next[k]!;
      this.next[k] = this.free;
      this.free = k;
      this.count[h]!--;
      return true;
    }
    return false;
  }

  private grow(): void {
    const n = this.next.length * 2;
    const widen = (x: Int32Array) => {
      const y = new Int32Array(n);
      y.set(x);
      return y;
    };
    this.next = widen(this.next);
    this.a = widen(this.a);
    this.b = widen(this.b);
  }
}
