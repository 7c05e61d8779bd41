import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { lineStarts, problemLines } from './text-lines.ts';

describe('text lines', () => {
  it('finds where every line starts', () => {
    expect(lineStarts('')).toEqual([0]);
    expect(lineStarts('ab\ncd\n')).toEqual([0, 3, 6]);
  });
  it('agrees with split on any text (property)', () => {
    fc.assert(
      fc.property(fc.string(), (t) => {
        const starts = lineStarts(t);
        expect(starts.length).toBe(t.split('\n').length);
        starts.slice(1).forEach((s) => expect(t[s - 1]).toBe('\n'));
      }),
    );
  });
  it('keeps the worst severity per line', () => {
    const m = problemLines([
      { code: 'a', severity: 'warning', path: [], message: '', line: 2 },
      { code: 'b', severity: 'error', path: [], message: '', line: 2 },
      { code: 'c', severity: 'note', path: [], message: '', line: 5 },
      { code: 'd', severity: 'error', path: [], message: '' },
    ]);
    expect([...m]).toEqual([[2, 'error'], [5, 'note']]);
  });
});
