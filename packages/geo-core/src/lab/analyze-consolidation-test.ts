import { GEO_CORE_VERSION } from '../constants/geo-core-version.js';
import { WATER_UNIT_WEIGHT_KN_PER_M3 } from '../constants/water-unit-weight.js';
import { hydraulicConductivityMPerS as conductivityFromCvAndMv } from './hydraulic-conductivity.js';
import { analyzeIncrementTimeCurves } from './analyze-increment-time-curves.js';
import { apparatusDeflectionAtStress } from './apparatus-deflection-at-stress.js';
import { branchFits, type PathPoint } from './branch-fits.js';
import { checkConsolidationInput } from './check-consolidation-input.js';
import { checkIncrementReadings } from './check-increment-readings.js';
import type { ConsolidationTestInput } from './consolidation-test-input.js';
import type { AppliedPick, ConsolidationIncrementResult, ConsolidationTestResult } from './consolidation-test-result.js';
import type { ConsolidationWarning, ConsolidationWarningCode } from './consolidation-warning.js';
import { heightOfSolidsMm } from './height-of-solids.js';
import { loadingKinds } from './loading-kinds.js';
import { preconsolidationAndCompression } from './preconsolidation-and-compression.js';
import { resolveDryMass } from './resolve-dry-mass.js';
import { sampleQualityAtInSituStress } from './sample-quality-at-in-situ-stress.js';

/**
 * Reduce an incremental-loading oedometer test (ASTM D2435/D2435M-11, 2020)
 * to the parameters a laboratory reports and a designer uses.
 *
 * Heights of solids and void ratios from the dry mass (§12.2); apparatus
 * deflection interpolated from the calibration and subtracted from every
 * reading (§8.1.2); for every loading and reloading increment Taylor's (1948)
 * √t and Casagrande & Fadum's (1940) log-t constructions, cv with Hdr from the
 * height at 50 % consolidation, Cα from the secondary tail, mv and
 * k = cv·mv·γw; over the test Cc (virgin line, automatic or picked), Cr, Cs,
 * CR, RR, σ′p by Casagrande (1936) and Pacheco Silva (1970), OCR and sample
 * quality by Lunne et al. (1997). The compression curve uses end-of-increment
 * void ratios; end-of-primary ones (at the log-time d100) are reported too.
 *
 * Failure policy: out-of-domain input throws RangeError; a value that cannot
 * be had from valid data is null and a warning says why. Deterministic, no
 * I/O; cost is linear in the number of readings.
 *
 * @param input specimen, increments in test order, optional compliance calibration and picks.
 * @returns a plain serialisable result (no NaN or Infinity anywhere).
 * @throws RangeError when a dimension, mass, Gs, stress or reading is out of domain, increment numbers repeat, or the solids would fill the initial height.
 * @example analyzeConsolidationTest(input).compressionIndex
 */
