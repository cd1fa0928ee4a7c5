/** One cv measured in the oedometer, placed at a stress. */
export interface CvStressPoint {
  /** The stress the cv belongs to, kPa (> 0); see cvPointsFromTestResult for the convention. */
  readonly stressKpa: number;
  /** Coefficient of consolidation, m²/yr (> 0). */
  readonly cvM2PerYr: number;
}

/** The field's stress range and the lab's cv points. */
export interface CvAtStressRangeInput {
  readonly points: readonly CvStressPoint[];
  /** σ′v0 in the layer, kPa (> 0). */
  readonly initialEffectiveStressKpa: number;
  /** σ′v0 + Δσ′ in the layer, kPa (≥ σ′v0). */
  readonly finalEffectiveStressKpa: number;
}

/** The cv for the range, and how it was had. */
export interface CvAtStressRangeResult {
  readonly cvM2PerYr: number;
  /** The convention, in words, for the record. */
  readonly convention: string;
  /** Stresses of the points that bear on the range (the two that bracket each end, and any between), kPa. */
  readonly pointsUsedStressKpa: readonly number[];
  /** True where part of the range lies beyond the tested stresses and cv was held at the end point's value. */
  readonly heldBeyondTestedStresses: boolean;
  readonly warnings: readonly string[];
}

export const CV_AT_STRESS_RANGE_CONVENTION =
  'cv is interpolated straight between the points on log cv against log σ′ (points at one stress are combined by their geometric mean) and held at the end value beyond the first and last point; the value for the range σ′v0 → σ′f is the mean of log cv over log σ′ across the range — the geometric mean of cv with every part of the range weighted by its length on the log-stress axis, as compression accrues on the e–log σ′ plot. A range of zero length takes the interpolated value at σ′v0.';

/**
 * The coefficient of consolidation for a layer "at the design stress range":
 * cv from an oedometer test's increments, interpolated on log–log axes and
 * averaged over the stress range the layer will see in the field, from the
 * in-situ effective stress σ′v0 to the final stress σ′v0 + Δσ′
 * (CV_AT_STRESS_RANGE_CONVENTION):
 * log cv_design = [∫ log cv d(log σ′)] / (log σ′f − log σ′v0), exactly, on the
 * piecewise straight interpolant. cv of a clay changes markedly about σ′p
 * (often by an order of magnitude), so a cv from an increment outside the
 * range misstates the settlement time; this takes the increments the field
 * loading actually spans.
 *
 * Source: the practice of selecting cv for the field stress range from the cv–log σ′ plot
 * (Holtz & Kovacs, *An Introduction to Geotechnical Engineering*, ch. 9;
 * Craig's *Soil Mechanics*, ch. "Consolidation"); the averaging is our
 * stated convention.
 *
 * @param input cv points (kPa, m²/yr), σ′v0 and σ′f (kPa)
 * @returns cv in m²/yr with the convention and the points used
 * @throws RangeError for no points, a stress or cv not positive and finite, σ′v0 ≤ 0, or σ′f < σ′v0
 * @example cvAtStressRange({ points: [{ stressKpa: 50, cvM2PerYr: 4 }, { stressKpa: 200, cvM2PerYr: 1 }], initialEffectiveStressKpa: 50, finalEffectiveStressKpa: 200 }).cvM2PerYr // 2 (the geometric mean of 4 and 1)
 */
