import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canRedo, canUndo, record, redo, redoLabel, startHistory, undo, undoLabel, type History } from './history.ts';

describe('edit history', () => {
  it('undoes and redoes one edit with its label', () => {
    let h = startHistory('a');
    h = record(h, 'b', 'move R1');
    expect(h.present.value).toBe('b');
    expect(undoLabel(h)).toBe('move R1');
    h = undo(h);
    expect(h.present.value).toBe('a');
    expect(redoLabel(h)).toBe('move R1');
    h = redo(h);
    expect(h.present.value).toBe('b');
    expect(canRedo(h)).toBe(false);
  });

  it('returns the same history when there is nothing to step to', () => {
    const h = startHistory(1);
    expect(undo(h)).toBe(h);
    expect(redo(h)).toBe(h);
    expect(canUndo(h)).toBe(false);
  });

  it('drops the redo branch on a new edit', () => {
    let h = record(record(startHistory(0), 1, 'one'), 2, 'two');
    h = undo(h);
    h = record(h, 3, 'three');
    expect(canRedo(h)).toBe(false);
    expect(undo(h).present.value).toBe(1);
  });

  it('folds a burst of edits with one merge key into one step', () => {
    let h = startHistory('');
    for (const t of ['a', 'ab', 'abc']) h = record(h, t, 'type', 'source');
    h = record(h, 'abc!', 'move', 'R1');
    expect(h.past.map((s) => s.value)).toEqual(['', 'abc']);
    expect(undo(undo(h)).present.value).toBe('');
  });

  it('does not merge into a step restored by undo', () => {
    let h = record(record(startHistory(0), 1, 'nudge', 'R1'), 2, 'nudge', 'R1');
    h = record(h, 5, 'other');
    h = undo(h);
    h = record(h, 3, 'nudge', 'R1');
    expect(undo(h).present.value).toBe(2);
  });

  it('keeps at most `limit` steps back', () => {
    let h = startHistory(0, 'open', 3);
    for (let i = 1; i <= 10; i++) h = record(h, i, `e${i}`);
    expect(h.past.map((s) => s.value)).toEqual([7, 8, 9]);
    expect(() => startHistory(0, 'open', 0)).toThrow();
  });

  it('undo then redo of any count returns to the same present (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer(), { minLength: 1, maxLength: 40 }), fc.nat(50), (values, k) => {
        let h: History<number> = startHistory(-1);
        for (const v of values) h = record(h, v, 'e');
        const before = h.present.value;
        let back = h;
        for (let i = 0; i < k; i++) back = undo(back);
        const steps = Math.min(k, values.length);
        expect(back.present.value).toBe(steps === values.length ? -1 : values[values.length - 1 - steps]);
        for (let i = 0; i < k; i++) back = redo(back);
        expect(back.present.value).toBe(before);
      }),
    );
  });
});
