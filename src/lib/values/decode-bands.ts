/**
 * `decodeBands(colours, { direction? }) → Result<BandDecoding>`
 *
 * Reads 3 to 6 resistor bands (check-values.md §1a): 3 = d d ×, ±20 %; 4 = d d × tol;
 * 5 = d d d × tol; 6 = 5 plus a temperature-coefficient band (returned, not interpreted).
 * Colour names are case-insensitive; "gray" and "purple" are read as grey and violet.
 * With `direction: 'either'` (default) both ends are tried. A direction reads when every
 * band fits its place (digits are digit colours, the first not black; the multiplier is a
 * multiplier colour; the tolerance band has a tolerance). If both read and differ, the
 * reading with an undisputed tolerance colour wins, then the one whose value belongs to
 * the series its tolerance implies (±20 % E6, ±10 % E12, ±5 % E24, ±1–2 % E24 or E96);
 * still tied → `kind: 'ambiguous'` with both readings (brown-black-black-brown-brown is
 * 1 kΩ or 110 Ω). `direction: 'as-given'` reads left to right only. The tolerance is
 * absent and `disputedTolerance` lists the alternatives for orange, yellow and grey.
 * Problem codes: value.bands-count, value.bands-colour, value.bands-invalid.
 */
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { bandColour, NO_BAND_TOLERANCE, type BandColour, type ToleranceReading } from './colours.ts';
import { scaled } from './decimal.ts';
import { valueProblem } from './problem.ts';
import { isPreferred, type SeriesName } from './series.ts';

export interface BandReading {
  ohms: number;
  /** ± percent and IEC letter, when the tolerance band's meaning is undisputed. */
  tolerance?: { pct: number; letter: string };
  disputedTolerance?: readonly ToleranceReading[];
  /** Colour names in the order read. */
  bands: string[];
  reversed: boolean;
  /** Sixth band, uninterpreted. */
  tempco?: string;
}

export type BandDecoding =
  | { kind: 'value'; reading: BandReading }
  | { kind: 'ambiguous'; readings: [BandReading, BandReading] };

export interface DecodeOptions {
  direction?: 'either' | 'as-given';
}

function readAs(cols: readonly BandColour[], reversed: boolean): BandReading | undefined {
  const nDigits = cols.length <= 4 ? 2 : 3;
  const digitCols = cols.slice(0, nDigits);
  const mult = cols[nDigits];
  const tol = cols.length >= 4 ? cols[nDigits + 1] : undefined;
  const tempco = cols.length === 6 ? cols[5] : undefined;
  if (digitCols.some((c) => c.digit === undefined) || digitCols[0]?.digit === 0) return undefined;
  if (mult?.multiplierExp === undefined) return undefined;
  if (tol && !tol.tolerance && !tol.disputed) return undefined;
  if (tempco && tempco.digit === undefined) return undefined;
  const significand = Number(digitCols.map((c) => c.digit).join(''));
  const tolerance = cols.length === 3 ? { ...NO_BAND_TOLERANCE } : tol?.tolerance;
  return {
    ohms: scaled(significand, mult.multiplierExp),
    ...(tolerance ? { tolerance } : {}),
    ...(tol?.disputed ? { disputedTolerance: tol.disputed } : {}),
    bands: cols.map((c) => c.name),
    reversed,
    ...(tempco ? { tempco: tempco.name } : {}),
  };
}

/** The series a tolerance implies (check-values.md §2 tolerance pairing [S]). */
function seriesFor(pct: number): SeriesName[] {
  if (pct >= 20) return ['E6'];
  if (pct >= 10) return ['E12'];
  if (pct >= 5) return ['E24'];
  if (pct >= 1) return ['E24', 'E96'];
  return [];
}

function rank(r: BandReading): number {
  if (!r.tolerance) return 0;
  return seriesFor(r.tolerance.pct).some((s) => isPreferred(r.ohms, s)) ? 2 : 1;
}

/** Same value and tolerance from both ends (a symmetric code such as brown-red-brown-red-brown). */
function sameMeaning(a: BandReading, b: BandReading): boolean {
  return a.ohms === b.ohms && a.tolerance?.pct === b.tolerance?.pct && a.disputedTolerance === b.disputedTolerance;
}

export function decodeBands(colours: readonly string[], options: DecodeOptions = {}): Result<BandDecoding> {
  if (!Array.isArray(colours) || colours.length < 3 || colours.length > 6) {
    const n = Array.isArray(colours) ? colours.length : 0;
    return fail([valueProblem('value.bands-count', String(n), `${n} bands: a resistor has 3 to 6`, 'list the bands from one end')]);
  }
  const cols: BandColour[] = [];
  const problems: Problem[] = [];
  for (const [i, name] of colours.entries()) {
    const c = typeof name === 'string' ? bandColour(name) : undefined;
    if (c) cols.push(c);
    else {
      problems.push({
        ...valueProblem('value.bands-colour', String(name), `band ${i + 1}: ${JSON.stringify(String(name))} is not a band colour`, 'use black, brown, red, orange, yellow, green, blue, violet, grey, white, gold, silver or pink'),
        path: [i],
      });
    }
  }
  if (problems.length > 0) return fail(problems);
  const forward = readAs(cols, false);
  const backward = options.direction === 'as-given' ? undefined : readAs([...cols].reverse(), true);
  if (!forward && !backward) {
    const text = cols.map((c) => c.name).join('-');
    const ends = options.direction === 'as-given' ? 'read left to right' : 'read from either end';
    return fail([valueProblem('value.bands-invalid', text, `${text} is not a resistor code ${ends}`, 'check each colour; gold or silver is never the first band')]);
  }
  if (!forward || !backward) return ok({ kind: 'value', reading: (forward ?? backward) as BandReading });
  if (sameMeaning(forward, backward)) return ok({ kind: 'value', reading: forward });
  const rf = rank(forward);
  const rb = rank(backward);
  if (rf !== rb) return ok({ kind: 'value', reading: rf > rb ? forward : backward });
  return ok({ kind: 'ambiguous', readings: [forward, backward] });
}
