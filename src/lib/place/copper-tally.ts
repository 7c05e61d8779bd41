/**
 * `CopperTally` — exact cut and link counts, kept up to date lead by lead.
 *
 * It keeps the net of the lead in each hole, and per conductor two bit masks along the
 * copper: holes with a lead, and free holes (no body, not kept out; `touchHole` must be
 * called whenever a body comes or goes). The minimum number of cuts on a conductor is the
 * number of net changes between neighbouring leads (placement-notes.md); each run of one
 * net between changes is a segment, and a net on k segments needs k − 1 links.
 * `add`/`remove` mark a conductor dirty; `flush()` recounts only the dirty conductors
 * (visiting their leads, 32 holes per mask word) and reports which nets changed, so a move
 * costs the rows it touches; `flushBack()` after an exact undo puts back what the last
 * flush replaced, without a recount. Every conductor recounted keeps a spare set of run
 * arrays, so a flush allocates nothing: it fills the spare and swaps, and `flushBack` swaps
 * back.
 */
import type { CopperMap } from './copper-map.ts';

/** The run arrays of a conductor never recounted (shared, never written: see recount). */
const NONE: number[] = [];

export class CopperTally {
  /** Per conductor, per run in copper order: its net. */
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
  /** Net of the lead in each hole (valid where leadCount is 1). */
  private readonly leadNet: Int32Array;
  /** Leads in each hole (1 at most in a legal placement). */
  readonly leadCount: Int32Array;
  /** Holes holding more than one lead (never in a legal placement): all their nets, ascending. */
  private readonly crowded = new Map<number, number[]>();
  /** The other buffer of each conductor's run arrays: what the last flush replaced. */
  private readonly spareRuns: number[][];
  private readonly spareLo: number[][];
  private readonly spareHi: number[][];
  private readonly spareStarved: number[][];
  /** Index of each hole along its conductor's hole list. */
  /** Index of each hole in its conductor's hole list (0 off every conductor). */
  readonly lineAt: Int32Array;
  /** Mask words per conductor; bit i of conductor c's words: hole map.holes[c][i]. */
  private readonly words: number;
  private readonly leadBits: Int32Array;
  private readonly freeBits: Int32Array;
  /** Dirty conductors (the first nDirty entries). */
  private readonly dirty: Int32Array;
  private nDirty = 0;
  /** Per conductor since the last flush: 1 bodies came or went, 2 leads came or went (bits). */
  private readonly isDirty: Uint8Array;
  /** Per conductor the last flush recounted: its place in the log (−1 none), and its cramped count before (for flushBack). */
  private readonly logAt: Int32Array;
  private readonly logCond: Int32Array;
  private readonly logCramped: Int32Array;
  private nLog = 0;

  constructor(
    private readonly map: CopperMap,
    nets: number,
    /** Body owner per hole (−1 free) and keep-out mask: a link may land only where both are clear. */
    private readonly owner: Int32Array,
    private readonly blocked: Uint8Array,
  ) {
    const n = map.conductors;
    const lists = () => new Array<number[]>(n).fill(NONE);
    this.runs = lists();
    this.runLo = lists();
    this.runHi = lists();
    this.starvedRuns = lists();
    this.spareRuns = lists();
    this.spareLo = lists();
    this.spareHi = lists();
    this.spareStarved = lists();
    this.crampedOf = new Int32Array(n);
    this.segs = new Int32Array(nets);
    this.starved = new Int32Array(nets);
    this.weight = new Float64Array(nets).fill(1);
    this.isDirty = new Uint8Array(n);
    this.dirty = new Int32Array(n);
    this.logCond = new Int32Array(n);
    this.logCramped = new Int32Array(n);
    this.logAt = new Int32Array(n).fill(-1);
    this.leadNet = new Int32Array(map.cols * map.rows).fill(-1);
    this.leadCount = new Int32Array(map.cols * map.rows);
    let longest = 0;
    for (const line of map.holes) longest = Math.max(longest, line.length);
    this.words = (longest + 31) >> 5;
    this.lineAt = new Int32Array(map.cols * map.rows);
    this.leadBits = new Int32Array(n * this.words);
    this.freeBits = new Int32Array(n * this.words);
    map.holes.forEach((line) =>
      line.forEach((h, i) => {
        this.lineAt[h] = i;
        this.setBit(this.freeBits, h, owner[h] === -1 && !blocked[h]);
      }),
    );
  }

