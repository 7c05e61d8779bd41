/**
 * `PlaceState` — a placement on one board and its cost, updated move by move.
 *
 * Holds each part's anchor and pose, a body-occupancy grid (bodies may not overlap, lie off
 * the board or in a keep-out area), the copper tally (cuts, links), per-net lead lists with
 * their bounding boxes (link-length and wire-length estimates) and per-row/column body counts
 * (the board area, since the board is cut to size). `place`/`lift` move parts, `setNet`
 * changes the net of one pin (gate swaps); `moveMany`/`moveParts` move several at once or
 * none; `settle()` brings the counts up to date and `settleBack()` does so after the last
 * settle's moves were undone exactly; cost.ts combines the cached terms with its weights.
 * Nothing here draws random numbers.
 *
 * Every pose's body and pins are copied into flat typed arrays (`poseBase[p] + pose` indexes
 * them), so the move loop reads no objects.
 */
import type { CopperMap } from './copper-map.ts';
import { CopperTally } from './copper-tally.ts';
import { blockedPairs } from './channels.ts';
import type { PlaceProblem } from './problem.ts';

export interface Spot {
  x: number;
  y: number;
  pose: number;
}

/** Stamps start again from 1 past this (they are kept in Int32Arrays). */
const STAMP_LIMIT = 2 ** 30;

export class PlaceState {
  readonly W: number;
  readonly H: number;
  readonly x: Int32Array;
  readonly y: Int32Array;
  /** Pose index per part, −1 while unplaced. */
  readonly pose: Int32Array;
  readonly pinNet: number[][];
  readonly owner: Int32Array;
  readonly blocked: Uint8Array;
  readonly tally: CopperTally;
  readonly netHoles: number[][];
  readonly netLen: Float64Array;
  /** Each net's lead box as of the last settle (see recount). */
  readonly netMinX: Int32Array;
  readonly netMaxX: Int32Array;
  readonly netMinY: Int32Array;
  readonly netMaxY: Int32Array;
  /** Per net with links to make: the columns its segments reach (set by blockedPairs). */
  readonly netReachLo: Int32Array;
  readonly netReachHi: Int32Array;
  lenSum = 0;
  /** Per net: segment pairs with no clear straight link (strip boards only), and their weighted sum. */
  readonly netBlocked: Int32Array;
  blockedSum = 0;
  /**
   * Per net: the lanes its last verdict looked at, (x0, x1, y0, y1) for each pair of its
   * segments on different rows that share columns (set by blockedPairs). A net whose leads
   * did not change is judged again only when a moved body touches one of them. Two slots per
   * net (entry 2·net + slot, `laneSlot[net]` the current one): a verdict writes the other
   * slot and turns to it, settleBack turns back. `laneCount` of a slot is −1 while its lanes
   * are unknown (never judged, or fewer than two segments): then the whole reach counts.
   */
  readonly laneRects: Int32Array[];
  readonly laneCount: Int32Array;
  readonly laneSlot: Uint8Array;
  /**
   * Pad boards only: over all leads, 2 for one whose four neighbouring holes all hold leads
   * and 1/2 for one with a single free neighbour (congestion.ts), kept as leads come and go.
   */
  boxedLeads = 0;
  /** Flat pose tables: part p's pose k is entry poseBase[p] + k. */
  readonly poseBase: Int32Array;
  readonly poseMinX: Int32Array;
  readonly poseMinY: Int32Array;
  readonly poseMaxX: Int32Array;
  readonly poseMaxY: Int32Array;
  /** Body cells of pose entry g: bodyX/bodyY[bodyOff[g] .. bodyOff[g + 1]). */
  private readonly bodyOff: Int32Array;
  private readonly bodyX: Int32Array;
  private readonly bodyY: Int32Array;
  /** Pin i of pose entry g: pinX/pinY[pinOff[g] + i]. */
  readonly pinOff: Int32Array;
  readonly pinX: Int32Array;
  readonly pinY: Int32Array;
  private bodyRowLo = Infinity;
  private bodyRowHi = -Infinity;
  private bodyColLo = Infinity;
  private bodyColHi = -Infinity;
  readonly rowCount: Int32Array;
  readonly colCount: Int32Array;
  /** Nets to recount at the next settle (the first nDirtyNets entries). */
  private readonly dirtyNets: Int32Array;
  private nDirtyNets = 0;
  /** Link-lane verdicts the last settle changed: net, old count, old reach lo, old reach hi (for settleBack). */
  private readonly laneLog: number[] = [];
  /** Nets the last settle judged (their lane slots turn back when it is undone). */
  private readonly laneJudged: number[] = [];
  private readonly netDirty: Uint8Array;
  /** Each net's lead box as its leads come and go (−1 / 1e9 when empty); stale after a lead on its edge left. */
  private readonly boxX0: Int32Array;
  private readonly boxX1: Int32Array;
  private readonly boxY0: Int32Array;
  private readonly boxY1: Int32Array;
  private readonly boxStale: Uint8Array;
  /** Placed parts by the column of their body's left edge and by the row of its top edge: one bit per part, `partWords` words per column or row. */
  readonly partWords: number;
  private readonly byLeft: Int32Array;
  private readonly byTop: Int32Array;
  /** Index of each hole's lead in its net's list (−1 none), while no hole holds two leads. */
  private readonly leadIdx: Int32Array;
  private twoInOneHole = false;
  /** Some pose has a pin outside its body, so leads of two parts might meet in a hole. */
  private readonly loosePins: boolean;
  /** Stamps for checking a move of several parts before making it. */
  private readonly moving: Int32Array;
  private readonly claimed: Int32Array;
  private stamp = 0;
  private readonly touchNet = (net: number): void => this.markNet(net);

