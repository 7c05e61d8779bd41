/**
 * Footprint geometry of one placed part: do its pins keep the shape of its footprint in
 * some allowed rotation (fitPose)? When not, say why in bench terms: a two-lead span out
 * of range, a mirror image (numbered clockwise seen from the component side), or the shape
 * the footprint needs. Also the circuit's own span limit.
 */
import type { Problem } from '../model/problem.ts';
import { fitPose, poseBody, type Footprint, type Offset, type Pose } from '../parts/index.ts';
import type { ExpectedPart } from './expect.ts';
import { problem } from './words.ts';

/** Longest lead span tried when explaining an out-of-range span, in holes. */
const WIDEST_SPAN = 400;

/** A fit found for one shape of pins, relative to the first pin (so it can be reused). */
interface Fit {
  pose?: { rotation: number; span?: number; anchor: Offset };
  /** Body cells relative to the first pin. */
  body: Offset[];
}

const fits = new Map<string, Fit>();
/** Bound on remembered shapes. */
const MAX_FITS = 4096;

/**
 * The pose and body of a footprint for placed pins. Parts of one footprint placed in one
 * shape share the answer, remembered by the pins' offsets from the first pin.
 */
export function fitShape(fp: Footprint, pins: Record<string, Offset>): { pose?: Pose; body: Offset[] } {
  const first = pins[fp.pinNames[0]!];
  if (!first) return { body: [] };
  let key = `${fp.name}\u0000${fp.pinNames.join('\u0001')}`;
  for (const n of fp.pinNames) {
    const p = pins[n];
    key += p ? `|${p[0] - first[0]},${p[1] - first[1]}` : '|-';
  }
  let fit = fits.get(key);
  if (!fit) {
    const pose = fitAnySpan(fp, pins);
    fit = { body: [] };
    if (pose) {
      fit.pose = { rotation: pose.rotation, anchor: [pose.anchor[0] - first[0], pose.anchor[1] - first[1]] };
      if (pose.span !== undefined) fit.pose.span = pose.span;
      fit.body = poseBody(fp, pose).map((h) => [h[0] - first[0], h[1] - first[1]] as Offset);
    }
    if (fits.size >= MAX_FITS) fits.clear();
    fits.set(key, fit);
  }
  if (!fit.pose) return { body: [] };
  const pose: Pose = { anchor: [first[0] + fit.pose.anchor[0], first[1] + fit.pose.anchor[1]], rotation: fit.pose.rotation };
  if (fit.pose.span !== undefined) pose.span = fit.pose.span;
  return { pose, body: fit.body.map((o) => [first[0] + o[0], first[1] + o[1]] as Offset) };
}

export function fitGeometry(fp: Footprint, pins: Record<string, Offset>, e: ExpectedPart, path: (string | number)[]): { pose?: Pose; body: Offset[]; faults: Problem[] } {
  const ref = e.ref;
  const fault = (message: string, hint: string) => problem('verify.geometry', 'error', path, message, { hint, refs: [ref] });
  const shaped = fitShape(fp, pins);
  const found = shaped.pose;
  const body = shaped.body;
  if (found?.span !== undefined && fp.span && (found.span < fp.span.min || found.span > fp.span.max))
    return {
      body: [],
      faults: [fault(`${ref} leads are ${found.span} holes apart; a ${fp.name} body takes ${fp.span.min}–${fp.span.max}`, `move one lead so the span is ${fp.span.min}–${fp.span.max} holes, or pick another footprint`)],
    };
  if (found) {
    if (e.span && found.span !== undefined && (found.span < e.span.min || found.span > e.span.max))
      return {
        pose: found,
        body,
        faults: [fault(`${ref} leads are ${found.span} holes apart; the circuit allows ${e.span.min}–${e.span.max}`, `move one lead so the span is ${e.span.min}–${e.span.max} holes`)],
      };
    return { pose: found, body, faults: [] };
  }
  const mirrored: Record<string, Offset> = {};
  for (const [k, o] of Object.entries(pins)) mirrored[k] = [-o[0], o[1]];
  if (fp.pinNames.length > 2 && fitPose(fp, mirrored))
    return {
      body: [],
      faults: [
        fault(
          `${ref} is placed as a mirror image of ${fp.name}: its pins run clockwise seen from the component side (as if drawn from the copper side)`,
          'swap the pins left to right: seen from the component side the numbering runs counter-clockwise from pin 1',
        ),
      ],
    };
  return { body: [], faults: [fault(`${ref} pins do not keep the ${fp.name} shape: it needs ${shapeWords(fp)}`, `place the pins as ${fp.title} in any quarter turn`)] };
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
