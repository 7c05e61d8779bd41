/**
 * Edit history: an immutable undo/redo stack of whole document snapshots.
 *
 * `startHistory(present, limit = HISTORY_LIMIT)` → History; `record(h, next, label, mergeKey?)`
 * pushes `next` as the new present (dropping the redo branch); `undo(h)` / `redo(h)` step
 * back and forth and return `h` itself when there is nothing to step to. Snapshots are
 * shared, never copied, so documents must be replaced on edit, not mutated. Two records in
 * a row with the same `mergeKey` (typing in one text box, nudging one part) fold into one
 * step, so one undo takes back the whole burst. The oldest steps fall off past `limit`.
 */

/** Steps kept; a 100-part layout is about 30 kB, so 200 steps stay well under 10 MB. */
export const HISTORY_LIMIT = 200;

export interface Step<T> {
  value: T;
  /** What the edit that produced `value` was, for "Undo move R3". */
  label: string;
  mergeKey?: string;
}

export interface History<T> {
  readonly past: readonly Step<T>[];
  readonly present: Step<T>;
  readonly future: readonly Step<T>[];
  readonly limit: number;
}

export function startHistory<T>(value: T, label = 'open', limit = HISTORY_LIMIT): History<T> {
  if (!Number.isInteger(limit) || limit < 1) throw new Error(`history limit must be a positive integer, got ${limit}`);
  return { past: [], present: { value, label }, future: [], limit };
}

export function record<T>(h: History<T>, value: T, label: string, mergeKey?: string): History<T> {
  const step: Step<T> = mergeKey === undefined ? { value, label } : { value, label, mergeKey };
  if (mergeKey !== undefined && h.present.mergeKey === mergeKey) return { ...h, present: step };
  const past = [...h.past, h.present];
  return { past: past.length > h.limit ? past.slice(past.length - h.limit) : past, present: step, future: [], limit: h.limit };
}

export function undo<T>(h: History<T>): History<T> {
  const prev = h.past[h.past.length - 1];
  if (!prev) return h;
  // The step we leave keeps its label; a later record must not merge into the restored one.
  const { mergeKey: _drop, ...present } = prev;
  return { past: h.past.slice(0, -1), present, future: [h.present, ...h.future], limit: h.limit };
}

export function redo<T>(h: History<T>): History<T> {
  const next = h.future[0];
  if (!next) return h;
  const { mergeKey: _drop, ...present } = next;
  return { past: [...h.past, h.present], present, future: h.future.slice(1), limit: h.limit };
}

export const canUndo = (h: History<unknown>): boolean => h.past.length > 0;
export const canRedo = (h: History<unknown>): boolean => h.future.length > 0;

/** Label of the edit an undo would take back, or undefined. */
export const undoLabel = (h: History<unknown>): string | undefined => (h.past.length ? h.present.label : undefined);
/** Label of the edit a redo would bring back, or undefined. */
export const redoLabel = (h: History<unknown>): string | undefined => h.future[0]?.label;