export function analyzeConsolidationTest(input: ConsolidationTestInput): ConsolidationTestResult {
  const { specimen, increments } = input;
  const picks = input.picks ?? {};
  checkConsolidationInput(input);

  const warnings: ConsolidationWarning[] = [];
  const warn = (code: ConsolidationWarningCode, message: string, incrementIndex: number | null = null): void => {
    warnings.push({ code, message, incrementIndex });
  };
  const dryMass = resolveDryMass(specimen);
  if (dryMass.disagreement !== null) {
    warn('mass-inconsistent', `The dry mass given differs by ${(dryMass.disagreement * 100).toFixed(1)} % from wet mass / (1 + w0); the dry mass given was used. Check the masses and the water content.`);
  }
  const initialHeightMm = specimen.initialHeightMm;
  const solidsMm = heightOfSolidsMm(dryMass.dryMassG, specimen.specificGravity, specimen.diameterMm);
  if (!(solidsMm < initialHeightMm)) {
    throw new RangeError('analyzeConsolidationTest requires the height of solids to be less than the initial height (check dry mass, Gs and dimensions)');
  }
  const initialVoidRatio = (initialHeightMm - solidsMm) / solidsMm;
  const kinds = loadingKinds(increments.map((increment) => increment.stressKpa));
  const picksApplied: AppliedPick[] = [];
  const incrementPicks = new Map((picks.increments ?? []).map((pick) => [pick.index, pick]));
  for (const pick of picks.increments ?? []) {
    const position = increments.findIndex((increment) => increment.index === pick.index);
    if (position < 0 || kinds[position] === 'unloading') {
      warn('pick-not-applied', `A pick was given for increment ${pick.index}, which ${position < 0 ? 'is not in the test' : 'is an unloading increment (time curves are read on loading and reloading only)'}; it was not applied.`, pick.index);
    }
  }

  const results: ConsolidationIncrementResult[] = [];
  const path: PathPoint[] = [];
  let previousStress = 0;
  let previousHeight = initialHeightMm;
  let previousVoidRatio = initialVoidRatio;
  let unloadingSkipped = 0;
  increments.forEach((increment, position) => {
    const kind = kinds[position] ?? 'loading';
    const checked = checkIncrementReadings(increment.readings, kind);
    if (checked.timeWasOutOfOrder) {
      warn('non-monotonic-time', `Increment ${increment.index}: elapsed times go backwards between some readings; they were put in time order for the analysis. Check the logger clock or the order of the rows.`, increment.index);
    }
    if (checked.wentBackwards) {
      warn('readings-backwards', `Increment ${increment.index}: the deformation falls back by ${checked.largestBackwardStepMm.toFixed(3)} mm while the load is on. Check the gauge for slipping, or the specimen for swelling under this stress.`, increment.index);
    }
    const deflection = input.compliance === undefined || input.compliance.length === 0 ? { deflectionMm: 0, outsideCalibration: false } : apparatusDeflectionAtStress(input.compliance, increment.stressKpa);
    if (deflection.outsideCalibration) {
      warn('compliance-outside-calibration', `Increment ${increment.index}: ${increment.stressKpa} kPa is outside the apparatus calibration; the nearest calibrated deflection (${deflection.deflectionMm} mm) was subtracted. Extend the calibration to this stress.`, increment.index);
    }
    const lastReading = checked.readings[checked.readings.length - 1];
    const deformationEndMm = (lastReading?.deformationMm ?? 0) - deflection.deflectionMm;
    const heightEndMm = initialHeightMm - deformationEndMm;
    if (!(heightEndMm > solidsMm)) {
      throw new RangeError(`analyzeConsolidationTest requires the specimen height to stay above the height of solids (increment ${increment.index} compresses it past its solids)`);
    }
    const voidRatioEnd = (heightEndMm - solidsMm) / solidsMm;
    const stressChangeMPa = (increment.stressKpa - previousStress) / 1000;
    const avPerMPa = stressChangeMPa === 0 ? null : -(voidRatioEnd - previousVoidRatio) / stressChangeMPa;
    const mvPerMPa = stressChangeMPa === 0 ? null : (previousHeight - heightEndMm) / previousHeight / stressChangeMPa;
    let taylor = null;
    let casagrande = null;
    if (kind === 'unloading') unloadingSkipped += 1;
    else {
      const pick = incrementPicks.get(increment.index);
      const curves = analyzeIncrementTimeCurves(checked.readings, pick, initialHeightMm, deflection.deflectionMm, specimen.drainage);
      taylor = curves.taylor;
      casagrande = curves.casagrande;
      for (const warning of curves.warnings) {
        const code = warning.code === 'insufficient-readings' ? 'time-curve-not-drawn' : warning.code;
        warn(code, `Increment ${increment.index}: ${warning.message}`, increment.index);
      }
      const record = (target: AppliedPick['target'], value: number | undefined, applied: boolean): void => {
        if (value !== undefined) picksApplied.push({ target, incrementIndex: increment.index, value, applied });
      };
      record('taylor.t90Min', pick?.taylor?.t90Min, taylor?.t90Source === 'pick');
      record('taylor.d0Mm', pick?.taylor?.d0Mm, taylor?.d0Source === 'pick');
      record('casagrande.t50Min', pick?.casagrande?.t50Min, casagrande?.t50Source === 'pick');
      record('casagrande.d0Mm', pick?.casagrande?.d0Mm, casagrande?.d0Source === 'pick');
      record('casagrande.d100Mm', pick?.casagrande?.d100Mm, casagrande?.d100Source === 'pick');
    }
    const d100 = casagrande?.d100Mm ?? null;
    const heightEndOfPrimaryMm = d100 === null ? null : initialHeightMm - (d100 - deflection.deflectionMm);
    const usablePrimaryHeight = heightEndOfPrimaryMm !== null && heightEndOfPrimaryMm > solidsMm ? heightEndOfPrimaryMm : null;
    const voidRatioEndOfPrimary = usablePrimaryHeight === null ? null : (usablePrimaryHeight - solidsMm) / solidsMm;
    const tailSlope = casagrande?.secondarySlopeMmPerLogCycle ?? null;
    const secondaryCompressionIndex = tailSlope === null ? null : tailSlope / solidsMm;
    const cvForK = taylor?.cvM2PerYr ?? casagrande?.cvM2PerYr ?? null;
    const hydraulicConductivityMPerS =
      cvForK === null || mvPerMPa === null || !(mvPerMPa >= 0) ? null : conductivityFromCvAndMv(cvForK, mvPerMPa / 1000, WATER_UNIT_WEIGHT_KN_PER_M3);
    results.push({
      index: increment.index,
      stressKpa: increment.stressKpa,
      kind,
      readingCount: increment.readings.length,
      apparatusDeflectionMm: deflection.deflectionMm,
      deformationEndMm,
      heightEndMm,
      strainEnd: deformationEndMm / initialHeightMm,
      voidRatioEnd,
      heightEndOfPrimaryMm: usablePrimaryHeight,
      strainEndOfPrimary: usablePrimaryHeight === null ? null : (initialHeightMm - usablePrimaryHeight) / initialHeightMm,
      voidRatioEndOfPrimary,
      avPerMPa,
      mvPerMPa,
      taylor,
      casagrande,
      cvTaylorM2PerYr: taylor?.cvM2PerYr ?? null,
      cvCasagrandeM2PerYr: casagrande?.cvM2PerYr ?? null,
      secondaryCompressionIndex,
      modifiedSecondaryCompressionIndex: secondaryCompressionIndex === null ? null : secondaryCompressionIndex / (1 + (voidRatioEndOfPrimary ?? voidRatioEnd)),
      hydraulicConductivityMPerS,
      hydraulicConductivityBasis: cvForK === null || mvPerMPa === null ? null : taylor !== null ? 'taylor' : 'casagrande',
    });
    path.push({ index: increment.index, kind, stressKpa: increment.stressKpa, voidRatio: voidRatioEnd });
    previousStress = increment.stressKpa;
    previousHeight = heightEndMm;
    previousVoidRatio = voidRatioEnd;
  });
  if (unloadingSkipped > 0) {
    warn('time-curves-not-applied', `Time-curve methods are read on loading and reloading increments only, so cv, Cα and k are left empty for the ${unloadingSkipped} unloading increment${unloadingSkipped === 1 ? '' : 's'}.`);
  }

  const compression = preconsolidationAndCompression(path, initialVoidRatio, picks, warn, picksApplied);
  const branches = branchFits(path, compression.preconsolidation.adoptedKpa);
  if (branches.swell === null) warn('no-unload-branch', 'The test has no unloading branch, so the swell index Cs cannot be found. Unload the specimen in steps at the end of the test.');
  if (branches.recompression === null) {
    warn('no-recompression-branch', 'There is neither a reload branch nor two first-loading points below σ′p, so the recompression index Cr cannot be found.');
  }
  const inSitu = specimen.inSituVerticalEffectiveStressKpa ?? null;
  const adopted = compression.preconsolidation.adoptedKpa;
  const overconsolidationRatio = inSitu === null || adopted === null ? null : adopted / inSitu;
  const sampleQuality = inSitu === null ? null : sampleQualityAtInSituStress(path, initialVoidRatio, inSitu, overconsolidationRatio, warn);
  if (inSitu === null) warn('sample-quality-not-assessed', 'No in-situ vertical effective stress was given, so OCR and sample quality (Lunne et al. 1997) are not assessed.');
  const last = results[results.length - 1] as ConsolidationIncrementResult;
  const saturation = (waterContent: number | undefined, voidRatio: number): number | null =>
    waterContent === undefined || !(voidRatio > 0) ? null : (waterContent * specimen.specificGravity) / voidRatio;
  const compressionIndex = compression.compressionFit?.value ?? null;
  const recompressionIndex = branches.recompression?.value ?? null;
  return {
    geoCoreVersion: GEO_CORE_VERSION,
    specimen: {
      areaMm2: (Math.PI * specimen.diameterMm ** 2) / 4,
      dryMassG: dryMass.dryMassG,
      dryMassSource: dryMass.source,
      heightOfSolidsMm: solidsMm,
      initialHeightMm,
      drainage: specimen.drainage,
      initialDegreeOfSaturation: saturation(specimen.initialWaterContent, initialVoidRatio),
      finalVoidRatio: last.voidRatioEnd,
      finalDegreeOfSaturation: saturation(specimen.finalWaterContent, last.voidRatioEnd),
    },
    initialVoidRatio,
    increments: results,
    compressionIndex,
    compressionRatio: compressionIndex === null ? null : compressionIndex / (1 + initialVoidRatio),
    compressionFit: compression.compressionFit,
    recompressionIndex,
    recompressionRatio: recompressionIndex === null ? null : recompressionIndex / (1 + initialVoidRatio),
    recompressionFit: branches.recompression,
    swellIndex: branches.swell?.value ?? null,
    swellFit: branches.swell,
    preconsolidation: compression.preconsolidation,
    inSituVerticalEffectiveStressKpa: inSitu,
    overconsolidationRatio,
    sampleQuality,
    picksApplied,
    warnings,
  };
}
