/**
 * Footprint geometry of one placed part: do its pins keep the shape of its footprint in
 * some allowed rotation (fitPose)? When not, say why in bench terms: a two-lead span out
 * of range, a mirror image (numbered clockwise seen from the component side), or the shape
 * the footprint needs. Also the circuit's own span limit.
 *
 * `fitGeometry(fp, spots, e, path)` → `{ found, first, body, faults }`: `found` when the pins
 * keep a pose the footprint and the circuit allow (`body`: the body cells as offsets from
 * the first footprint pin at `first`, flattened dx, dy).
 */
import type { Problem } from '../model/problem.ts';
import { fitPose, poseBody, type Footprint, type Offset, type Pose } from '../parts/index.ts';
import type { ExpectedPart } from './expect.ts';
import { problem } from './words.ts';

/** Longest lead span tried when explaining an out-of-range span, in holes. */
const WIDEST_SPAN = 400;

/** Where a part's pins sit: `names[i]` at `at[i]` (undefined where not placed). */
export interface Spots {
  names: readonly string[];
  at: (Offset | undefined)[];
}

export function spotOf(s: Spots, name: string): Offset | undefined {
  const i = s.names.indexOf(name);
  return i < 0 ? undefined : s.at[i];
}

/** The pose found for one shape of pins, relative to the first pin (so it can be reused). */
interface Fit {
  found: boolean;
  span?: number;
  /** Body cells relative to the first pin: dx, dy pairs. */
  body: Int32Array;
}

/** Remembered fits, per footprint, in a tree keyed by each further pin's offset from the first. */
interface Node {
  next?: Map<number, Node>;
  fit?: Fit;
}
let fits = new WeakMap<Footprint, Node>();
let remembered = 0;
/** Bound on remembered shapes. */
const MAX_FITS = 4096;
/** Offsets up to this far (exclusive) are packed into one key. */
const REACH = 32768;

const NO_BODY = new Int32Array(0);

/**
 * The fit of a footprint for placed pins (all of fp.pinNames placed). Parts of one
 * footprint placed in one shape share the answer.
 */
function fitShape(fp: Footprint, spots: Spots, first: Offset): Fit {
  let node = fits.get(fp);
  if (!node) fits.set(fp, (node = {}));
  for (let k = 1; k < fp.pinNames.length && node; k++) {
    const p = spotOf(spots, fp.pinNames[k]!)!;
    const dx = p[0] - first[0];
    const dy = p[1] - first[1];
    if (!(Number.isInteger(dx) && Number.isInteger(dy) && Math.abs(dx) < REACH && Math.abs(dy) < REACH)) node = undefined;
    else {
      const key = (dx + REACH) * 2 * REACH + (dy + REACH);
      node.next ??= new Map();
      let child = node.next.get(key);
      if (!child) node.next.set(key, (child = {}));
      node = child;
    }
  }
  if (node?.fit) return node.fit;
  const fit = computeFit(fp, spots, first);
  if (node) {
    if (++remembered > MAX_FITS) {
      fits = new WeakMap();
      remembered = 0;
    } else node.fit = fit;
  }
  return fit;
}

function computeFit(fp: Footprint, spots: Spots, first: Offset): Fit {
  const pose = fitAnySpan(fp, recordOf(spots));
  if (!pose) return { found: false, body: NO_BODY };
  const cells = poseBody(fp, pose);
  const body = new Int32Array(2 * cells.length);
  cells.forEach((h, k) => {
    body[2 * k] = h[0] - first[0];
    body[2 * k + 1] = h[1] - first[1];
  });
  const fit: Fit = { found: true, body };
  if (pose.span !== undefined) fit.span = pose.span;
  return fit;
}

/** The spots as a name → hole record (no prototype: pin names are user text). */
function recordOf(spots: Spots): Record<string, Offset> {
  const out = Object.create(null) as Record<string, Offset>;
  spots.names.forEach((n, i) => {
    const at = spots.at[i];
    if (at && !(n in out)) out[n] = at;
  });
  return out;
}