  private setBit(bits: Int32Array, hole: number, on: boolean): void {
    const i = this.lineAt[hole]!;
    const w = this.map.cond[hole]! * this.words + (i >> 5);
    if (on) bits[w]! |= 1 << (i & 31);
    else bits[w]! &= ~(1 << (i & 31));
  }

  /** Whether conductor c has a free hole at an index in [a, b] of its line. */
  private freeWithin(c: number, a: number, b: number): boolean {
    if (b < a) return false;
    const base = c * this.words;
    const wa = a >> 5;
    const wb = b >> 5;
    const head = -1 << (a & 31);
    const tail = (b & 31) === 31 ? -1 : (1 << ((b & 31) + 1)) - 1;
    if (wa === wb) return (this.freeBits[base + wa]! & head & tail) !== 0;
    if (this.freeBits[base + wa]! & head) return true;
    for (let w = wa + 1; w < wb; w++) if (this.freeBits[base + w]) return true;
    return (this.freeBits[base + wb]! & tail) !== 0;
  }

  add(hole: number, net: number): void {
    const k = this.leadCount[hole]!;
    if (k === 0) this.leadNet[hole] = net;
    else {
      const nets = k === 1 ? [this.leadNet[hole]!] : this.crowded.get(hole)!;
      let i = 0;
      while (i < nets.length && nets[i]! < net) i++;
      nets.splice(i, 0, net);
      this.crowded.set(hole, nets);
    }
    this.leadCount[hole] = k + 1;
    if (k === 0) this.setBit(this.leadBits, hole, true);
    this.mark(this.map.cond[hole]!, 2);
  }

  remove(hole: number, net: number): void {
    const k = this.leadCount[hole]!;
    if (k === 1 && this.leadNet[hole] === net) this.leadNet[hole] = -1;
    else {
      const nets = k > 1 ? this.crowded.get(hole)! : [];
      const i = nets.indexOf(net);
      if (i < 0) throw new Error(`copper tally: no lead of net ${net} at hole ${hole}`);
      nets.splice(i, 1);
      if (nets.length === 1) {
        this.leadNet[hole] = nets[0]!;
        this.crowded.delete(hole);
      }
    }
    this.leadCount[hole] = k - 1;
    if (k === 1) this.setBit(this.leadBits, hole, false);
    this.mark(this.map.cond[hole]!, 2);
  }

  /** A body came or went over this hole: its conductor's landing room may have changed. */
  touchHole(hole: number): void {
    this.setBit(this.freeBits, hole, this.owner[hole] === -1 && !this.blocked[hole]);
    this.mark(this.map.cond[hole]!, 1);
  }

  private mark(c: number, why: number): void {
    if (!this.isDirty[c]) this.dirty[this.nDirty++] = c;
    this.isDirty[c]! |= why;
  }

