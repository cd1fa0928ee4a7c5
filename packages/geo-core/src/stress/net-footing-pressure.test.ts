import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SoilProfile } from '../profile/soil-profile.types.js';
import { runSettlementCheck } from '../settlement/run-settlement-check.js';
import { sizeFootingForSettlement } from '../sizing/size-footing-for-settlement.js';
import type { Footing } from './footing.types.js';
import { netFootingPressure } from './net-footing-pressure.js';
import { stressIncreaseFromFootings } from './stress-increase-from-footings.js';

// Hand-calculation profile (invented): sand 18 kN/m³ above the water table at 2 m, 20 below; clay from 4 m.
const profile: SoilProfile = {
  groundLevelM: 10,
  waterTableDepthM: 2,
  layers: [
    { name: 'sand', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20 },
    { name: 'clay', thicknessM: 4, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19, e0: 1, cc: 0.35, cs: 0.06 },
  ],
};
const gross: Footing = { id: 'G', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1.5, loadKn: 800, pressureBasis: 'gross' };

describe('netFootingPressure(footing, profile)', () => {
  it('takes σv0 at the founding depth off a gross pressure (hand calculation: 800/4 − 1.5 × 18 = 200 − 27 = 173 kPa)', () => {
    expect(netFootingPressure(gross, profile)).toEqual({ pressureBasis: 'gross', netPressureKpa: 173, grossPressureKpa: 200, overburdenRemovedKpa: 27, warnings: [] });
    // Below the water table σv0 is total stress: at 3 m, 2 × 18 + 1 × 20 = 56 kPa.
    expect(netFootingPressure({ ...gross, depthM: 3 }, profile).netPressureKpa).toBe(144);
  });

  it('leaves a net load as given', () => {
    const { pressureBasis: _basis, ...net } = gross;
    expect(netFootingPressure(net, profile)).toEqual({ pressureBasis: 'net', netPressureKpa: 200, grossPressureKpa: null, overburdenRemovedKpa: null, warnings: [] });
  });

  it('a gross pressure below the overburden gives a net pressure of 0 and says why', () => {
    const result = netFootingPressure({ ...gross, loadKn: 80 }, profile);
    expect(result.netPressureKpa).toBe(0);
    expect(result.warnings[0]).toMatch(/^Footing G: its gross pressure of 20.0 kPa is less than the overburden removed to found it, 27.0 kPa at 1.5 m/);
  });

  it('throws RangeError for an unknown basis or a founding depth below the profile', () => {
    expect(() => netFootingPressure({ ...gross, pressureBasis: 'total' as 'gross' }, profile)).toThrow(new RangeError("netFootingPressure requires pressureBasis 'net' or 'gross' (footing G)"));
    expect(() => netFootingPressure({ ...gross, depthM: 9 }, profile)).toThrow(RangeError);
  });
});

describe('gross loads in the settlement check, the stress sum and sizing', () => {
  it('property: a gross pressure p settles exactly as a net p − σv0, and the result states both', () => {
    fc.assert(
      fc.property(fc.double({ min: 30, max: 400, noNaN: true }), (grossKpa) => {
        const run = (footing: Footing) => runSettlementCheck({ profile, footings: [footing] }).footings[0];
        const asGross = run({ id: 'G', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1.5, pressureKpa: grossKpa, pressureBasis: 'gross' });
        const asNet = run({ id: 'G', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1.5, pressureKpa: grossKpa - 27 });
        expect(asGross?.totalM).toBe(asNet?.totalM);
        expect([asGross?.pressureBasis, asGross?.grossPressureKpa, asGross?.overburdenRemovedKpa, asGross?.pressureKpa]).toEqual(['gross', grossKpa, 27, grossKpa - 27]);
        expect([asNet?.pressureBasis, asNet?.grossPressureKpa, asNet?.overburdenRemovedKpa]).toEqual(['net', null, null]);
      }),
      { numRuns: 20 },
    );
  });

  it('a footing unloading the ground adds nothing and the check warns', () => {
    const result = runSettlementCheck({ profile, footings: [{ ...gross, loadKn: 80 }] });
    expect(result.footings[0]?.pressureKpa).toBe(0);
    expect(result.footings[0]?.primaryM).toBe(0);
    expect(result.warnings.some((w) => w.startsWith('Footing G: its gross pressure of 20.0 kPa'))).toBe(true);
  });

  it('the stress sum needs the profile for a gross load, and then takes σv0 off', () => {
    const point = { xM: 0, yM: 0, depthBelowGroundM: 3, method: 'boussinesq' as const };
    expect(() => stressIncreaseFromFootings({ footings: [gross], ...point })).toThrow(
      new RangeError('A gross load needs the soil profile for the overburden removed; give the net load or pressure (footing G)'),
    );
    const withProfile = stressIncreaseFromFootings({ footings: [gross], ...point, profile });
    const net = stressIncreaseFromFootings({ footings: [{ id: 'G', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1.5, pressureKpa: 173 }], ...point });
    expect(withProfile.totalKpa).toBeCloseTo(net.totalKpa, 12);
  });

  it('sizing a gross load: the width found, checked as gross, meets the target', () => {
    const result = sizeFootingForSettlement({ profile, footing: { depthM: 1.5, loadKn: 1500, pressureBasis: 'gross' }, targetSettlementM: 0.05, minWidthM: 0.5, maxWidthM: 10 });
    expect(result.status).toBe('found');
    const settle = (widthM: number) => runSettlementCheck({ profile, footings: [{ id: 'S', xM: 0, yM: 0, widthM, lengthM: widthM, depthM: 1.5, loadKn: 1500, pressureBasis: 'gross' }], options: { evaluationPoints: 'centre' } }).footings[0]?.totalM ?? Number.NaN;
    expect(settle(result.widthM ?? 0)).toBeLessThanOrEqual(0.05);
    expect(settle((result.widthM ?? 0) - 0.005)).toBeGreaterThan(0.05);
    const asNet = sizeFootingForSettlement({ profile, footing: { depthM: 1.5, loadKn: 1500 }, targetSettlementM: 0.05, minWidthM: 0.5, maxWidthM: 10 });
    expect(result.widthM ?? Infinity).toBeLessThan(asNet.widthM ?? 0);
  });
});
