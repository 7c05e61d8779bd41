/**
 * Resistor colour code of IEC 60062 (check-values.md §1a). Digits, multipliers and the
 * brown/red/green/blue/violet/gold/silver tolerances are undisputed [S]; orange, yellow and
 * grey tolerances differ between sources (§13.1), so they are kept as alternatives with
 * their source and never given as a single answer. Pink ×0.001 is from the 2016 edition.
 */
export interface ToleranceReading {
  pct: number;
  letter?: string;
  source: string;
}

export interface BandColour {
  name: string;
  digit?: number;
  /** Multiplier as a power of ten. */
  multiplierExp?: number;
  /** Undisputed tolerance, ± percent, with its IEC letter. */
  tolerance?: { pct: number; letter: string };
  /** Tolerance readings that sources disagree on. */
  disputed?: readonly ToleranceReading[];
}

const DIGITS = ['black', 'brown', 'red', 'orange', 'yellow', 'green', 'blue', 'violet', 'grey', 'white'] as const;

const TOLERANCE: Readonly<Record<string, { pct: number; letter: string }>> = {
  brown: { pct: 1, letter: 'F' },
  red: { pct: 2, letter: 'G' },
  green: { pct: 0.5, letter: 'D' },
  blue: { pct: 0.25, letter: 'C' },
  violet: { pct: 0.1, letter: 'B' },
  gold: { pct: 5, letter: 'J' },
  silver: { pct: 10, letter: 'K' },
};

const DISPUTED: Readonly<Record<string, readonly ToleranceReading[]>> = {
  orange: [{ pct: 0.05, letter: 'W', source: 'IEC 60062:2016 per one summary [S]; many tables leave blank' }],
  yellow: [{ pct: 0.02, letter: 'P', source: 'IEC 60062:2016 per one summary [S]; many tables leave blank' }],
  grey: [
    { pct: 0.05, source: 'most tables [S]' },
    { pct: 0.01, letter: 'L', source: 'IEC 60062:2016 [M]' },
  ],
};

function colour(name: string, digit: number | undefined, multiplierExp: number): BandColour {
  return {
    name,
    ...(digit !== undefined ? { digit } : {}),
    multiplierExp,
    ...(TOLERANCE[name] ? { tolerance: TOLERANCE[name] } : {}),
    ...(DISPUTED[name] ? { disputed: DISPUTED[name] } : {}),
  };
}

export const BAND_COLOURS: readonly BandColour[] = [
  ...DIGITS.map((name, i) => colour(name, i, i)),
  colour('gold', undefined, -1),
  colour('silver', undefined, -2),
  colour('pink', undefined, -3),
];

/** Tolerance when a part has no tolerance band (3 bands): ±20 %, letter M [S]. */
export const NO_BAND_TOLERANCE = { pct: 20, letter: 'M' } as const;

const BY_NAME = new Map(BAND_COLOURS.map((c) => [c.name, c]));
const ALIASES: Readonly<Record<string, string>> = { gray: 'grey', purple: 'violet' };

/** Look a colour up by name, case-insensitive; "gray" and "purple" are read too. */
export function bandColour(name: string): BandColour | undefined {
  const key = name.trim().toLowerCase();
  return BY_NAME.get(Object.hasOwn(ALIASES, key) ? (ALIASES[key] ?? key) : key);
}

export function digitColour(digit: number): string {
  const name = DIGITS[digit];
  if (name === undefined) throw new Error(`no colour for digit ${digit}`);
  return name;
}

export function multiplierColour(exp: number): string | undefined {
  return BAND_COLOURS.find((c) => c.multiplierExp === exp)?.name;
}
