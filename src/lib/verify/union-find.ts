/**
 * Disjoint sets over dense integer ids (hole indices), with path halving and union by
 * size. `find(i)` → representative; `union(a, b)` → whether two sets were joined.
 */
export class UnionFind {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;

  constructor(n: number) {
    this.parent = new Int32Array(n);
    this.size = new Int32Array(n).fill(1);
    for (let i = 0; i < n; i++) this.parent[i] = i;
  }

  find(i: number): number {
    const p = this.parent;
    while (p[i]! !== i) {
      p[i] = p[p[i]!]!;
      i = p[i]!;
    }
    return i;
  }

  union(a: number, b: number): boolean {
    let ra = this.find(a);
    let rb = this.find(b);
    if (ra === rb) return false;
    if (this.size[ra]! < this.size[rb]!) [ra, rb] = [rb, ra];
    this.parent[rb] = ra;
    this.size[ra] = this.size[ra]! + this.size[rb]!;
    return true;
  }
}
