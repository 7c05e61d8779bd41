/**
 * Footprint lookups, remembered: the library builds a fresh footprint object per call, and
 * a board asks for the same few footprints hundreds of times. Footprints are read-only by
 * contract, so sharing one object per (name, pin names) is safe.
 */
import { getFootprint, type Footprint } from '../parts/index.ts';

const cache = new Map<string, Footprint | undefined>();
/** Bound on remembered entries (names come from user documents). */
const MAX_ENTRIES = 512;

export function footprintNamed(name: string, pinNames?: readonly string[]): Footprint | undefined {
  const key = `${name}\u0000${pinNames ? pinNames.join('\u0001') : ''}`;
  if (cache.has(key)) return cache.get(key);
  const fp = getFootprint(name, pinNames);
  if (cache.size >= MAX_ENTRIES) cache.clear();
  cache.set(key, fp);
  return fp;
}
