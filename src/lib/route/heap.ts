/**
 * A binary min-heap of (cost, item) pairs for the maze search. Ties break on the smaller
 * item so that a search visits states in the same order on every run (style habit 6).
 */
export class MinHeap {
  private costs: number[] = [];
  private items: number[] = [];

  get size(): number {
    return this.items.length;
  }

  clear(): void {
    this.costs.length = 0;
    this.items.length = 0;
  }

  /** Cost of the item `pop` would return next (Infinity when empty). */
  peekCost(): number {
    return this.costs.length ? this.costs[0]! : Infinity;
  }

  push(cost: number, item: number): void {
    const c = this.costs;
    const it = this.items;
    let i = it.length;
    c.push(cost);
    it.push(item);
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (!this.less(cost, item, c[p]!, it[p]!)) break;
      c[i] = c[p]!;
      it[i] = it[p]!;
      i = p;
    }
    c[i] = cost;
    it[i] = item;
  }

  /** Remove and return the cheapest item; call only when size > 0. */
  pop(): number {
    const c = this.costs;
    const it = this.items;
    const top = it[0]!;
    const lastCost = c.pop()!;
    const lastItem = it.pop()!;
    const n = it.length;
    if (n > 0) {
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        if (l >= n) break;
        const r = l + 1;
        const m = r < n && this.less(c[r]!, it[r]!, c[l]!, it[l]!) ? r : l;
        if (!this.less(c[m]!, it[m]!, lastCost, lastItem)) break;
        c[i] = c[m]!;
        it[i] = it[m]!;
        i = m;
      }
      c[i] = lastCost;
      it[i] = lastItem;
    }
    return top;
  }

  private less(ca: number, ia: number, cb: number, ib: number): boolean {
    return ca < cb || (ca === cb && ia < ib);
  }
}