export function cvAtStressRange(input: CvAtStressRangeInput): CvAtStressRangeResult {
  const caller = 'cvAtStressRange';
  const { initialEffectiveStressKpa: from, finalEffectiveStressKpa: to } = input;
  if (input.points.length === 0) throw new RangeError(`${caller} requires at least one cv point`);
  for (const point of input.points) {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !(point.cvM2PerYr > 0 && Number.isFinite(point.cvM2PerYr))) {
      throw new RangeError(`${caller} requires every point's stressKpa and cvM2PerYr to be finite and > 0`);
    }
  }
  if (!(from > 0) || !Number.isFinite(from)) throw new RangeError(`${caller} requires a finite initialEffectiveStressKpa > 0`);
  if (!(to >= from) || !Number.isFinite(to)) throw new RangeError(`${caller} requires finalEffectiveStressKpa >= initialEffectiveStressKpa`);
  // Combine points at one stress (a repeated increment, or Taylor and Casagrande given together) in log.
  const byStress = new Map<number, number[]>();
  for (const point of input.points) byStress.set(point.stressKpa, [...(byStress.get(point.stressKpa) ?? []), Math.log10(point.cvM2PerYr)]);
  const nodes = [...byStress.entries()]
    .map(([stressKpa, logs]) => ({ x: Math.log10(stressKpa), y: logs.reduce((sum, value) => sum + value, 0) / logs.length, stressKpa }))
    .sort((a, b) => a.x - b.x);
  type Node = (typeof nodes)[number];
  const first = nodes[0] as Node;
  const last = nodes[nodes.length - 1] as Node;
  const logCvAt = (x: number): number => {
    if (x <= first.x) return first.y;
    if (x >= last.x) return last.y;
    let upper = 1;
    while ((nodes[upper]?.x ?? Infinity) < x) upper += 1;
    const low = nodes[upper - 1] as Node;
    const high = nodes[upper] as Node;
    return low.y + ((x - low.x) * (high.y - low.y)) / (high.x - low.x);
  };
  const xFrom = Math.log10(from);
  const xTo = Math.log10(to);
  const warnings: string[] = [];
  const heldBeyondTestedStresses = xFrom < first.x || xTo > last.x;
  if (heldBeyondTestedStresses) {
    warnings.push(
      `The stress range ${from.toFixed(1)}–${to.toFixed(1)} kPa reaches beyond the stresses with a cv (${first.stressKpa.toPrecision(3)}–${last.stressKpa.toPrecision(3)} kPa); cv is held at the nearest point's value there. Check that the test spans the field stresses.`,
    );
  }
  const inside = nodes.filter((node) => node.x >= xFrom && node.x <= xTo);
  const below = nodes.filter((node) => node.x < xFrom).at(-1);
  const above = nodes.find((node) => node.x > xTo);
  // A point beyond an end bears on the range only where it brackets that end with a point on the other side.
  const bracketsFrom = below !== undefined && !nodes.some((node) => node.x === xFrom) && nodes.some((node) => node.x > xFrom);
  const bracketsTo = above !== undefined && !nodes.some((node) => node.x === xTo) && nodes.some((node) => node.x < xTo);
  const bracketing = [...(bracketsFrom ? [below] : []), ...inside, ...(bracketsTo ? [above] : [])];
  const pointsUsedStressKpa = (bracketing.length > 0 ? bracketing : [xFrom < first.x ? first : last]).map((node) => node.stressKpa);
  if (xTo === xFrom) {
    return { cvM2PerYr: 10 ** logCvAt(xFrom), convention: CV_AT_STRESS_RANGE_CONVENTION, pointsUsedStressKpa, heldBeyondTestedStresses, warnings };
  }
  // Exact integral of the piecewise straight log cv over [xFrom, xTo]: trapezoids between the breakpoints.
  const breaks = [xFrom, ...nodes.map((node) => node.x).filter((x) => x > xFrom && x < xTo), xTo];
  let area = 0;
  for (let index = 1; index < breaks.length; index += 1) {
    const a = breaks[index - 1] as number;
    const b = breaks[index] as number;
    area += ((b - a) * (logCvAt(a) + logCvAt(b))) / 2;
  }
  return { cvM2PerYr: 10 ** (area / (xTo - xFrom)), convention: CV_AT_STRESS_RANGE_CONVENTION, pointsUsedStressKpa, heldBeyondTestedStresses, warnings };
}

