/**
 * Footprint lookups, remembered: the library builds a fresh footprint object per call, and
 * a board asks for the same few footprints hundreds of times. Footprints are read-only by
 * contract, so sharing one object per (name, pin names) is safe. A pin-name list seen
 * before (the expected parts are remembered between checks) finds its footprints by
 * identity, without building a text key.
 */
import { getFootprint, type Footprint } from '../parts/index.ts';

const cache = new Map<string, Footprint | undefined>();
let byList = new WeakMap<readonly string[], Map<string, Footprint | undefined>>();
/** Bound on remembered entries (names come from user documents). */
const MAX_ENTRIES = 512;

export function footprintNamed(name: string, pinNames?: readonly string[]): Footprint | undefined {
  const known = pinNames && byList.get(pinNames);
  if (known?.has(name)) return known.get(name);
  const key = `${name}\u0000${pinNames ? pinNames.join('\u0001') : ''}`;
  let fp: Footprint | undefined;
  if (cache.has(key)) fp = cache.get(key);
  else {
    fp = getFootprint(name, pinNames);
    if (cache.size >= MAX_ENTRIES) {
      cache.clear();
      byList = new WeakMap();
    }
    cache.set(key, fp);
  }
  // the list is shared data: its contents are taken as they are now, so remember only an unchanged copy's answer
  if (pinNames && Object.isFrozen(pinNames)) {
    let m = byList.get(pinNames);
    if (!m) byList.set(pinNames, (m = new Map()));
    if (m.size < MAX_ENTRIES) m.set(name, fp);
  }
  return fp;
}
