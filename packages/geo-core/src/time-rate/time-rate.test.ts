import { describe, expect, it } from 'vitest';
import type { ConsolidatingLayer } from './consolidating-layer.types.js';
import { drainagePathLengthM } from './drainage-path-length.js';
import { settlementAtTime } from './settlement-at-time.js';
import { settlementTimeCurve } from './settlement-time-curve.js';
import { timeForPrimaryShare } from './time-for-primary-share.js';

const doubleDrained: ConsolidatingLayer = { primarySettlementM: 0.1, thicknessM: 4, cvM2PerYr: 0.788, drainageTop: 'free', drainageBottom: 'free' };
const singleDrained: ConsolidatingLayer = { primarySettlementM: 0.2, thicknessM: 3, cvM2PerYr: 1.5, drainageTop: 'impermeable', drainageBottom: 'free' };
const sealed: ConsolidatingLayer = { primarySettlementM: 0.05, thicknessM: 2, cvM2PerYr: 1, drainageTop: 'impermeable', drainageBottom: 'impermeable' };

describe('drainagePathLengthM({ thicknessM, drainageTop, drainageBottom })', () => {
  it('is H/2 with double drainage, H with single, null with none', () => {
    expect(drainagePathLengthM(doubleDrained)).toBe(2);
    expect(drainagePathLengthM(singleDrained)).toBe(3);
    expect(drainagePathLengthM(sealed)).toBeNull();
  });

  it('throws RangeError for a non-positive thickness', () => {
    expect(() => drainagePathLengthM({ ...sealed, thicknessM: 0 })).toThrow(new RangeError('drainagePathLengthM requires a finite thicknessM > 0'));
  });
});

describe('settlementAtTime(layers, timeYears)', () => {
  it('reaches half the settlement at Tv = 0.197 (published U–Tv table, Das)', () => {
    // Tv = 0.788 × 1/2² = 0.197 → U = 50 % to the table's three decimals (series gives 0.5002).
    const result = settlementAtTime([doubleDrained], 1);
    expect(result.layers[0]?.timeFactor).toBeCloseTo(0.197, 12);
    expect(Math.abs((result.shareOfPrimary ?? 0) - 0.5)).toBeLessThanOrEqual(0.0005);
  });

  it('adds layers on their own drainage paths and leaves a sealed layer at zero', () => {
    // Single-drained layer: Tv = 1.5 × 1/9 = 0.1667; the sealed layer never drains.
    const result = settlementAtTime([doubleDrained, singleDrained, sealed], 1);
    expect(result.layers[1]?.timeFactor).toBeCloseTo(1.5 / 9, 12);
    expect(result.layers[2]?.degreeOfConsolidation).toBe(0);
    expect(result.settlementM).toBeCloseTo((result.layers[0]?.settlementM ?? 0) + (result.layers[1]?.settlementM ?? 0), 12);
  });

  it('is zero at t = 0', () => {
    expect(settlementAtTime([doubleDrained], 0).settlementM).toBe(0);
  });

  it('throws RangeError for a negative time or a layer without a positive cv', () => {
    expect(() => settlementAtTime([doubleDrained], -1)).toThrow(new RangeError('settlementAtTime requires a finite timeYears >= 0'));
    expect(() => settlementAtTime([{ ...doubleDrained, cvM2PerYr: 0 }], 1)).toThrow(new RangeError('settlementAtTime requires every layer to have a finite cvM2PerYr > 0'));
  });
});

describe('timeForPrimaryShare(layers, share)', () => {
  it('one layer: t = Tv(U)·Hdr²/cv, 90 % at Tv ≈ 0.848 (published table)', () => {
    // Hand calculation: Hdr = 4 m (single drainage), cv = 1 m²/yr: t90 = 0.848 × 16 = 13.57 yr to the table's precision.
    const result = timeForPrimaryShare([{ ...doubleDrained, drainageBottom: 'impermeable', cvM2PerYr: 1 }], 0.9);
    expect(Math.abs((result.timeYears ?? 0) - 13.57)).toBeLessThanOrEqual(0.01);
  });

  it('several layers: the time found gives back the share asked for', () => {
    const layers = [doubleDrained, singleDrained];
    const { timeYears } = timeForPrimaryShare(layers, 0.75);
    expect(settlementAtTime(layers, timeYears ?? 0).shareOfPrimary).toBeCloseTo(0.75, 8);
  });

  it('answers null with a warning when the share lies beyond what the draining layers can give', () => {
    // Draining layers carry 0.3 of 0.35 m = 85.7 %.
    const result = timeForPrimaryShare([doubleDrained, singleDrained, sealed], 0.9);
    expect(result.timeYears).toBeNull();
    expect(result.warnings[0]).toMatch(/Only 85.7 %/);
    expect(timeForPrimaryShare([doubleDrained, singleDrained, sealed], 0.8).timeYears).not.toBeNull();
  });

  it('answers null when nothing settles', () => {
    expect(timeForPrimaryShare([{ ...doubleDrained, primarySettlementM: 0 }], 0.5).timeYears).toBeNull();
  });

  it('throws RangeError for a share outside (0, 1)', () => {
    expect(() => timeForPrimaryShare([doubleDrained], 1)).toThrow(new RangeError('timeForPrimaryShare requires share strictly between 0 and 1'));
  });
});

describe('settlementTimeCurve(layers, immediateSettlementM, timesYears)', () => {
  it('starts at the immediate settlement, rises, and tends to immediate + primary', () => {
    const curve = settlementTimeCurve([doubleDrained], 0.01);
    expect(curve).toHaveLength(41);
    expect(curve[0]?.timeYears).toBeCloseTo(0.01, 12);
    for (let index = 1; index < curve.length; index += 1) expect(curve[index]?.settlementM).toBeGreaterThanOrEqual(curve[index - 1]?.settlementM ?? 0);
    expect(settlementTimeCurve([doubleDrained], 0.01, [0, 1000])).toEqual([
      { timeYears: 0, primarySettlementM: 0, settlementM: 0.01 },
      { timeYears: 1000, primarySettlementM: 0.1, settlementM: 0.11 },
    ]);
  });

  it('throws RangeError for a negative immediate settlement', () => {
    expect(() => settlementTimeCurve([doubleDrained], -0.01)).toThrow(new RangeError('settlementTimeCurve requires a finite immediateSettlementM >= 0'));
  });
});