  constructor(
    readonly problem: PlaceProblem,
    readonly map: CopperMap,
    blocked?: Uint8Array,
    /** Judge link lanes (blockedPairs) as parts move; off when their weight is 0. */
    private readonly judgeLanes = true,
  ) {
    this.W = map.cols;
    this.H = map.rows;
    const n = problem.parts.length;
    this.x = new Int32Array(n);
    this.y = new Int32Array(n);
    this.pose = new Int32Array(n).fill(-1);
    this.pinNet = problem.parts.map((p) => p.pinNet.slice());
    this.owner = new Int32Array(this.W * this.H).fill(-1);
    this.blocked = blocked ?? new Uint8Array(this.W * this.H);
    const nets = problem.nets.length;
    this.tally = new CopperTally(map, nets, this.owner, this.blocked);
    this.netHoles = Array.from({ length: nets }, () => []);
    this.netLen = new Float64Array(nets);
    this.netMinX = new Int32Array(nets);
    this.netMaxX = new Int32Array(nets);
    this.netMinY = new Int32Array(nets);
    this.netMaxY = new Int32Array(nets);
    this.netReachLo = new Int32Array(nets);
    this.netReachHi = new Int32Array(nets);
    this.netDirty = new Uint8Array(nets);
    this.dirtyNets = new Int32Array(nets);
    this.boxX0 = new Int32Array(nets).fill(1e9);
    this.boxX1 = new Int32Array(nets).fill(-1);
    this.boxY0 = new Int32Array(nets).fill(1e9);
    this.boxY1 = new Int32Array(nets).fill(-1);
    this.boxStale = new Uint8Array(nets);
    this.partWords = (n + 31) >> 5;
    this.byLeft = new Int32Array(this.W * this.partWords);
    this.byTop = new Int32Array(this.H * this.partWords);
    this.netBlocked = new Int32Array(nets);
    this.laneRects = Array.from({ length: 2 * nets }, () => new Int32Array(0));
    this.laneCount = new Int32Array(2 * nets).fill(-1);
    this.laneSlot = new Uint8Array(nets);
    this.rowCount = new Int32Array(this.H);
    this.colCount = new Int32Array(this.W);
    this.leadIdx = new Int32Array(this.W * this.H).fill(-1);
    this.moving = new Int32Array(n);
    this.claimed = new Int32Array(this.W * this.H);
    const poses = problem.parts.flatMap((p) => p.poses);
    this.poseBase = new Int32Array(n + 1);
    problem.parts.forEach((p, i) => (this.poseBase[i + 1] = this.poseBase[i]! + p.poses.length));
    this.poseMinX = Int32Array.from(poses, (o) => o.minX);
    this.poseMinY = Int32Array.from(poses, (o) => o.minY);
    this.poseMaxX = Int32Array.from(poses, (o) => o.maxX);
    this.poseMaxY = Int32Array.from(poses, (o) => o.maxY);
    this.bodyOff = new Int32Array(poses.length + 1);
    this.pinOff = new Int32Array(poses.length + 1);
    poses.forEach((o, g) => {
      this.bodyOff[g + 1] = this.bodyOff[g]! + o.body.length;
      this.pinOff[g + 1] = this.pinOff[g]! + o.pins.length;
    });
    this.bodyX = Int32Array.from(poses.flatMap((o) => o.body.map((b) => b[0])));
    this.bodyY = Int32Array.from(poses.flatMap((o) => o.body.map((b) => b[1])));
    this.pinX = Int32Array.from(poses.flatMap((o) => o.pins.map((b) => b[0])));
    this.pinY = Int32Array.from(poses.flatMap((o) => o.pins.map((b) => b[1])));
    this.loosePins = poses.some((o) => o.pins.some((q) => !o.body.some((b) => b[0] === q[0] && b[1] === q[1])));
  }

