/**
 * One layout part on its own: is it a circuit part (once), are its pins the footprint's
 * pins, on the board, in the footprint's shape; which holes its body covers; and the
 * reminders a builder needs (polarity, defaulted lead order, unconnected pins).
 *
 * `placePart(lp, index, expected, duplicate, board, section?)` → PlacedPart (`section`: the
 * ref is an op-amp section of the circuit, which belongs inside a package). Pure; the same layout
 * part always gives the same answer, which is what lets the incremental verifier cache it.
 */
import type { Board, LayoutPart } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';
import type { Footprint, Offset } from '../parts/index.ts';
import { footprintNamed } from './footprints.ts';
import type { ExpectedPart } from './expect.ts';
import { fitGeometry, spotOf, type Spots } from './geometry.ts';
import { at, listText, pinText, problem } from './words.ts';

export interface PlacedPin {
  pin: string;
  /** Index in the layout part's pin list. */
  j: number;
  /** Dense hole index, −1 when off the board. */
  hole: number;
  at: Hole;
  /** `net`: carries a net; `open`: a circuit pin left unconnected; `none`: not a circuit pin. */
  role: 'net' | 'open' | 'none';
  net?: string;
}

export interface PlacedPart {
  index: number;
  ref: string;
  /** True for the first layout entry of a circuit part: its pins take part in the nets. */
  counted: boolean;
  pins: PlacedPin[];
  /** Holes the body covers (lead holes included), on the board, ascending. */
  body: number[];
  faults: Problem[];
  warnings: Problem[];
}