  /** Whether conductor c's runs would be starved exactly as they are (its leads unchanged). */
  private sameRoom(c: number): boolean {
    const lo = this.runLo[c]!;
    const hi = this.runHi[c]!;
    const starved = this.starvedRuns[c]!;
    const end = this.map.holes[c]!.length - 1;
    for (let i = 0; i < lo.length; i++) if ((this.freeWithin(c, Math.max(0, lo[i]!), Math.min(hi[i]!, end)) ? 0 : 1) !== starved[i]) return false;
    return true;
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

  private clearLog(): void {
    for (let k = 0; k < this.nLog; k++) this.logAt[this.logCond[k]!] = -1;
    this.nLog = 0;
  }

  /** Recount dirty conductors; calls `touched(net)` for every net whose segments changed. */
  flush(touched: (net: number) => void): void {
    this.clearLog();
    for (let d = 0; d < this.nDirty; d++) {
      const c = this.dirty[d]!;
      const why = this.isDirty[c]!;
      this.isDirty[c] = 0;
      // Only bodies came or went and every run keeps its landing room: nothing changes.
      if (why === 1 && this.sameRoom(c)) continue;
      this.logAt[c] = this.nLog;
      this.logCond[this.nLog] = c;
      this.logCramped[this.nLog++] = this.crampedOf[c]!;
      this.recount(c, touched);
    }
    this.nDirty = 0;
  }

  /** Conductor c's runs, from its leads in copper order, into the spare arrays; then swapped in. */
  private recount(c: number, touched: (net: number) => void): void {
    const line = this.map.holes[c]!;
    const pos = this.map.pos;
    if (this.spareRuns[c] === NONE) {
      // First or second recount of this conductor: give it arrays of its own.
      this.spareRuns[c] = [];
      this.spareLo[c] = [];
      this.spareHi[c] = [];
      this.spareStarved[c] = [];
    }
    const fresh = this.spareRuns[c]!;
    const lo = this.spareLo[c]!;
    const hi = this.spareHi[c]!;
    const starved = this.spareStarved[c]!;
    // Runs in copper order; each may use its own holes and the gaps on either side.
    let n = 0;
    let last = -1;
    let lastPos = -2;
    let cramped = 0;
    const base = c * this.words;
    for (let w = 0; w < this.words; w++) {
      let bits = this.leadBits[base + w]!;
      while (bits) {
        const bit = bits & -bits;
        bits ^= bit;
        const h = line[(w << 5) + 31 - Math.clz32(bit)]!;
        const p = pos[h]!;
        const count = this.leadCount[h]!;
        const crowd = count > 1 ? this.crowded.get(h)! : undefined;
        for (let j = 0; j < count; j++) {
          const net = crowd ? crowd[j]! : this.leadNet[h]!;
          if (net !== last) {
            if (last !== -1) {
              if (p - lastPos < 2) cramped++;
              hi[n - 1] = p - 1;
            }
            fresh[n] = net;
            lo[n] = last === -1 ? 0 : lastPos + 1;
            n++;
          }
          last = net;
          lastPos = p;
        }
      }
    }
    // (Setting an array's length is slow: only when it shrinks.)
    if (fresh.length > n) {
      fresh.length = n;
      lo.length = n;
    }
    if (hi.length > n) hi.length = n;
    if (starved.length > n) starved.length = n;
    if (n) hi[n - 1] = line.length - 1;
    // A run is starved when no free hole lies in its reach (positions read as indices into the line).
    for (let i = 0; i < n; i++) starved[i] = this.freeWithin(c, Math.max(0, lo[i]!), Math.min(hi[i]!, line.length - 1)) ? 0 : 1;
    this.setRuns(c, cramped, touched);
  }

  /**
   * Flush after the leads and bodies of the last flush were put back exactly as they were:
   * the conductors it recounted get their old runs back instead of a recount (any other
   * dirty conductor is recounted as usual).
   */
  flushBack(touched: (net: number) => void): void {
    let again = 0;
    for (let d = 0; d < this.nDirty; d++) {
      const c = this.dirty[d]!;
      const k = this.logAt[c]!;
      if (k < 0) {
        this.dirty[again++] = c;
        continue;
      }
      this.isDirty[c] = 0;
      this.setRuns(c, this.logCramped[k]!, touched);
    }
    this.nDirty = again;
    this.clearLog();
    if (again) this.flush(touched);
  }

  /** Swap conductor c's spare runs in, keeping segments, cuts, links and cramped counts in step. */
  private setRuns(c: number, cramped: number, touched: (net: number) => void): void {
    const old = this.runs[c]!;
    const oldStarved = this.starvedRuns[c]!;
    const oldLo = this.runLo[c]!;
    const oldHi = this.runHi[c]!;
    const fresh = this.spareRuns[c]!;
    const lo = this.spareLo[c]!;
    const hi = this.spareHi[c]!;
    const starved = this.spareStarved[c]!;
    this.cuts -= old.length > 1 ? old.length - 1 : 0;
    this.cramped -= this.crampedOf[c]!;
    // Both lists run in copper order: merge them. A run that stays (same start, net and
    // landing room) keeps its segment count; one that stays with another end is told about
    // (its link lanes may change); the others come or go.
    let i = 0;
    let j = 0;
    while (i < old.length || j < fresh.length) {
      const a = i < old.length ? oldLo[i]! : Infinity;
      const b = j < fresh.length ? lo[j]! : Infinity;
      if (a < b) {
        this.bump(old[i]!, -1, -oldStarved[i]!);
        touched(old[i++]!);
      } else if (b < a) {
        this.bump(fresh[j]!, 1, starved[j]!);
        touched(fresh[j++]!);
      } else {
        if (old[i] !== fresh[j] || oldStarved[i] !== starved[j]) {
          this.bump(old[i]!, -1, -oldStarved[i]!);
          this.bump(fresh[j]!, 1, starved[j]!);
        }
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
    this.runLo[c] = lo;
    this.runHi[c] = hi;
    this.starvedRuns[c] = starved;
    this.spareRuns[c] = old;
    this.spareLo[c] = oldLo;
    this.spareHi[c] = oldHi;
    this.spareStarved[c] = oldStarved;
  }
}