  /** Whether part p fits at the spot, ignoring its own current body. */
  fits(p: number, s: Spot): boolean {
    return this.fitsAt(p, s.x, s.y, s.pose);
  }

  fitsAt(p: number, x: number, y: number, pose: number): boolean {
    if (!(pose >= 0 && pose < this.poseBase[p + 1]! - this.poseBase[p]!)) return false;
    const g = this.poseBase[p]! + pose;
    if (x + this.poseMinX[g]! < 0 || y + this.poseMinY[g]! < 0 || x + this.poseMaxX[g]! >= this.W || y + this.poseMaxY[g]! >= this.H) return false;
    const end = this.bodyOff[g + 1]!;
    for (let b = this.bodyOff[g]!; b < end; b++) {
      const k = x + this.bodyX[b]! + (y + this.bodyY[b]!) * this.W;
      const o = this.owner[k]!;
      if ((o !== -1 && o !== p) || this.blocked[k]) return false;
    }
    return true;
  }

  /** Put an unplaced part down at a spot that fits. */
  place(p: number, s: Spot): void {
    this.placeAt(p, s.x, s.y, s.pose);
  }

  private placeAt(p: number, x: number, y: number, pose: number): void {
    const g = this.poseBase[p]! + pose;
    this.x[p] = x;
    this.y[p] = y;
    this.pose[p] = pose;
    this.byLeft[(x + this.poseMinX[g]!) * this.partWords + (p >> 5)]! |= 1 << (p & 31);
    this.byTop[(y + this.poseMinY[g]!) * this.partWords + (p >> 5)]! |= 1 << (p & 31);
    const W = this.W;
    const end = this.bodyOff[g + 1]!;
    for (let b = this.bodyOff[g]!; b < end; b++) {
      const cx = x + this.bodyX[b]!;
      const cy = y + this.bodyY[b]!;
      this.owner[cx + cy * W] = p;
      this.tally.touchHole(cx + cy * W);
      this.bodyAt(cx, cy);
      this.rowCount[cy]!++;
      this.colCount[cx]!++;
    }
    const nets = this.pinNet[p]!;
    const q = this.pinOff[g]!;
    for (let i = 0; i < nets.length; i++) this.addLead(x + this.pinX[q + i]! + (y + this.pinY[q + i]!) * W, nets[i]!);
  }

  /** Take a placed part off the board. */
  lift(p: number): void {
    const k = this.pose[p]!;
    if (k < 0) return;
    const g = this.poseBase[p]! + k;
    const x = this.x[p]!;
    const y = this.y[p]!;
    const W = this.W;
    const end = this.bodyOff[g + 1]!;
    for (let b = this.bodyOff[g]!; b < end; b++) {
      const cx = x + this.bodyX[b]!;
      const cy = y + this.bodyY[b]!;
      this.owner[cx + cy * W] = -1;
      this.tally.touchHole(cx + cy * W);
      this.bodyAt(cx, cy);
      this.rowCount[cy]!--;
      this.colCount[cx]!--;
    }
    const nets = this.pinNet[p]!;
    const q = this.pinOff[g]!;
    for (let i = 0; i < nets.length; i++) this.removeLead(x + this.pinX[q + i]! + (y + this.pinY[q + i]!) * W, nets[i]!);
    this.byLeft[(x + this.poseMinX[g]!) * this.partWords + (p >> 5)]! &= ~(1 << (p & 31));
    this.byTop[(y + this.poseMinY[g]!) * this.partWords + (p >> 5)]! &= ~(1 << (p & 31));
    this.pose[p] = -1;
  }