export function placePart(lp: LayoutPart, index: number, e: ExpectedPart | undefined, duplicate: boolean, board: Board, section = false): PlacedPart {
  const path = ['parts', index];
  const { cols, rows } = board;
  const faults: Problem[] = [];
  const warnings: Problem[] = [];
  const counted = !!e && !duplicate;
  const pins: PlacedPin[] = [];
  // where each circuit pin is first placed, by its index in e.pinNames
  const spots: Spots | undefined = e && { names: e.pinNames, at: new Array<Offset | undefined>(e.pinNames.length).fill(undefined) };

  if (!e)
    faults.push(
      problem('verify.extra-part', 'error', path, section ? `${lp.ref} is an op-amp section; on the board it lives inside a package, not as a part of its own` : `${lp.ref} is on the board but not in the circuit`, {
        hint: section ? `place the package that holds ${lp.ref} and map its pins in "packing"` : `remove ${lp.ref} from the layout, or add it to the circuit`,
        refs: [lp.ref],
        holes: lp.pins.map((p) => p.at),
      }),
    );
  else if (duplicate)
    faults.push(
      problem('verify.duplicate-part', 'error', path, `${lp.ref} is placed more than once; this is a second copy`, {
        hint: `remove the extra copy of ${lp.ref}`,
        refs: [lp.ref],
        holes: lp.pins.map((p) => p.at),
      }),
    );

  let body: number[] = [];
  for (let j = 0; j < lp.pins.length; j++) {
    const pp = lp.pins[j]!;
    const x = pp.at[0];
    const y = pp.at[1];
    const on = x >= 0 && y >= 0 && x < cols && y < rows && Number.isInteger(x) && Number.isInteger(y);
    const k = spots ? spots.names.indexOf(pp.pin) : -1;
    const known = k >= 0;
    const repeat = known && spots!.at[k] !== undefined;
    if (e && !known)
      faults.push(
        problem('verify.unknown-pin', 'error', ['parts', index, 'pins', j, 'pin'], `${lp.ref} has no pin "${pp.pin}" (its pins are ${listText(e.pinNames)})`, {
          hint: `use the pin names ${e.pinNames.join(', ')}`,
          refs: [lp.ref],
          holes: [pp.at],
        }),
      );
    else if (e && repeat)
      faults.push(
        problem('verify.duplicate-pin', 'error', ['parts', index, 'pins', j, 'pin'], `${pinText(lp.ref, pp.pin)} is placed twice`, {
          hint: 'list each pin once',
          refs: [lp.ref],
          holes: [pp.at],
        }),
      );
    if (!on)
      faults.push(
        problem('verify.off-board', 'error', ['parts', index, 'pins', j, 'at'], `${pinText(lp.ref, pp.pin)} at [${pp.at.join(', ')}] is off the ${cols}×${rows} board`, {
          hint: `move ${lp.ref} inside the board (columns 0–${cols - 1}, rows 0–${rows - 1} in the document)`,
          refs: [lp.ref],
        }),
      );
    if (known && !repeat) spots!.at[k] = [x, y];
    const hole = on ? x + y * cols : -1;
    const pin: PlacedPin = { pin: pp.pin, j, hole, at: [x, y], role: 'none' };
    if (counted && known && !repeat) {
      const net = e.nets[pp.pin];
      if (net === undefined) pin.role = 'open';
      else {
        pin.role = 'net';
        pin.net = net;
      }
    }
    pins.push(pin);
    if (hole >= 0) body.push(hole);
  }

  if (e && spots) {
    let missing: string[] | undefined;
    spots.at.forEach((h, k) => {
      if (!h) (missing ??= []).push(e.pinNames[k]!);
    });
    if (missing)
      faults.push(
        problem('verify.missing-pin', 'error', [...path, 'pins'], `${lp.ref} does not place pin${missing.length > 1 ? 's' : ''} ${listText(missing)}`, {
          hint: `place every pin of ${lp.ref}, unconnected ones included`,
          refs: [lp.ref],
        }),
      );
    const fp = footprintOf(lp, e, path, faults);
    if (fp && !missing) {
      const fit = fitGeometry(fp, spots, e, [...path, 'pins']);
      for (const f of fit.faults) faults.push(f);
      if (fit.found) {
        body = [];
        const [x0, y0] = fit.first;
        for (let k = 0; k < fit.body.length; k += 2) {
          const x = x0 + fit.body[k]!;
          const y = y0 + fit.body[k + 1]!;
          if (x >= 0 && y >= 0 && x < cols && y < rows && Number.isInteger(x) && Number.isInteger(y)) body.push(x + y * cols);
        }
      }
    }
    if (fp && counted) reminders(lp, e, fp, spots, path, cols, warnings);
  }
  return { index, ref: lp.ref, counted, pins, body: uniqueSorted(body), faults, warnings };
}

function geometryFault(lp: LayoutPart, path: (string | number)[], message: string, hint: string): Problem {
  return problem('verify.geometry', 'error', [...path, 'footprint'], message, { hint, refs: [lp.ref] });
}

/** The layout's footprint, if it resolves with the part's pins and agrees with the circuit. */
function footprintOf(lp: LayoutPart, e: ExpectedPart, path: (string | number)[], faults: Problem[]): Footprint | undefined {
  if (e.footprint && e.footprint !== lp.footprint) {
    faults.push(geometryFault(lp, path, `${lp.ref} is placed as ${lp.footprint}, but the circuit asks for ${e.footprint}`, `place ${lp.ref} with footprint ${e.footprint}`));
    return undefined;
  }
  const fp = footprintNamed(lp.footprint, e.pinNames);
  const same = fp && fp.pinNames.length === e.pinNames.length && e.pinNames.every((n) => fp.pinNames.includes(n));
  if (!fp || !same) {
    faults.push(
      geometryFault(
        lp,
        path,
        fp ? `${lp.ref}: footprint ${lp.footprint} has pins ${fp.pinNames.join(', ')} but the part has ${e.pinNames.join(', ')}` : `${lp.ref}: footprint "${lp.footprint}" is not in the library`,
        'pick a footprint from `kerfline footprints` whose pins match the part',
      ),
    );
    return undefined;
  }
  if (e.order && !e.order.defaulted && leadOrderOf(fp) !== e.order.order) {
    faults.push(geometryFault(lp, path, `${lp.ref} is placed as ${fp.name} (leads ${fp.pinNames.join('-')}), but the circuit states the lead order ${e.order.order}`, `use the footprint whose lead order is ${e.order.order}`));
    return undefined;
  }
  return fp;
}

