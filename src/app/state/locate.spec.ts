import { describe, expect, it } from 'vitest';
import type { Problem } from '../../lib/model/index.ts';
import type { Design } from '../../lib/netlist/design.ts';
import { problemHoles } from './locate.ts';
import { smallLayout } from './fixtures.ts';

const base: Problem = { code: 'verify.x', severity: 'error', path: [], message: 'm' };
const design = { title: 't', parts: [], nets: [{ name: 'N1', info: {}, pins: [{ ref: 'R1', pin: '2' }, { ref: 'Q1', pin: 'E' }] }] } as Design;

describe('locating a problem on the board', () => {
  it('prefers the holes the problem names', () => {
    expect(problemHoles({ ...base, holes: [[4, 4]], refs: ['R1'] }, smallLayout())).toEqual([[4, 4]]);
  });
  it('falls back to named pins, then parts, then nets', () => {
    expect(problemHoles({ ...base, pins: [{ ref: 'Q1', pin: 'B' }] }, smallLayout())).toEqual([[3, 4]]);
    expect(problemHoles({ ...base, refs: ['R1'] }, smallLayout())).toEqual([[1, 1], [5, 1]]);
    expect(problemHoles({ ...base, nets: ['N1'] }, smallLayout(), design)).toEqual([[5, 1], [4, 4]]);
  });
  it('finds nothing for a whole-document problem', () => {
    expect(problemHoles(base, smallLayout(), design)).toEqual([]);
  });
});