export interface Geometry {
  found: boolean;
  /** Where the first footprint pin sits. */
  first: Offset;
  body: Int32Array;
  faults: Problem[];
}

function fault(ref: string, path: (string | number)[], message: string, hint: string): Problem {
  return problem('verify.geometry', 'error', path, message, { hint, refs: [ref] });
}

export function fitGeometry(fp: Footprint, spots: Spots, e: ExpectedPart, path: (string | number)[]): Geometry {
  const ref = e.ref;
  const first = spotOf(spots, fp.pinNames[0]!)!;
  const fit = fitShape(fp, spots, first);
  const span = fit.span;
  if (fit.found && span !== undefined && fp.span && (span < fp.span.min || span > fp.span.max))
    return {
      found: false,
      first,
      body: NO_BODY,
      faults: [fault(ref, path, `${ref} leads are ${span} holes apart; a ${fp.name} body takes ${fp.span.min}–${fp.span.max}`, `move one lead so the span is ${fp.span.min}–${fp.span.max} holes, or pick another footprint`)],
    };
  if (fit.found) {
    if (e.span && span !== undefined && (span < e.span.min || span > e.span.max))
      return {
        found: true,
        first,
        body: fit.body,
        faults: [fault(ref, path, `${ref} leads are ${span} holes apart; the circuit allows ${e.span.min}–${e.span.max}`, `move one lead so the span is ${e.span.min}–${e.span.max} holes`)],
      };
    return { found: true, first, body: fit.body, faults: [] };
  }
  const mirrored = Object.create(null) as Record<string, Offset>;
  for (const [k, o] of Object.entries(recordOf(spots))) mirrored[k] = [-o[0], o[1]];
  if (fp.pinNames.length > 2 && fitPose(fp, mirrored))
    return {
      found: false,
      first,
      body: NO_BODY,
      faults: [
        fault(
          ref,
          path,
          `${ref} is placed as a mirror image of ${fp.name}: its pins run clockwise seen from the component side (as if drawn from the copper side)`,
          'swap the pins left to right: seen from the component side the numbering runs counter-clockwise from pin 1',
        ),
      ],
    };
  return { found: false, first, body: NO_BODY, faults: [fault(ref, path, `${ref} pins do not keep the ${fp.name} shape: it needs ${shapeWords(fp)}`, `place the pins as ${fp.title} in any quarter turn`)] };
}

/**
 * fitPose, letting a stretchable footprint take any span (the range is judged after). The
 * span is first guessed from the pins' distance, so one pose search usually does.
 */
function fitAnySpan(fp: Footprint, pins: Record<string, Offset>): Pose | undefined {
  if (!fp.span) return fitPose(fp, pins);
  const a = pins[fp.pinNames[0]!];
  let guess = 0;
  for (const n of fp.pinNames) {
    const b = pins[n];
    if (a && b) guess = Math.max(guess, Math.abs(b[0] - a[0]), Math.abs(b[1] - a[1]));
  }
  const at = (min: number, max: number) => fitPose({ ...fp, span: { min, max, preferred: fp.span!.preferred } }, pins);
  return (guess >= 1 ? at(guess, guess) : undefined) ?? at(1, WIDEST_SPAN);
}

/** The shape a footprint asks for, in bench words. */
function shapeWords(fp: Footprint): string {
  if (fp.span) return `its two leads in one row or column, ${fp.span.min}–${fp.span.max} holes apart`;
  if (fp.rowSpacingMm && fp.leadPitchMm)
    return `two rows of leads ${round(fp.rowSpacingMm)} mm apart, leads ${round(fp.leadPitchMm)} mm apart along each row, numbered counter-clockwise from pin 1 seen from the component side`;
  if (fp.spacingMm) return `its two leads ${round(fp.spacingMm)} mm apart in one row or column`;
  if (fp.leadPitchMm) return `its leads on neighbouring holes ${round(fp.leadPitchMm)} mm apart, in the order ${fp.pinNames.join('-')}`;
  return `the pin positions of ${fp.name}`;
}

function round(mm: number): string {
  return String(Math.round(mm * 100) / 100);
}
