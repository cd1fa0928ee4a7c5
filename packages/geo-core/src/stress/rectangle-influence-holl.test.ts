import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addRectangleInfluenceOverDepths } from './add-rectangle-influence-over-depths.js';
import { rectangleInfluenceHoll } from './rectangle-influence-holl.js';
import { stressIncreaseRectangle } from './stress-increase-rectangle.js';

const side = fc.double({ min: 0.1, max: 20, noNaN: true });
const offset = fc.double({ min: -60, max: 60, noNaN: true });
const depth = fc.double({ min: 0.01, max: 40, noNaN: true });

describe('rectangleInfluenceHoll(halfWidthM, halfLengthM, dxM, dyM, zM)', () => {
  it('equals the Newmark corner superposition (stressIncreaseRectangle) inside and outside, to 1e-12 of q', () => {
    fc.assert(
      fc.property(side, side, offset, offset, depth, (widthM, lengthM, xM, yM, depthM) => {
        const exact = stressIncreaseRectangle({ pressureKpa: 1, widthM, lengthM, xM, yM, depthM });
        expect(Math.abs(rectangleInfluenceHoll(widthM / 2, lengthM / 2, xM, yM, depthM) - exact)).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 2000 },
    );
  });

  it('falls back to the corner sum very close to the base, where it tends to 1 under the footing', () => {
    expect(rectangleInfluenceHoll(1, 1, 0, 0, 1e-9)).toBeCloseTo(1, 6);
    expect(rectangleInfluenceHoll(1, 1, 1, 0, 1e-9)).toBeCloseTo(0.5, 6);
  });
});

describe('addRectangleInfluenceOverDepths(halfWidthM, halfLengthM, dxM, dyM, baseDepthM, pressureKpa, depthsM, out)', () => {
  it('adds q·I at each depth below the base and nothing above it', () => {
    fc.assert(
      fc.property(side, side, offset, offset, fc.double({ min: 0, max: 3, noNaN: true }), (widthM, lengthM, xM, yM, baseDepthM) => {
        const depthsM = Float64Array.from([0.5, 1, 2.5, 4, 8, 16]);
        const out = new Float64Array(depthsM.length).fill(1);
        addRectangleInfluenceOverDepths(widthM / 2, lengthM / 2, xM, yM, baseDepthM, 150, depthsM, out);
        depthsM.forEach((depthM, k) => {
          const expected = depthM > baseDepthM ? 1 + stressIncreaseRectangle({ pressureKpa: 150, widthM, lengthM, xM, yM, depthM: depthM - baseDepthM }) : 1;
          expect(Math.abs((out[k] ?? 0) - expected)).toBeLessThanOrEqual(1e-10);
        });
      }),
    );
  });

  it('equals the corner-by-corner sum under the rectangle, near its edges and just below the base, where the single arctangent must be unwrapped', () => {
    const column = fc.tuple(side, side, fc.double({ min: -1.2, max: 1.2, noNaN: true }), fc.double({ min: -1.2, max: 1.2, noNaN: true }));
    fc.assert(
      fc.property(column, fc.double({ min: 1e-5, max: 50, noNaN: true }), ([widthM, lengthM, xShare, yShare], depthM) => {
        const xM = (xShare * widthM) / 2;
        const yM = (yShare * lengthM) / 2;
        const out = new Float64Array(1);
        addRectangleInfluenceOverDepths(widthM / 2, lengthM / 2, xM, yM, 0, 1, Float64Array.of(depthM), out);
        const exact = stressIncreaseRectangle({ pressureKpa: 1, widthM, lengthM, xM, yM, depthM });
        expect(Math.abs((out[0] ?? 0) - exact)).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 3000 },
    );
  });
});

