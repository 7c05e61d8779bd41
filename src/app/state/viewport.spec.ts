import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { FINDING_ZOOM, centreOn, fitView, frameFinding, panBy, toScreen, toWorld, zoomAt } from './viewport.ts';

const box = { x: -1, y: -1, width: 26, height: 20 };

describe('board view geometry', () => {
  it('fits a box inside the view with the margin, centred', () => {
    const v = fitView(box, 800, 600, 20);
    const [x0, y0] = toScreen(v, [box.x, box.y]);
    const [x1, y1] = toScreen(v, [box.x + box.width, box.y + box.height]);
    expect(Math.min(x0, y0)).toBeGreaterThanOrEqual(20 - 1e-9);
    expect(x1).toBeLessThanOrEqual(780 + 1e-9);
    expect(y1).toBeLessThanOrEqual(580 + 1e-9);
    expect((x0 + x1) / 2).toBeCloseTo(400);
    expect((y0 + y1) / 2).toBeCloseTo(300);
  });

  it('keeps the world point under the cursor while zooming (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 2, noNaN: true }), fc.double({ min: 0, max: 800, noNaN: true }), fc.double({ min: 0, max: 600, noNaN: true }), (f, sx, sy) => {
        const v = fitView(box, 800, 600);
        const before = toWorld(v, [sx, sy]);
        const after = toWorld(zoomAt(v, f, [sx, sy]), [sx, sy]);
        expect(after[0]).toBeCloseTo(before[0], 6);
        expect(after[1]).toBeCloseTo(before[1], 6);
      }),
    );
  });

  it('stops zooming at its limits', () => {
    let v = fitView(box, 800, 600);
    for (let i = 0; i < 100; i++) v = zoomAt(v, 2, [0, 0]);
    expect(v.scale).toBe(v.maxScale);
    for (let i = 0; i < 100; i++) v = zoomAt(v, 0.5, [0, 0]);
    expect(v.scale).toBe(v.minScale);
  });

  it('pans and centres on a point', () => {
    const v = fitView(box, 800, 600);
    expect(toScreen(panBy(v, 10, -5), [3, 4])).toEqual([toScreen(v, [3, 4])[0] + 10, toScreen(v, [3, 4])[1] - 5]);
    const c = centreOn(v, [12, 7], 800, 600, v.scale * 4);
    expect(toScreen(c, [12, 7])).toEqual([400, 300]);
    expect(c.scale).toBeCloseTo(v.scale * 4);
  });

  it('frames a finding: all its points on screen, zoom between the whole board and the limit', () => {
    const fitted = fitView(box, 800, 600);
    const pts: [number, number][] = [[3, 4], [9, 6]];
    const v = frameFinding(fitted, fitted, pts, 2.54, 800, 600);
    for (const p of pts) {
      const [x, y] = toScreen(v, p);
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThanOrEqual(800);
      expect(y).toBeGreaterThanOrEqual(0);
      expect(y).toBeLessThanOrEqual(600);
    }
    expect(v.scale).toBeGreaterThanOrEqual(fitted.scale);
    expect(v.scale).toBeLessThanOrEqual(fitted.scale * FINDING_ZOOM + 1e-9);
    expect(frameFinding(fitted, fitted, [[5, 5]], 0.5, 800, 600).scale).toBeCloseTo(fitted.scale * FINDING_ZOOM);
    expect(frameFinding(fitted, fitted, [[-100, -100], [200, 200]], 1, 800, 600).scale).toBeCloseTo(fitted.scale);
  });
});
