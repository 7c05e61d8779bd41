/**
 * `PlaceState` — a placement on one board and its cost, updated move by move.
 *
 * Holds each part's anchor and pose, a body-occupancy grid (bodies may not overlap, lie off
 * the board or in a keep-out area), the copper tally (cuts, links), per-net lead lists with
 * their bounding boxes (link-length and wire-length estimates) and per-row/column body counts
 * (the board area, since the board is cut to size). `place`/`lift` move parts, `setNet`
 * changes the net of one pin (gate swaps); `settle()` brings the counts up to date and
 * `settleBack()` does so after the last settle's moves were undone exactly; `cost()` combines the cached terms with the
 * weights in cost.ts. Nothing here draws random numbers.
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
  readonly netMinY: Int32Array;
  readonly netMaxY: Int32Array;
  /** Per net with links to make: the columns its segments reach (set by blockedPairs). */
  readonly netReachLo: Int32Array;
  readonly netReachHi: Int32Array;
  lenSum = 0;
  /** Per net: segment pairs with no clear straight link (strip boards only), and their weighted sum. */
  readonly netBlocked: Int32Array;
  blockedSum = 0;
  private bodyRowLo = Infinity;
  private bodyRowHi = -Infinity;
  private bodyColLo = Infinity;
  private bodyColHi = -Infinity;
  readonly rowCount: Int32Array;
  readonly colCount: Int32Array;
  private readonly dirtyNets: number[] = [];
  /** Link-lane verdicts the last settle changed: net, old count, old reach lo, old reach hi (for settleBack). */
  private readonly laneLog: number[] = [];
  private readonly netDirty: Uint8Array;

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
    this.netMinY = new Int32Array(nets);
    this.netMaxY = new Int32Array(nets);
    this.netReachLo = new Int32Array(nets);
    this.netReachHi = new Int32Array(nets);
    this.netDirty = new Uint8Array(nets);
    this.netBlocked = new Int32Array(nets);
    this.rowCount = new Int32Array(this.H);
    this.colCount = new Int32Array(this.W);
  }

  /** Whether part p fits at the spot, ignoring its own current body. */
  fits(p: number, s: Spot): boolean {
    const pose = this.problem.parts[p]!.poses[s.pose];
    if (!pose) return false;
    if (s.x + pose.minX < 0 || s.y + pose.minY < 0 || s.x + pose.maxX >= this.W || s.y + pose.maxY >= this.H) return false;
    for (const b of pose.body) {
      const k = s.x + b[0] + (s.y + b[1]) * this.W;
      const o = this.owner[k]!;
      if ((o !== -1 && o !== p) || this.blocked[k]) return false;
    }
    return true;
  }

  /** Put an unplaced part down at a spot that fits. */
  place(p: number, s: Spot): void {
    const part = this.problem.parts[p]!;
    const pose = part.poses[s.pose]!;
    this.x[p] = s.x;
    this.y[p] = s.y;
    this.pose[p] = s.pose;
    for (const b of pose.body) {
      const cx = s.x + b[0];
      const cy = s.y + b[1];
      this.owner[cx + cy * this.W] = p;
      this.tally.touchHole(cx + cy * this.W);
      this.bodyAt(cx, cy);
      this.rowCount[cy]!++;
      this.colCount[cx]!++;
    }
    const nets = this.pinNet[p]!;
    pose.pins.forEach((o, i) => this.addLead(s.x + o[0] + (s.y + o[1]) * this.W, nets[i]!));
  }

  /** Take a placed part off the board. */
  lift(p: number): void {
    const k = this.pose[p]!;
    if (k < 0) return;
    const pose = this.problem.parts[p]!.poses[k]!;
    const x = this.x[p]!;
    const y = this.y[p]!;
    for (const b of pose.body) {
      const cx = x + b[0];
      const cy = y + b[1];
      this.owner[cx + cy * this.W] = -1;
      this.tally.touchHole(cx + cy * this.W);
      this.bodyAt(cx, cy);
      this.rowCount[cy]!--;
      this.colCount[cx]!--;
    }
    const nets = this.pinNet[p]!;
    pose.pins.forEach((o, i) => this.removeLead(x + o[0] + (y + o[1]) * this.W, nets[i]!));
    this.pose[p] = -1;
  }

  spotOf(p: number): Spot {
    return { x: this.x[p]!, y: this.y[p]!, pose: this.pose[p]! };
  }

  /** Move several parts at once; false (and nothing changed) when any spot does not fit. */
  moveMany(parts: number[], spots: Spot[]): boolean {
    const old = parts.map((p) => this.spotOf(p));
    for (const p of parts) this.lift(p);
    let i = 0;
    for (; i < parts.length; i++) {
      if (!this.fits(parts[i]!, spots[i]!)) break;
      this.place(parts[i]!, spots[i]!);
    }
    if (i === parts.length) return true;
    for (let j = 0; j < i; j++) this.lift(parts[j]!);
    parts.forEach((p, j) => {
      if (old[j]!.pose >= 0) this.place(p, old[j]!);
    });
    return false;
  }

  /** Change the net of one pin (a gate swap). */
  setNet(p: number, pin: number, net: number): void {
    const old = this.pinNet[p]![pin]!;
    if (old === net) return;
    const k = this.pose[p]!;
    if (k >= 0) {
      const o = this.problem.parts[p]!.poses[k]!.pins[pin]!;
      const hole = this.x[p]! + o[0] + (this.y[p]! + o[1]) * this.W;
      this.removeLead(hole, old);
      this.pinNet[p]![pin] = net;
      this.addLead(hole, net);
    } else this.pinNet[p]![pin] = net;
  }

  private addLead(hole: number, net: number): void {
    this.tally.add(hole, net);
    this.netHoles[net]!.push(hole);
    this.markNet(net);
  }

  private removeLead(hole: number, net: number): void {
    this.tally.remove(hole, net);
    const list = this.netHoles[net]!;
    const i = list.indexOf(hole);
    list[i] = list[list.length - 1]!;
    list.pop();
    this.markNet(net);
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
      this.dirtyNets.push(net);
    }
  }

  /** Bring cuts, links and per-net estimates up to date after moves. */
  settle(): void {
    this.laneLog.length = 0;
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
    log.length = 0;
  }

  private recount(back: boolean): void {
    if (back) this.tally.flushBack((net) => this.markNet(net));
    else this.tally.flush((net) => this.markNet(net));
    const pad = this.map.padLike;
    const rows = this.map.alongRows;
    for (const net of this.dirtyNets) {
      const holes = this.netHoles[net]!;
      let x0 = 1e9, x1 = -1, y0 = 1e9, y1 = -1;
      for (const h of holes) {
        const hx = h % this.W;
        const hy = (h - hx) / this.W;
        if (hx < x0) x0 = hx;
        if (hx > x1) x1 = hx;
        if (hy < y0) y0 = hy;
        if (hy > y1) y1 = hy;
      }
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
      for (let n = 0; n < this.netBlocked.length; n++) {
        if (!this.netDirty[n] && (this.tally.segs[n]! < 2 || this.netMaxY[n]! < lo || this.netMinY[n]! > hi || this.netReachHi[n]! < xlo || this.netReachLo[n]! > xhi)) {
          if (this.tally.segs[n]! < 2 && this.netBlocked[n]) {
            this.laneLog.push(n, this.netBlocked[n]!, this.netReachLo[n]!, this.netReachHi[n]!);
            this.setBlocked(n, 0);
          }
          continue;
        }
        const before = this.netBlocked[n]!;
        const lo0 = this.netReachLo[n]!;
        const hi0 = this.netReachHi[n]!;
        const v = blockedPairs(this, n);
        if (v !== before || this.netReachLo[n] !== lo0 || this.netReachHi[n] !== hi0) this.laneLog.push(n, before, lo0, hi0);
        this.setBlocked(n, v);
      }
    }
    for (const net of this.dirtyNets) this.netDirty[net] = 0;
    this.bodyRowLo = Infinity;
    this.bodyRowHi = -Infinity;
    this.bodyColLo = Infinity;
    this.bodyColHi = -Infinity;
    this.dirtyNets.length = 0;
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
