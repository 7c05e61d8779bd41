/**
 * Snapshots of plain JSON data, to tell later whether a value is still the same without
 * turning it into text. `snapshot(value)` → a deep copy; `matches(value, snap)` → true when
 * the value has the same keys in the same order with the same values, all the way down.
 */
/** A copy of plain JSON data that `matches` can hold a value against. */
export class Snap {
  constructor(
    readonly array: boolean,
    readonly keys: string[],
    readonly values: unknown[],
  ) {}
}

export function snapshot(v: unknown): unknown {
  if (typeof v !== 'object' || v === null) return v;
  const keys: string[] = [];
  const values: unknown[] = [];
  for (const k in v) {
    keys.push(k);
    values.push(snapshot((v as Record<string, unknown>)[k]));
  }
  return new Snap(Array.isArray(v), keys, values);
}

/** Same keys in the same order with the same values, all the way down. */
export function matches(v: unknown, s: unknown): boolean {
  if (!(s instanceof Snap)) return v === s;
  if (typeof v !== 'object' || v === null || Array.isArray(v) !== s.array) return false;
  let i = 0;
  for (const k in v) {
    if (k !== s.keys[i] || !matches((v as Record<string, unknown>)[k], s.values[i])) return false;
    i++;
  }
  return i === s.keys.length;
}
