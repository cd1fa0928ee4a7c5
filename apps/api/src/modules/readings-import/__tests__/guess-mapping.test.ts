import { describe, expect, it } from 'vitest';
import { LOGGER_LAYOUTS, SWELLING_FIRST_CSV } from '../../../testing/logger-layouts/index.js';
import { detectHeaderRow } from '../detect-header-row.js';
import { guessColumns } from '../guess-columns.js';
import { guessDelimiter } from '../guess-delimiter.js';
import { guessMapping } from '../guess-mapping.js';
import { lengthUnitOf, splitHeader, stressUnitOf, timeUnitOf } from '../header-units.js';
import { guessedSuggestion } from '../mapping-suggestion.js';
import { parseCsvTable } from '../parse-csv-table.js';
import { readTable } from '../read-table.js';
import { firstSheetRows } from '../raw-table.js';
import { stressFromSheetName } from '../sheet-stress.js';
import { sniffFileType } from '../sniff-file-type.js';

const LIMITS = { maxFileBytes: 40 * 1024 * 1024, maxRows: 500_000 };

/** What the preview reads of a file: a CSV's first 256 kB, the first 1,000 rows. */
async function previewOf(bytes: Buffer) {
  const type = sniffFileType(bytes);
  const start = type === 'csv' && bytes.length > 256 * 1024 ? bytes.subarray(0, bytes.lastIndexOf(0x0a, 256 * 1024) + 1) : bytes;
  return readTable(start, type, LIMITS, { previewRows: 1000 });
}

describe('guessMapping(preview) on the generated logger layouts', () => {
  for (const layout of LOGGER_LAYOUTS) {
    it(`${layout.fileName}: guesses the technician's whole mapping, leaves nothing open and gives a reason for each column`, async () => {
      const suggestion = guessedSuggestion(guessMapping(await previewOf(await layout.bytes()), null));
      expect(suggestion.open).toEqual([]);
      expect(suggestion.mapping).toEqual(layout.mapping);
      for (const field of ['elapsedTime', 'deformation'] as const) expect(suggestion.reasons[field]).toBe(`From the header '${layout.mapping.columns[field]}'.`);
    });
  }

  it('swelling-first-load.csv: the one wrong guess is the gauge direction, read from a first increment that swells', async () => {
    const suggestion = guessedSuggestion(guessMapping(await previewOf(await SWELLING_FIRST_CSV.bytes()), null));
    expect(suggestion.mapping).toEqual({ ...SWELLING_FIRST_CSV.mapping, deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: true } });
  });

  it('follows a chosen header row: row 1 of title-rows.xlsx gives its title as the only column, and nothing to import', async () => {
    const layout = LOGGER_LAYOUTS.find((candidate) => candidate.fileName === 'title-rows.xlsx');
    const guessed = guessMapping(await previewOf(await (layout?.bytes() ?? Promise.reject(new Error('no layout')))), 1);
    expect(guessed.detectedHeaderRow).toBe(5);
    expect(guessed.guess.headerRow).toBe(1);
    expect(guessed.open).toEqual(expect.arrayContaining(['stress', 'elapsedTime', 'deformation']));
  });

  it('asks for what a header does not tell: the size of a "div" and units nobody wrote', () => {
    const table = parseCsvTable('Stage,Load,Time,Dial (div)\n1,25,0,5000\n1,25,1,4990\n1,25,2,4985\n1,25,4,4981\n2,50,0,4981\n', LIMITS);
    const guessed = guessMapping(table, null);
    expect(guessed.open.sort()).toEqual(['dialDivision', 'stressUnit', 'timeUnit']);
    expect(guessed.guess.deformationReading).toEqual({ kind: 'dial', zeroReading: null, divisionSize: null, increasesWithCompression: false });
    expect(guessedSuggestion(guessed).mapping).toBeNull();
  });

  it('reads the clock running on from the start of the test, and restarting with each increment', () => {
    const runningOn = guessMapping(parseCsvTable('inc,p (kPa),t (min),d (mm)\n1,25,0,0\n1,25,10,0.1\n2,50,10,0.1\n2,50,20,0.3\n', LIMITS), null);
    expect(runningOn.guess.time.origin).toBe('test');
    expect(runningOn.reasons.timeOrigin).toBe('The clock runs on into the second increment (10 after 10): each increment counts from its first reading.');
    const restarting = guessMapping(parseCsvTable('inc,p (kPa),t (min),d (mm)\n1,25,0,0\n1,25,10,0.1\n2,50,0,0.1\n2,50,10,0.3\n', LIMITS), null);
    expect(restarting.guess.time.origin).toBe('increment');
  });
});