  /**
   * The placed parts among `mask` (a bit per part) whose body's top row (`rows`) or left
   * column lies in [from, to), in ascending order into `out`; returns how many.
   */
  partsWithin(rows: boolean, from: number, to: number, mask: Int32Array, out: Int32Array): number {
    const bits = rows ? this.byTop : this.byLeft;
    const words = this.partWords;
    const lo = Math.max(0, from);
    const hi = Math.min(to, rows ? this.H : this.W);
    let n = 0;
    for (let w = 0; w < words; w++) {
      let v = 0;
      for (let line = lo; line < hi; line++) v |= bits[line * words + w]!;
      v &= mask[w]!;
      while (v) {
        const bit = v & -v;
        v ^= bit;
        out[n++] = (w << 5) + 31 - Math.clz32(bit);
      }
    }
    return n;
  }

  spotOf(p: number): Spot {
    return { x: this.x[p]!, y: this.y[p]!, pose: this.pose[p]! };
  }

  /** Move several parts at once; false (and nothing changed) when any spot does not fit. */
  moveMany(parts: number[], spots: Spot[]): boolean {
    return this.moveParts(
      parts,
      spots.map((s) => s.x),
      spots.map((s) => s.y),
      spots.map((s) => s.pose),
      parts.length,
    );
  }

  /**
   * `moveMany` for the first n entries of flat arrays. The parts are lifted in order and put
   * down in order; when one would not fit, all go back where they were. Whether one will not
   * fit is checked first, against the board as it would be, so a refused move lifts nothing
   * and leaves nothing to recount (a recount would find the same counts). Only the order of
   * the net lead lists, which the hop move draws from, is brought to what lifting every part
   * and putting it back gives, so that runs stay as they always were for a seed. This holds
   * while every lead lies under its own body (the footprint contract); otherwise, and for
   * unplaced or repeated parts, the parts really are lifted and put down.
   */
  moveParts(parts: ArrayLike<number>, xs: ArrayLike<number>, ys: ArrayLike<number>, poses: ArrayLike<number>, n: number): boolean {
    if (this.loosePins || this.twoInOneHole) return this.moveSlowly(parts, xs, ys, poses, n);
    if (this.stamp === STAMP_LIMIT) {
      this.stamp = 0;
      this.moving.fill(0);
      this.claimed.fill(0);
    }
    const stamp = ++this.stamp;
    for (let i = 0; i < n; i++) {
      const p = parts[i]!;
      // Unplaced or repeated parts: the plain way round (never seen in the annealer).
      if (this.pose[p]! < 0 || this.moving[p] === stamp) return this.moveSlowly(parts, xs, ys, poses, n);
      this.moving[p] = stamp;
    }
    for (let i = 0; i < n; i++) {
      if (this.fitsAmong(parts[i]!, xs[i]!, ys[i]!, poses[i]!, stamp)) continue;
      for (let j = 0; j < n; j++) this.unlistPins(parts[j]!);
      for (let j = 0; j < n; j++) this.relistPins(parts[j]!);
      return false;
    }
    for (let i = 0; i < n; i++) this.lift(parts[i]!);
    for (let i = 0; i < n; i++) this.placeAt(parts[i]!, xs[i]!, ys[i]!, poses[i]!);
    return true;
  }

  /** fitsAt on the board with the moving parts lifted and the earlier ones put down (claimed with the stamp). */
  private fitsAmong(p: number, x: number, y: number, pose: number, stamp: number): boolean {
    if (!(pose >= 0 && pose < this.poseBase[p + 1]! - this.poseBase[p]!)) return false;
    const g = this.poseBase[p]! + pose;
    if (x + this.poseMinX[g]! < 0 || y + this.poseMinY[g]! < 0 || x + this.poseMaxX[g]! >= this.W || y + this.poseMaxY[g]! >= this.H) return false;
    const start = this.bodyOff[g]!;
    const end = this.bodyOff[g + 1]!;
    for (let b = start; b < end; b++) {
      const k = x + this.bodyX[b]! + (y + this.bodyY[b]!) * this.W;
      const o = this.owner[k]!;
      if (this.blocked[k] || this.claimed[k] === stamp || (o !== -1 && this.moving[o] !== stamp)) return false;
    }
    for (let b = start; b < end; b++) this.claimed[x + this.bodyX[b]! + (y + this.bodyY[b]!) * this.W] = stamp;
    return true;
  }

