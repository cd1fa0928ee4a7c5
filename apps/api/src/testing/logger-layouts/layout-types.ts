import type { ConsolidationIncrementInput, SyntheticConsolidationParameters } from '@porestack/geo-core';
import type { ImportMapping } from '@porestack/types';

/** What the specimen form takes: the only values a technician types for a layout's test. */
export interface LayoutSpecimen {
  readonly initialHeightMm: number;
  readonly diameterMm: number;
  readonly specificGravity: number;
  /** Rounded to 0.01 g, as weighed. */
  readonly dryMassG: number;
  readonly drainage: 'double' | 'single';
}

/** The invented test behind a layout and what its reduction must give back. */
export interface LayoutTruth {
  /** The chosen e0 of the synthetic clay. */
  readonly initialVoidRatio: number;
  /** The chosen Cc of the synthetic clay. */
  readonly compressionIndex: number;
  readonly parameters: SyntheticConsolidationParameters;
  /** The readings as generated, in kPa, minutes and mm (before the layout writes them its way). */
  readonly increments: readonly ConsolidationIncrementInput[];
}

/** A file as some logger might write it, made from a synthetic test, with its truth. */
export interface LoggerLayout {
  /** File name, e.g. "title-rows.xlsx". */
  readonly fileName: string;
  /** What is unusual about it, in a few words. */
  readonly traits: string;
  readonly bytes: () => Promise<Buffer>;
  readonly specimen: LayoutSpecimen;
  readonly truth: LayoutTruth;
  /** The mapping a technician reading the file would set: what the guess has to reach. */
  readonly mapping: ImportMapping;
}

/** What most layouts share: the first sheet, the stress in a column, times as numbers from each increment's start. */
export const BASE_MAPPING = { decimalSeparator: '.', headerRow: 1, sheets: 'first', stressFrom: 'column', time: { format: 'number', origin: 'increment', dateOrder: 'dmy' } } as const;
