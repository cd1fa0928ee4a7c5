import { describe, expect, it } from 'vitest';
import { primaryConsolidationSettlement } from './primary-consolidation-settlement.js';
import { primaryConsolidationSettlementMv } from './primary-consolidation-settlement-mv.js';

describe('primaryConsolidationSettlementMv({ thicknessM, mvM2PerKn, stressIncreaseKpa })', () => {
  it('is mv·Δσ′·H', () => {
    // Hand calculation: 0.25 m²/MN = 0.00025 m²/kN; 0.00025 × 80 × 3 = 0.06 m.
    expect(primaryConsolidationSettlementMv({ thicknessM: 3, mvM2PerKn: 0.00025, stressIncreaseKpa: 80 })).toBeCloseTo(0.06, 15);
  });

  it('matches the e–log σ′ form when mv is the secant over the same stress range', () => {
    // mv = (ΔH/H)/Δσ′ over σ′0 → σ′0 + Δσ′ on the virgin line: the two forms then agree exactly.
    const input = { thicknessM: 2, e0: 1.1, cc: 0.4, cs: 0.06, initialEffectiveStressKpa: 60, stressIncreaseKpa: 45, preconsolidationKpa: 60 };
    const elog = primaryConsolidationSettlement(input).settlementM;
    const mvM2PerKn = elog / input.thicknessM / input.stressIncreaseKpa;
    expect(primaryConsolidationSettlementMv({ thicknessM: 2, mvM2PerKn, stressIncreaseKpa: 45 })).toBeCloseTo(elog, 15);
  });

  it('is zero without a stress increase, and proportional to it', () => {
    expect(primaryConsolidationSettlementMv({ thicknessM: 1, mvM2PerKn: 0.001, stressIncreaseKpa: 0 })).toBe(0);
    const one = primaryConsolidationSettlementMv({ thicknessM: 1, mvM2PerKn: 0.001, stressIncreaseKpa: 10 });
    expect(primaryConsolidationSettlementMv({ thicknessM: 1, mvM2PerKn: 0.001, stressIncreaseKpa: 30 })).toBeCloseTo(3 * one, 15);
  });

  it.each([
    [{ thicknessM: 0 }, 'primaryConsolidationSettlementMv requires a finite thicknessM > 0'],
    [{ mvM2PerKn: -1e-4 }, 'primaryConsolidationSettlementMv requires a finite mvM2PerKn >= 0'],
    [{ stressIncreaseKpa: -1 }, 'primaryConsolidationSettlementMv requires a finite stressIncreaseKpa >= 0'],
    [{ stressIncreaseKpa: Number.NaN }, 'primaryConsolidationSettlementMv requires a finite stressIncreaseKpa >= 0'],
  ])('throws RangeError for %o', (override, message) => {
    expect(() => primaryConsolidationSettlementMv({ thicknessM: 1, mvM2PerKn: 0.001, stressIncreaseKpa: 10, ...override })).toThrow(new RangeError(message));
  });
});