  private moveSlowly(parts: ArrayLike<number>, xs: ArrayLike<number>, ys: ArrayLike<number>, poses: ArrayLike<number>, n: number): boolean {
    const old: Spot[] = [];
    for (let i = 0; i < n; i++) old.push(this.spotOf(parts[i]!));
    for (let i = 0; i < n; i++) this.lift(parts[i]!);
    let i = 0;
    for (; i < n; i++) {
      if (!this.fitsAt(parts[i]!, xs[i]!, ys[i]!, poses[i]!)) break;
      this.placeAt(parts[i]!, xs[i]!, ys[i]!, poses[i]!);
    }
    if (i === n) return true;
    for (let j = 0; j < i; j++) this.lift(parts[j]!);
    for (let j = 0; j < n; j++) if (old[j]!.pose >= 0) this.place(parts[j]!, old[j]!);
    return false;
  }

  /** Take a placed part's leads out of the net lists only (the first half of a lift). */
  private unlistPins(p: number): void {
    const g = this.poseBase[p]! + this.pose[p]!;
    const nets = this.pinNet[p]!;
    const q = this.pinOff[g]!;
    for (let i = 0; i < nets.length; i++) this.unlist(this.x[p]! + this.pinX[q + i]! + (this.y[p]! + this.pinY[q + i]!) * this.W, nets[i]!);
  }

  private relistPins(p: number): void {
    const g = this.poseBase[p]! + this.pose[p]!;
    const nets = this.pinNet[p]!;
    const q = this.pinOff[g]!;
    for (let i = 0; i < nets.length; i++) this.list(this.x[p]! + this.pinX[q + i]! + (this.y[p]! + this.pinY[q + i]!) * this.W, nets[i]!);
  }

  /** Change the net of one pin (a gate swap). */
  setNet(p: number, pin: number, net: number): void {
    const old = this.pinNet[p]![pin]!;
    if (old === net) return;
    const k = this.pose[p]!;
    if (k >= 0) {
      const q = this.pinOff[this.poseBase[p]! + k]! + pin;
      const hole = this.x[p]! + this.pinX[q]! + (this.y[p]! + this.pinY[q]!) * this.W;
      this.removeLead(hole, old);
      this.pinNet[p]![pin] = net;
      this.addLead(hole, net);
    } else this.pinNet[p]![pin] = net;
  }

  /** Put a lead into (or take it out of) the copper tally, the hemmed-in count and the net's lists. */
  private tallyLead(hole: number, net: number, add: boolean): void {
    if (this.map.padLike) this.boxedLeads -= this.boxedAround(hole);
    if (add) this.tally.add(hole, net);
    else this.tally.remove(hole, net);
    if (this.map.padLike) this.boxedLeads += this.boxedAround(hole);
    if (add) this.list(hole, net);
    else this.unlist(hole, net);
    this.markNet(net);
  }

  private addLead(hole: number, net: number): void {
    this.tallyLead(hole, net, true);
    const hx = hole % this.W;
    const hy = (hole - hx) / this.W;
    if (hx < this.boxX0[net]!) this.boxX0[net] = hx;
    if (hx > this.boxX1[net]!) this.boxX1[net] = hx;
    if (hy < this.boxY0[net]!) this.boxY0[net] = hy;
    if (hy > this.boxY1[net]!) this.boxY1[net] = hy;
  }

  private removeLead(hole: number, net: number): void {
    this.tallyLead(hole, net, false);
    const hx = hole % this.W;
    const hy = (hole - hx) / this.W;
    if (hx === this.boxX0[net] || hx === this.boxX1[net] || hy === this.boxY0[net] || hy === this.boxY1[net]) this.boxStale[net] = 1;
  }

  /** The boxedLeads terms of a hole and its four neighbours (the ones a lead there touches). */
  private boxedAround(h: number): number {
    const W = this.W;
    const x = h % W;
    let sum = this.boxedAt(h);
    if (x > 0) sum += this.boxedAt(h - 1);
    if (x + 1 < W) sum += this.boxedAt(h + 1);
    if (h >= W) sum += this.boxedAt(h - W);
    if (h + W < W * this.H) sum += this.boxedAt(h + W);
    return sum;
  }

