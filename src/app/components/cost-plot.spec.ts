import { describe, expect, it } from 'vitest';
import { costPath } from './cost-plot.ts';

describe('cost plot', () => {
  it('draws falling cost from top left towards bottom right', () => {
    const p = costPath([{ fraction: 0, best: 100, cost: 100 }, { fraction: 1, best: 10, cost: 20 }], 200, 40);
    expect(p.best).toBe('M0.0 2.0 L200.0 38.0');
    expect(p.cost.startsWith('M0.0 2.0')).toBe(true);
  });
  it('spaces reports evenly even when the planner restarts its fraction', () => {
    const p = costPath([{ fraction: 0.8, best: 5, cost: 5 }, { fraction: 0.1, best: 4, cost: 6 }, { fraction: 0.5, best: 3, cost: 3 }], 100, 10);
    expect(p.best.split(' L').map((s) => s.replace('M', '').split(' ')[0])).toEqual(['0.0', '50.0', '100.0']);
  });
  it('stays flat and finite for equal or missing costs', () => {
    expect(costPath([], 10, 10)).toEqual({ best: '', cost: '' });
    expect(costPath([{ fraction: 0.9, best: 3, cost: 3 }], 10, 10).best).toBe('M5.0 5.0');
    expect(costPath([{ fraction: 0.5, best: Infinity, cost: 3 }], 10, 10).best).toBe('');
  });
});
