import type { TimeDeformationReading } from '../time-curves/time-curve-types.js';

/** A raw gauge reading as written on the sheet. */
export interface DialReading {
  readonly elapsedMin: number;
  /** The gauge value, in divisions (or mm when mmPerDivision is 1). */
  readonly dialReading: number;
}

export interface DialGauge {
  /** Gauge reading at the start of the test (zero deformation). */
  readonly zeroReading: number;
  /** Millimetres per division (0.001 for a 0.001 mm dial, 0.0254 for 0.001 in, 1 when readings are already in mm). */
  readonly mmPerDivision: number;
  /** Whether the gauge reading rises as the specimen compresses (plunger pushed in) or falls. */
  readonly compressionIncreasesReading: boolean;
}

/**
 * Convert raw dial or transducer readings to cumulative specimen deformation
 * since the start of the test, compression positive:
 * d = ±(reading − zero) × mm per division, the sign set by the gauge's direction.
 *
 * @param readings the gauge readings with their elapsed times.
 * @param gauge the zero reading, the division size in mm and the direction.
 * @returns readings in the form analyzeConsolidationTest takes.
 * @throws RangeError when the division size is not positive, or a reading or the zero is not finite.
 * @example dialReadingsToDeformation([{ elapsedMin: 1, dialReading: 4.53 }], { zeroReading: 5, mmPerDivision: 1, compressionIncreasesReading: false })[0]?.deformationMm // ≈ 0.47
 */
export function dialReadingsToDeformation(readings: readonly DialReading[], gauge: DialGauge): TimeDeformationReading[] {
  if (!(gauge.mmPerDivision > 0 && Number.isFinite(gauge.mmPerDivision)) || !Number.isFinite(gauge.zeroReading)) {
    throw new RangeError('dialReadingsToDeformation requires a finite zero reading and a positive finite division size in mm');
  }
  const sign = gauge.compressionIncreasesReading ? 1 : -1;
  return readings.map((reading) => {
    if (!Number.isFinite(reading.dialReading) || !Number.isFinite(reading.elapsedMin)) {
      throw new RangeError('dialReadingsToDeformation requires finite readings and times');
    }
    return { elapsedMin: reading.elapsedMin, deformationMm: sign * (reading.dialReading - gauge.zeroReading) * gauge.mmPerDivision };
  });
}
