import { BASE_MAPPING, type LayoutTruth, type LoggerLayout } from './layout-types.js';
import { logSpacedReadingTimesMin } from '@porestack/geo-core';
import { LAYOUT_CLAYS, layoutTest } from './layout-clays.js';
import { layoutReadings, written } from './layout-values.js';

/** Swelling of the first increment, mm at the end of the day, reached as t/(t + 30 min). */
const SWELL_MM = 0.35;
const swelling = (elapsedMin: number) => (SWELL_MM * elapsedMin) / (elapsedMin + 30);

/**
 * A clay that swells under its first, small load — an expansive sample takes water — read on
 * a gauge in mm that falls as the specimen compresses, by a fast logger (1,100 readings a
 * day). The rows a preview reads (1,000) hold only the first increment, over which the
 * reading rises, so the direction guessed from them is the wrong way round: the one guess a
 * technician has to correct (the check on the imported deformations says so). Every later
 * reading is shifted by the swelling, which leaves the slopes of the compression curve, and
 * Cc, as chosen.
 */
const base = layoutTest(LAYOUT_CLAYS.swellingFirst, logSpacedReadingTimesMin(1100, 1440));
const swollenEnd = swelling(1440);
const truth: LayoutTruth = {
  ...base.truth,
  increments: base.truth.increments.map((increment) => ({
    ...increment,
    readings: increment.readings.map((reading) => ({
      ...reading,
      deformationMm: increment.index === 1 ? reading.deformationMm - swelling(reading.elapsedMin) : reading.deformationMm - swollenEnd,
    })),
  })),
};
const GAUGE_START_MM = 12;
export const SWELLING_FIRST_CSV: LoggerLayout = {
  fileName: 'swelling-first-load.csv',
  traits: 'a gauge in mm falling with compression whose first increment swells, so its direction is guessed wrong',
  specimen: base.specimen,
  truth,
  mapping: {
    ...BASE_MAPPING,
    delimiter: ',',
    columns: { increment: 'Stage', stress: 'Stress (kPa)', elapsedTime: 'Time (min)', deformation: 'Gauge (mm)' },
    units: { stress: 'kPa', time: 'min', deformation: 'mm' },
    deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: false },
  },
  bytes: async () =>
    Buffer.from(
      `${['Stage,Stress (kPa),Time (min),Gauge (mm)', ...layoutReadings(truth).map((r) => [r.increment, r.stressKpa, written(r.elapsedMin, 5), written(GAUGE_START_MM - r.deformationMm, 4)].join(','))].join('\n')}\n`,
    ),
};