  private boxedAt(h: number): number {
    const lead = this.tally.leadCount;
    if (!lead[h]) return 0;
    const W = this.W;
    const x = h % W;
    let free = 0;
    if (x > 0 && !lead[h - 1]) free++;
    if (x + 1 < W && !lead[h + 1]) free++;
    if (h >= W && !lead[h - W]) free++;
    if (h + W < W * this.H && !lead[h + W]) free++;
    return lead[h]! * (free === 0 ? 2 : free === 1 ? 0.5 : 0);
  }

  /** Measure a net's lead box afresh (after a lead on its edge left). */
  private rebox(net: number): void {
    const holes = this.netHoles[net]!;
    const W = this.W;
    let x0 = 1e9, x1 = -1, y0 = 1e9, y1 = -1;
    for (let i = 0; i < holes.length; i++) {
      const h = holes[i]!;
      const hx = h % W;
      const hy = (h - hx) / W;
      if (hx < x0) x0 = hx;
      if (hx > x1) x1 = hx;
      if (hy < y0) y0 = hy;
      if (hy > y1) y1 = hy;
    }
    this.boxX0[net] = x0;
    this.boxX1[net] = x1;
    this.boxY0[net] = y0;
    this.boxY1[net] = y1;
    this.boxStale[net] = 0;
  }

  private list(hole: number, net: number): void {
    const list = this.netHoles[net]!;
    if (this.leadIdx[hole] !== -1) this.twoInOneHole = true;
    this.leadIdx[hole] = list.length;
    list.push(hole);
  }

  /** Take a hole out of its net's list: the last entry fills its place. */
  private unlist(hole: number, net: number): void {
    const list = this.netHoles[net]!;
    const i = this.twoInOneHole ? list.indexOf(hole) : this.leadIdx[hole]!;
    const last = list.pop()!;
    if (i < list.length) {
      list[i] = last;
      this.leadIdx[last] = i;
    }
    this.leadIdx[hole] = -1;
  }

  private bodyAt(x: number, y: number): void {
    if (y < this.bodyRowLo) this.bodyRowLo = y;
    if (y > this.bodyRowHi) this.bodyRowHi = y;
    if (x < this.bodyColLo) this.bodyColLo = x;
    if (x > this.bodyColHi) this.bodyColHi = x;
  }

  private markNet(net: number): void {
    if (!this.netDirty[net]) {
      this.netDirty[net] = 1;
      this.dirtyNets[this.nDirtyNets++] = net;
    }
  }

  /** Bring cuts, links and per-net estimates up to date after moves. */
  settle(): void {
    if (this.laneLog.length) this.laneLog.length = 0;
    if (this.laneJudged.length) this.laneJudged.length = 0;
    this.recount(false);
  }

  /**
   * Settle after undoing the moves of the last settle exactly (same parts back at the same
   * spots, same nets): the link-lane verdicts are put back as they were instead of judged
   * again, since the bodies and leads they looked at are back too.
   */
  settleBack(): void {
    this.recount(true);
    const log = this.laneLog;
    for (let i = log.length - 4; i >= 0; i -= 4) {
      const n = log[i]!;
      this.blockedSum += (log[i + 1]! - this.netBlocked[n]!) * this.tally.weight[n]!;
      this.netBlocked[n] = log[i + 1]!;
      this.netReachLo[n] = log[i + 2]!;
      this.netReachHi[n] = log[i + 3]!;
    }
    if (log.length) log.length = 0;
    for (const n of this.laneJudged) this.laneSlot[n]! ^= 1;
    if (this.laneJudged.length) this.laneJudged.length = 0;
  }