function leadOrderOf(fp: Footprint): string {
  return fp.pinNames.join('').toUpperCase();
}

function where(spots: Spots, pin: string, cols: number): string {
  const h = spotOf(spots, pin);
  return h ? at(h, cols) : 'nowhere';
}

function holesOf(spots: Spots, names: string[]): Hole[] {
  const out: Hole[] = [];
  for (const n of names) {
    const h = spotOf(spots, n);
    if (h) out.push(h as Hole);
  }
  return out;
}

/** Polarity reminder, defaulted lead order, unconnected pins (into `out`). */
function reminders(lp: LayoutPart, e: ExpectedPart, fp: Footprint, spots: Spots, path: (string | number)[], cols: number, out: Problem[]): void {
  if (e.polarized) {
    const marked: string[] = [];
    if (fp.marks.plus) marked.push(`+ lead at ${where(spots, fp.marks.plus, cols)}`);
    if (fp.marks.cathode) marked.push(`cathode (${fp.marks.cathode}) at ${where(spots, fp.marks.cathode, cols)}`);
    if (fp.marks.pin1) marked.push(`pin ${fp.marks.pin1} (notch or dot end) at ${where(spots, fp.marks.pin1, cols)}`);
    const names = marked.length ? [fp.marks.plus, fp.marks.cathode, fp.marks.pin1].filter((n): n is string => !!n) : fp.pinNames;
    const text = marked.length ? listText(marked) : fp.pinNames.map((n) => `${n} at ${where(spots, n, cols)}`).join(', ');
    out.push(
      problem('verify.polarity', 'note', path, `${lp.ref} fits one way round: ${text}`, {
        hint: 'check the marking on the part against these holes before soldering',
        refs: [lp.ref],
        holes: holesOf(spots, names),
      }),
    );
  }
  if (e.order?.defaulted)
    out.push(
      problem('verify.pinout-defaulted', 'warning', path, `${lp.ref} states no lead order; it is placed as ${fp.name}, leads ${fp.pinNames.join('-')} from the flat face`, {
        hint: `check the maker's datasheet and write "pinout": "${fp.pinNames.join('')}" (or the real order) in the circuit`,
        refs: [lp.ref],
      }),
    );
  if (!e.openAllowed) return;
  const open = e.pinNames.filter((n) => e.nets[n] === undefined);
  if (open.length)
    out.push(
      problem('verify.unconnected-pin', 'warning', path, `${lp.ref} leaves ${open.length > 1 ? 'pins' : 'pin'} ${listText(open)} unconnected (${listText(open.map((n) => where(spots, n, cols)))})`, {
        hint: 'no copper of another pin may touch these holes; tie unused inputs off in the circuit if the part needs it',
        refs: [lp.ref],
        holes: holesOf(spots, open),
        pins: open.map((pin) => ({ ref: lp.ref, pin })),
      }),
    );
}

/** Ascending, without repeats (bodies are a handful of holes: insertion sort). */
function uniqueSorted(xs: number[]): number[] {
  for (let i = 1; i < xs.length; i++) {
    const v = xs[i]!;
    let j = i - 1;
    while (j >= 0 && xs[j]! > v) {
      xs[j + 1] = xs[j]!;
      j--;
    }
    xs[j + 1] = v;
  }
  let n = 0;
  for (let i = 0; i < xs.length; i++) if (i === 0 || xs[i] !== xs[n - 1]) xs[n++] = xs[i]!;
  xs.length = n;
  return xs;
}