describe('the header words and units, in six languages', () => {
  it.each([
    ['Spannung [kgf/cm²]', 'kgfPerCm2'],
    ['Pressure (tsf)', 'tsf'],
    ['Contrainte (kPa)', 'kPa'],
    ['Presión [kN/m2]', 'kPa'],
    ['Tensão (MPa)', 'MPa'],
    ['Carico (kg/cm2)', 'kgfPerCm2'],
    ['stress_kpa', 'kPa'],
    ['Load / psi', 'psi'],
  ] as const)('%s is a stress in %s', (header, unit) => {
    const parts = splitHeader(header);
    expect(stressUnitOf(parts.unit ?? '')).toBe(unit);
    expect(guessColumns([header]).stress?.name).toBe(header);
  });

  it.each([
    ['Zeit [s]', 's'],
    ['Elapsed (h)', 'h'],
    ['Temps (hh:mm:ss)', 'duration'],
    ['Tiempo [min]', 'min'],
    ['Tempo decorrido (dias)', 'd'],
    ['Tempo trascorso (secondi)', 's'],
    ['Zeit in Std', 'h'],
  ] as const)('%s is a time in %s', (header, unit) => {
    expect(timeUnitOf(splitHeader(header).unit ?? '')).toBe(unit);
    expect(guessColumns([header]).elapsedTime?.name).toBe(header);
  });

  it.each([
    ['Setzung [mm]', { unit: 'mm', division: 1 }],
    ['Dial (in)', { unit: 'in', division: 1 }],
    ['Lectura [0,01 mm]', { unit: 'mm', division: 0.01 }],
    ['Weg [µm]', { unit: 'mm', division: 0.001 }],
    ['Tassement (1/100 mm)', { unit: 'mm', division: 0.01 }],
    ['Cedimento (mm)', { unit: 'mm', division: 1 }],
    ['Dial (div)', { unit: 'mm', division: null }],
  ] as const)('%s is a deformation or gauge in %j', (header, length) => {
    expect(lengthUnitOf(splitHeader(header).unit ?? '')).toEqual(length);
    expect(guessColumns([header]).deformation?.name).toBe(header);
  });

  it('takes "Load step" for the increment, not the stress; passes over temperature and notes; prefers elapsed time to a clock', () => {
    const columns = guessColumns(['Load step', 'Date', 'Clock', 'Load (kPa)', 'Elapsed (s)', 'Temperature (°C)', 'Settlement (mm)', 'Notes']);
    expect(columns).toMatchObject({ increment: { name: 'Load step' }, stress: { name: 'Load (kPa)' }, elapsedTime: { name: 'Elapsed (s)' }, deformation: { name: 'Settlement (mm)' } });
    expect(guessColumns(['Temperature (°C)', 'Notes', 'Strain (%)'])).toEqual({ increment: null, stress: null, elapsedTime: null, deformation: null });
  });
});

describe('guessDelimiter(text) and detectHeaderRow(rows)', () => {
  it('takes semicolons over decimal commas, commas over nothing, and looks past title lines', () => {
    expect(guessDelimiter('Laststufe;Spannung;Zeit;Setzung\n1;0,127;0;0\n1;0,127;0,6;0,0123\n')).toBe(';');
    // Every value has a decimal comma: commas split each row alike, but into fewer columns than the semicolons.
    expect(guessDelimiter('a;b;c;d;e\n1,5;2,5;3,5;4,5;x\n1,6;2,6;3,6;4,6;y\n')).toBe(';');
    expect(guessDelimiter('increment,stress_kpa,elapsed_min,deformation_mm\n1,25,0,0\n')).toBe(',');
    expect(guessDelimiter('Test 12 – frame 2\n\ninc\tp\tt\td\n1\t25\t0\t0\n1\t25\t1\t0.1\n')).toBe('\t');
  });

  it('finds the names below title rows, and row 1 when the first row holds them', () => {
    const titled = parseCsvTable('Oedometer log;;\nSample;U4;\n\nIncrement;Stress (kPa);Time (min);Settlement (mm)\n1;25;0;0\n1;25;1;0.1\n1;25;2;0.15\n', LIMITS);
    expect(detectHeaderRow(firstSheetRows(titled))).toBe(4);
    expect(detectHeaderRow(firstSheetRows(parseCsvTable('increment,stress_kpa,elapsed_min,deformation_mm\n1,25,0,0\n1,25,1,0.1\n', LIMITS)))).toBe(1);
  });
});

describe('stressFromSheetName(name)', () => {
  it.each([
    ['100 kPa', { value: 100, unit: 'kPa' }],
    ['Step 3 – 12.5 kPa', { value: 12.5, unit: 'kPa' }],
    ['LS 4 - 0,5 kg/cm2', { value: 0.5, unit: 'kgfPerCm2' }],
    ['LS3 50kPa', { value: 50, unit: 'kPa' }],
    ['Stufe 7', { value: 7, unit: null }],
    ['Summary', null],
  ] as const)('%s → %j', (name, expected) => {
    expect(stressFromSheetName(name)).toEqual(expected);
  });
});
