import { DomainError } from '../../errors/domain-error.js';
import type { AnalysisRefusal } from './analysis-refusal.js';

export const noReadings = () =>
  new DomainError('invalid_transition', 'This test has no readings yet, so there is nothing to analyse. Upload the readings file first.');

/** geo-core refused the data: the refusal is put in plain words by explainRefusal. */
export const analysisRejected = (refusal: AnalysisRefusal) => new DomainError('validation_failed', `The analysis could not run on these data. ${refusal.message}`, [refusal.issue]);

export const readingsChanged = () =>
  new DomainError('invalid_transition', 'Newer readings arrived while this analysis ran, so its result was set aside; the analysis of the new readings follows.');

export const noAnalysis = () =>
  new DomainError('not_found', 'This test has not been analysed yet. Upload its readings (the analysis then runs by itself), or run the analysis again.');
