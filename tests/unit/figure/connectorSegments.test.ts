import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { connectorSegments } from '../../../core/figure/connectorSegments.ts';
import { cubicAt } from '../../../core/figure/pathPieces.ts';

const coord = fc.double({ min: -100, max: 100, noNaN: true });

describe('connectorSegments', () => {
  it('draws a straight segment for dashed and line connectors', () => {
    expect(connectorSegments({ x: 1, y: 2 }, { x: 5, y: -3 }, 'dashed')).toEqual([{ op: 'M', x: 1, y: 2 }, { op: 'L', x: 5, y: -3 }]);
    expect(connectorSegments({ x: 1, y: 2 }, { x: 5, y: -3 }, 'line')).toHaveLength(2);
  });

  // Bernstein form of a cubic Bézier (G. Farin, Curves and Surfaces for CAGD, ch. 4 — from
  // memory): with both control points at their end's height, y(t) = y0 + (y1 − y0)(3t² − 2t³),
  // whose derivative 6t(1 − t)(y1 − y0) is zero only at the ends: horizontal tangents there and
  // no overshoot between. Checked here by sampling, not by trusting the formula.
  it('curves stay between the two levels and are flat at both ends', () => {
    fc.assert(fc.property(coord, coord, fc.double({ min: 0.5, max: 50, noNaN: true }), coord, (x0, y0, dx, y1) => {
      const [move, curve] = connectorSegments({ x: x0, y: y0 }, { x: x0 + dx, y: y1 }, 'curve');
      expect(move).toEqual({ op: 'M', x: x0, y: y0 });
      if (curve?.op !== 'C') throw new Error('expected a cubic');
      const lo = Math.min(y0, y1) - 1e-9;
      const hi = Math.max(y0, y1) + 1e-9;
      let lastX = x0;
      for (let k = 0; k <= 200; k++) {
        const [x, y] = cubicAt(x0, y0, curve, k / 200);
        expect(y).toBeGreaterThanOrEqual(lo);
        expect(y).toBeLessThanOrEqual(hi);
        expect(x).toBeGreaterThanOrEqual(lastX - 1e-9);
        lastX = x;
      }
      const h = 1e-6;
      const [xa, ya] = cubicAt(x0, y0, curve, h);
      const [xb, yb] = cubicAt(x0, y0, curve, 1 - h);
      // Slope dy/dx near each end tends to zero (it is O(h)).
      expect(Math.abs((ya - y0) / (xa - x0))).toBeLessThan(1e-3 * (1 + Math.abs(y1 - y0)));
      expect(Math.abs((y1 - yb) / (x0 + dx - xb))).toBeLessThan(1e-3 * (1 + Math.abs(y1 - y0)));
    }), { numRuns: 60 });
  });
});