  private recount(back: boolean): void {
    if (back) this.tally.flushBack(this.touchNet);
    else this.tally.flush(this.touchNet);
    const pad = this.map.padLike;
    const rows = this.map.alongRows;
    for (let d = 0; d < this.nDirtyNets; d++) {
      const net = this.dirtyNets[d]!;
      const holes = this.netHoles[net]!;
      if (this.boxStale[net]) this.rebox(net);
      const x0 = this.boxX0[net]!;
      const x1 = this.boxX1[net]!;
      const y0 = this.boxY0[net]!;
      const y1 = this.boxY1[net]!;
      this.netMinX[net] = x0;
      this.netMaxX[net] = x1;
      this.netMinY[net] = y0;
      this.netMaxY[net] = y1;
      let len = 0;
      if (holes.length > 1) {
        // Pad boards: half-perimeter wire length. Strip boards: links run across the
        // strips, so the row spread counts in full and the column spread a little.
        if (pad) len = x1 - x0 + (y1 - y0);
        else if (this.tally.segs[net]! > 1) len = rows ? y1 - y0 + 0.25 * (x1 - x0) : x1 - x0 + (y1 - y0);
      }
      this.lenSum += len - this.netLen[net]!;
      this.netLen[net] = len;
    }
    if (rows && this.judgeLanes && !back) {
      // Re-judge link channels of nets whose leads moved and of nets spanning moved bodies.
      const lo = this.bodyRowLo;
      const hi = this.bodyRowHi;
      const xlo = this.bodyColLo;
      const xhi = this.bodyColHi;
      const segs = this.tally.segs;
      for (let n = 0; n < this.netBlocked.length; n++) {
        if (!this.netDirty[n] && (segs[n]! < 2 || this.netMaxY[n]! < lo || this.netMinY[n]! > hi || this.netReachHi[n]! < xlo || this.netReachLo[n]! > xhi)) {
          if (segs[n]! < 2 && this.netBlocked[n]) {
            this.laneLog.push(n, this.netBlocked[n]!, this.netReachLo[n]!, this.netReachHi[n]!);
            this.setBlocked(n, 0);
          }
          continue;
        }
        // Leads as they were and lanes known: judged again only when a moved body touches a lane.
        if (!this.netDirty[n] && !this.laneTouched(n, xlo, xhi, lo, hi)) continue;
        this.laneJudged.push(n);
        const before = this.netBlocked[n]!;
        const lo0 = this.netReachLo[n]!;
        const hi0 = this.netReachHi[n]!;
        const v = blockedPairs(this, n);
        if (v !== before || this.netReachLo[n] !== lo0 || this.netReachHi[n] !== hi0) this.laneLog.push(n, before, lo0, hi0);
        this.setBlocked(n, v);
      }
    }
    for (let d = 0; d < this.nDirtyNets; d++) this.netDirty[this.dirtyNets[d]!] = 0;
    this.bodyRowLo = Infinity;
    this.bodyRowHi = -Infinity;
    this.bodyColLo = Infinity;
    this.bodyColHi = -Infinity;
    this.nDirtyNets = 0;
  }

  /** Whether the box of moved body cells [x0, x1] × [y0, y1] meets one of net n's lanes (lanes unknown: true). */
  private laneTouched(n: number, x0: number, x1: number, y0: number, y1: number): boolean {
    const k = 2 * n + this.laneSlot[n]!;
    if (this.laneCount[k]! < 0) return true;
    const r = this.laneRects[k]!;
    const end = this.laneCount[k]! * 4;
    for (let i = 0; i < end; i += 4) if (r[i]! <= x1 && r[i + 1]! >= x0 && r[i + 2]! <= y1 && r[i + 3]! >= y0) return true;
    return false;
  }

  private setBlocked(n: number, v: number): void {
    this.blockedSum += (v - this.netBlocked[n]!) * this.tally.weight[n]!;
    this.netBlocked[n] = v;
  }

  /** Weigh a net's links, stranded segments and blocked pairs `w` times. */
  weighNet(n: number, w: number): void {
    this.blockedSum += this.netBlocked[n]! * (w - this.tally.weight[n]!);
    this.tally.weigh(n, w);
  }

  /** Bounding box of all bodies, or undefined when nothing is placed. */
  bounds(): { x0: number; y0: number; x1: number; y1: number } | undefined {
    let x0 = 0;
    while (x0 < this.W && this.colCount[x0] === 0) x0++;
    if (x0 === this.W) return undefined;
    let x1 = this.W - 1;
    while (this.colCount[x1] === 0) x1--;
    let y0 = 0;
    while (this.rowCount[y0] === 0) y0++;
    let y1 = this.H - 1;
    while (this.rowCount[y1] === 0) y1--;
    return { x0, y0, x1, y1 };
  }
}
