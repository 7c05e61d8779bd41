/**
 * `CopperTally` — exact cut and link counts, kept up to date lead by lead.
 *
 * Per conductor it keeps the leads sorted by their position along the copper. The minimum
 * number of cuts on a conductor is the number of net changes between neighbouring leads
 * (placement-notes.md); each run of one net between changes is a segment, and a net on k
 * segments needs k − 1 links. `add`/`remove` mark a conductor dirty; `flush()` recounts only
 * the dirty conductors and reports which nets changed, so a move costs the rows it touches;
 * `flushBack()` after an exact undo puts back what the last flush replaced, without a recount.
 */
import type { CopperMap } from './copper-map.ts';

/** Leads are stored as pos * NET_SPACE + net, so sorting the numbers sorts by position. */
const NET_SPACE = 2 ** 21;

function lowerBound(a: number[], v: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (a[mid]! < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export class CopperTally {
  readonly leads: number[][];
  readonly runs: number[][];
  /** Per conductor, per run: the first and last position it may use (its gaps included). */
  readonly runLo: number[][];
  readonly runHi: number[][];
  readonly segs: Int32Array;
  cuts = 0;
  links = 0;
  /** Links and stranded segments summed with each net's weight (see `weigh`). */
  linksW = 0;
  strandedW = 0;
  readonly weight: Float64Array;
  /** Segments of nets that need links but have no free hole for a link to land in. */
  stranded = 0;
  /** Neighbouring leads of different nets with no hole between them (no room for a drilled cut). */
  cramped = 0;
  private readonly starved: Int32Array;
  private readonly starvedRuns: number[][];
  private readonly crampedOf: Int32Array;
  private readonly dirty: number[] = [];
  private readonly isDirty: Uint8Array;
  /** What the last flush replaced, per conductor it recounted (for flushBack). */
  private readonly logAt: Int32Array;
  private readonly logCond: number[] = [];
  private readonly logRuns: number[][][] = [];
  private readonly logCramped: number[] = [];

  constructor(
    private readonly map: CopperMap,
    nets: number,
    /** Body owner per hole (−1 free) and keep-out mask: a link may land only where both are clear. */
    private readonly owner: Int32Array,
    private readonly blocked: Uint8Array,
  ) {
    this.leads = Array.from({ length: map.conductors }, () => []);
    this.runs = Array.from({ length: map.conductors }, () => []);
    this.runLo = Array.from({ length: map.conductors }, () => []);
    this.runHi = Array.from({ length: map.conductors }, () => []);
    this.starvedRuns = Array.from({ length: map.conductors }, () => []);
    this.crampedOf = new Int32Array(map.conductors);
    this.segs = new Int32Array(nets);
    this.starved = new Int32Array(nets);
    this.weight = new Float64Array(nets).fill(1);
    this.isDirty = new Uint8Array(map.conductors);
    this.logAt = new Int32Array(map.conductors).fill(-1);
  }

  add(hole: number, net: number): void {
    const c = this.map.cond[hole]!;
    const v = this.map.pos[hole]! * NET_SPACE + net;
    const list = this.leads[c]!;
    list.splice(lowerBound(list, v), 0, v);
    this.mark(c);
  }

  remove(hole: number, net: number): void {
    const c = this.map.cond[hole]!;
    const v = this.map.pos[hole]! * NET_SPACE + net;
    const list = this.leads[c]!;
    const i = lowerBound(list, v);
    if (list[i] !== v) throw new Error(`copper tally: no lead of net ${net} at hole ${hole}`);
    list.splice(i, 1);
    this.mark(c);
  }

  /** A body came or went over this hole: its conductor's landing room may have changed. */
  touchHole(hole: number): void {
    this.mark(this.map.cond[hole]!);
  }

  private mark(c: number): void {
    if (!this.isDirty[c]) {
      this.isDirty[c] = 1;
      this.dirty.push(c);
    }
  }

  private bump(net: number, d: number, starve: number): void {
    this.account(net, -1);
    this.segs[net]! += d;
    this.starved[net]! += starve;
    this.account(net, 1);
  }

  private account(net: number, sign: number): void {
    const s = this.segs[net]!;
    if (s < 2) return;
    const w = this.weight[net]! * sign;
    this.links += sign * (s - 1);
    this.stranded += sign * this.starved[net]!;
    this.linksW += w * (s - 1);
    this.strandedW += w * this.starved[net]!;
  }

  /** Make a net's links and stranded segments count `w` times (nets the router found hard). */
  weigh(net: number, w: number): void {
    this.account(net, -1);
    this.weight[net] = w;
    this.account(net, 1);
  }

  private isFree(c: number, from: number, to: number): boolean {
    const line = this.map.holes[c]!;
    for (let i = Math.max(0, from); i <= to && i < line.length; i++) {
      const h = line[i]!;
      if (this.owner[h] === -1 && !this.blocked[h]) return true;
    }
    return false;
  }

  private clearLog(): void {
    for (const c of this.logCond) this.logAt[c] = -1;
    this.logCond.length = 0;
    this.logRuns.length = 0;
    this.logCramped.length = 0;
  }

  /** Recount dirty conductors; calls `touched(net)` for every net whose segments changed. */
  flush(touched: (net: number) => void): void {
    this.clearLog();
    for (const c of this.dirty) {
      this.isDirty[c] = 0;
      this.logAt[c] = this.logCond.length;
      this.logCond.push(c);
      this.logRuns.push([this.runs[c]!, this.runLo[c]!, this.runHi[c]!, this.starvedRuns[c]!]);
      this.logCramped.push(this.crampedOf[c]!);
      // Runs in copper order; each may use its own holes and the gaps on either side.
      const fresh: number[] = [];
      const lo: number[] = [];
      const hi: number[] = [];
      let last = -1;
      let lastPos = -2;
      let cramped = 0;
      for (const v of this.leads[c]!) {
        const net = v % NET_SPACE;
        const pos = (v - net) / NET_SPACE;
        if (net !== last) {
          if (last !== -1) {
            if (pos - lastPos < 2) cramped++;
            hi.push(pos - 1);
          }
          fresh.push(net);
          lo.push(last === -1 ? 0 : lastPos + 1);
        }
        last = net;
        lastPos = pos;
      }
      if (fresh.length) hi.push(this.map.holes[c]!.length - 1);
      const starved: number[] = [];
      for (let i = 0; i < fresh.length; i++) starved.push(this.isFree(c, lo[i]!, hi[i]!) ? 0 : 1);
      this.setRuns(c, fresh, lo, hi, starved, cramped, touched);
    }
    this.dirty.length = 0;
  }

  /**
   * Flush after the leads and bodies of the last flush were put back exactly as they were:
   * the conductors it recounted get their old runs back instead of a recount (any other
   * dirty conductor is recounted as usual).
   */
  flushBack(touched: (net: number) => void): void {
    const again: number[] = [];
    for (const c of this.dirty) {
      const k = this.logAt[c]!;
      if (k < 0) {
        again.push(c);
        continue;
      }
      this.isDirty[c] = 0;
      const [runs, lo, hi, starved] = this.logRuns[k]!;
      this.setRuns(c, runs!, lo!, hi!, starved!, this.logCramped[k]!, touched);
    }
    this.dirty.length = 0;
    this.clearLog();
    if (again.length) {
      this.dirty.push(...again);
      this.flush(touched);
    }
  }

  /** Replace a conductor's runs, keeping segments, cuts, links and cramped counts in step. */
  private setRuns(c: number, fresh: number[], lo: number[], hi: number[], starved: number[], cramped: number, touched: (net: number) => void): void {
    const old = this.runs[c]!;
    const oldStarved = this.starvedRuns[c]!;
    const oldLo = this.runLo[c]!;
    const oldHi = this.runHi[c]!;
    for (let i = 0; i < old.length; i++) this.bump(old[i]!, -1, -oldStarved[i]!);
    this.cuts -= old.length > 1 ? old.length - 1 : 0;
    this.cramped -= this.crampedOf[c]!;
    this.runLo[c] = lo;
    this.runHi[c] = hi;
    for (let i = 0; i < fresh.length; i++) this.bump(fresh[i]!, 1, starved[i]!);
    // Tell only about runs that came, went or changed their reach: the others' nets keep
    // their segments and link lanes. Both lists run in copper order: merge them.
    let i = 0;
    let j = 0;
    while (i < old.length || j < fresh.length) {
      const a = i < old.length ? oldLo[i]! : Infinity;
      const b = j < fresh.length ? lo[j]! : Infinity;
      if (a < b) touched(old[i++]!);
      else if (b < a) touched(fresh[j++]!);
      else {
        if (old[i] !== fresh[j] || oldHi[i] !== hi[j] || oldStarved[i] !== starved[j]) {
          touched(old[i]!);
          touched(fresh[j]!);
        }
        i++;
        j++;
      }
    }
    this.cuts += fresh.length > 1 ? fresh.length - 1 : 0;
    this.crampedOf[c] = cramped;
    this.cramped += cramped;
    this.runs[c] = fresh;
    this.starvedRuns[c] = starved;
  }
}
