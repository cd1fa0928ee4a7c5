import { runSettlementCheck, verticalStressAtDepth, type SoilLayer, type SoilProfile } from '@porestack/geo-core';
import { expect as baseExpect, test, type Locator, type Page } from '@playwright/test';
import type { CheckRevision } from '@porestack/types';
import ExcelJS from 'exceljs';
import { readFile } from 'node:fs/promises';
import { signIn } from './support/people';

// A designer's whole job on the seeded demo project, in the real API and Chromium: a
// characteristic set of the approved records, a ground model from a record and the set, a check
// of pasted and typed footings, its plots and plan, a footing sized by the tool, two revisions
// compared, and the workbook read back. The numbers on screen are checked against geo-core's
// own answer for the same inputs.
const unique = Date.now().toString(36);
// Every step waits on the server's engine and on plotly in the page; a shared machine can be slow.
const expect = baseExpect.configure({ timeout: 30_000 });

async function openProject(page: Page): Promise<string> {
  await signIn(page, 'designer@demo.porestack.test', 'porestack-demo');
  await page.waitForURL(/\/orgs\/[^/]+/);
  await page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Projects' }).click();
  await page.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
  await expect(page.getByRole('region', { name: 'Design' })).toBeVisible();
  return page.url();
}

async function fill(scope: Locator, label: string, value: string): Promise<void> {
  await scope.getByLabel(label, { exact: true }).fill(value);
}

/** Picks the option whose text contains `text` (selectOption matches labels exactly). */
async function choose(select: Locator, text: string): Promise<void> {
  const label = await select.locator('option', { hasText: text }).first().textContent();
  await select.selectOption({ label: label ?? text });
}

/** geo-core's profile for a stored ground model: σ′p at a sample's depth carried by OCR, as the ground model page says. */
function profileOf(content: CheckRevision['groundModel']['content']): SoilProfile {
  const bare: SoilProfile = {
    groundLevelM: content.groundLevelM,
    waterTableDepthM: content.waterTableDepthM,
    layers: content.layers.map((l) => ({ name: l.name, thicknessM: l.thicknessM, unitWeightKnPerM3: l.unitWeightKnPerM3, saturatedUnitWeightKnPerM3: l.saturatedUnitWeightKnPerM3 })),
  };
  return {
    ...bare,
    layers: content.layers.map((l): SoilLayer => {
      const p = l.parameters;
      const base = { name: l.name, thicknessM: l.thicknessM, unitWeightKnPerM3: l.unitWeightKnPerM3, saturatedUnitWeightKnPerM3: l.saturatedUnitWeightKnPerM3 };
      const elastic = l.elasticModulusKpa !== null && l.poissonRatio !== null ? { elasticModulusKpa: l.elasticModulusKpa, poissonRatio: l.poissonRatio } : {};
      if (!p) return { ...base, ...elastic };
      const ocr = p.ocr.value ?? (p.preconsolidationKpa.value !== null && p.preconsolidationDepthM !== null ? p.preconsolidationKpa.value / verticalStressAtDepth(bare, p.preconsolidationDepthM).effectiveStressKpa : null);
      return {
        ...base,
        ...elastic,
        e0: p.e0.value!,
        cc: p.cc.value!,
        ...(p.recompressionIndex.value !== null ? { cs: p.recompressionIndex.value } : {}),
        ...(ocr !== null ? { ocr } : {}),
        ...(p.cvM2PerYr.value !== null ? { cvM2PerYr: p.cvM2PerYr.value } : {}),
        ...(p.cAlpha.value !== null ? { cAlpha: p.cAlpha.value } : {}),
        drainageTop: l.drainageTop,
        drainageBottom: l.drainageBottom,
      };
    }),
  };
}

test('a designer builds a characteristic set and a ground model from approved records, runs a check of pasted footings, sizes one, compares revisions and exports the workbook', async ({ browser }) => {
  test.setTimeout(420_000);
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  const projectUrl = await openProject(page);

  // A characteristic set of the two approved clay records.
  await page.getByRole('link', { name: 'New characteristic set' }).click();
  const setForm = page.getByRole('form', { name: 'Characteristic set' });
  await fill(setForm, 'Stratum', `Grey clay ${unique}`);
  await setForm.getByRole('checkbox', { name: /Include BH01 U1/ }).check();
  await setForm.getByRole('checkbox', { name: /Include BH01 U2/ }).check();
  const statistics = setForm.getByRole('table', { name: 'Statistics of each parameter and the value adopted' });
  await expect(statistics.getByRole('row', { name: /^Cc 2/ })).toBeVisible({ timeout: 30_000 });
  for (const [label, value] of [
    ['e0', '1.0'],
    ['Cc', '0.45'],
    ['Cr', '0.05'],
    ['OCR', '1.5'],
    ['cv (m²/yr)', '1.5'],
  ] as const) {
    await setForm.getByLabel(`Adopted ${label}`, { exact: true }).fill(value);
  }
  await setForm.getByLabel('Note on Cc', { exact: true }).fill('upper of the two tests');
  await setForm.getByRole('button', { name: 'Save characteristic set' }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Grey clay ${unique}` })).toBeVisible();
  await expect(page.getByText('Characteristic set · revision 1 (current)')).toBeVisible();

  // A ground model: fill, upper clay from the approved record BH01 U1, lower clay from the set, gravel.
  await page.goto(projectUrl);
  await page.getByRole('link', { name: 'New ground model' }).click();
  const model = page.getByRole('form', { name: 'Ground model' });
  await fill(model, 'Ground model name', `Model ${unique}`);
  await fill(model, 'Water table depth (m)', '1.2');
  const layer1 = model.getByRole('group', { name: 'Layer 1' });
  await fill(layer1, 'Name', 'Fill');
  await fill(layer1, 'Thickness (m)', '1.5');
  await fill(layer1, 'γ above water (kN/m³)', '18');
  await fill(layer1, 'γ below water (kN/m³)', '19');
  const layer2 = model.getByRole('group', { name: 'Layer 2' });
  await fill(layer2, 'Name', 'Upper clay');
  await fill(layer2, 'Thickness (m)', '3');
  await fill(layer2, 'γ above water (kN/m³)', '17.2');
  await fill(layer2, 'γ below water (kN/m³)', '17.2');
  await fill(layer2, 'Borehole contains', 'BH01');
  await fill(layer2, 'Depth to (m)', '4');
  await choose(layer2.getByLabel('Approved soil record', { exact: true }), 'BH01 U1 at 3.23 m');
  await expect(layer2.getByLabel('Cc', { exact: true })).not.toHaveValue('', { timeout: 30_000 });
  await model.getByRole('button', { name: 'Add a compressible layer' }).click();
  const layer3 = model.getByRole('group', { name: 'Layer 3' });
  await fill(layer3, 'Name', 'Lower clay');
  await fill(layer3, 'Thickness (m)', '3');
  await fill(layer3, 'γ above water (kN/m³)', '17.8');
  await fill(layer3, 'γ below water (kN/m³)', '17.8');
  await layer3.getByRole('radio', { name: 'a characteristic set' }).check();
  await choose(layer3.getByLabel('Characteristic set', { exact: true }), `Grey clay ${unique}`);
  await model.getByRole('button', { name: 'Add a granular layer' }).click();
  const layer4 = model.getByRole('group', { name: 'Layer 4' });
  await fill(layer4, 'Name', 'Gravel');
  await fill(layer4, 'Thickness (m)', '6');
  await fill(layer4, 'γ above water (kN/m³)', '20');
  await fill(layer4, 'γ below water (kN/m³)', '21');
  await fill(layer4, 'E′ (kPa)', '60000');
  await fill(layer4, 'ν', '0.3');
  await expect(layer3.getByLabel('OCR', { exact: true })).toHaveValue('1.5', { timeout: 30_000 });
  await expect(page.getByRole('img', { name: /Ground model to scale/ }).first()).toBeVisible();
  await model.getByRole('button', { name: 'Save ground model' }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Model ${unique}` })).toBeVisible();
  await expect(page.getByText(/Ground model · revision 1 \(current\)/)).toBeVisible();

  // A check: pasted rows (one of them bad, named by row), one more typed in.
  await page.goto(projectUrl);
  await page.getByRole('button', { name: 'New settlement check' }).click();
  const create = page.getByRole('form', { name: 'New settlement check' });
  await fill(create, 'Check name', `Check ${unique}`);
  await choose(create.getByLabel('Ground model', { exact: true }), `Model ${unique}`);
  await create.getByRole('button', { name: 'Create check' }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Check ${unique}` })).toBeVisible();
  const pasted = [
    ['mark', 'shape', 'B (m)', 'L (m)', 'depth (m)', 'load kind', 'load', 'gross or net', 'x (m)', 'y (m)'],
    ['F1', 'square', '2', '', '1.2', 'load', '420', 'gross', '0', '0'],
    ['F2', 'square', '2', '', '1.2', 'load', '380', 'gross', '6', '0'],
    ['F3', 'rectangle', '2', '3', '1.2', 'pressure', '70', 'gross', '0', '6'],
    ['F9', 'square', '-2', '', '1.2', 'load', '300', 'gross', '12', '6'],
  ]
    .map((row) => row.join('\t'))
    .join('\n');
  await page.getByLabel('Paste rows from a spreadsheet').fill(pasted);
  await page.getByRole('button', { name: 'Replace the schedule with them' }).click();
  await expect(page.getByRole('list', { name: 'Rows that were not read' })).toContainText('Row 5 (F9), B (m): The width B must be greater than zero (m).');
  const schedule = page.getByRole('table', { name: 'Footing schedule' });
  await expect(schedule.getByLabel('Mark, row 3')).toHaveValue('F3');
  await page.getByRole('button', { name: 'Add a footing' }).click();
  await schedule.getByLabel('B (m), row 4').fill('1.2');
  await schedule.getByLabel('Depth (m), row 4').fill('0.9');
  await schedule.getByLabel('Load or pressure, row 4').fill('60');
  await schedule.getByLabel('x (m), row 4').fill('6');
  await schedule.getByLabel('y (m), row 4').fill('5');
  await page.getByRole('button', { name: 'Save and run the check' }).click();

  // Results: caution, plots, plan, tables.
  await expect(page.getByText(/Revision 1/).first()).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('engineering-caution')).toBeVisible();
  await expect(page.getByRole('img', { name: /Plan of 4 footings coloured by total settlement/ })).toBeVisible();
  await expect(page.getByTestId('plotly-chart').first().locator('.main-svg').first()).toBeAttached({ timeout: 60_000 });
  const shownF1 = Number(await page.getByTestId('total-F1').textContent());
  const apiBase = new URL(page.url()).pathname.replace(/^\/orgs\/([^/]+)\/projects\/([^/]+)\/settlement-checks\/([^/]+)$/, '/api/orgs/$1/projects/$2/settlement-checks/$3');
  const first = (await (await page.request.get(`${apiBase}/revisions/1/result`)).json()) as CheckRevision;
  const direct = runSettlementCheck({
    profile: profileOf(first.groundModel.content),
    footings: first.footingsAsRun.map((asRun) => {
      const row = first.footings.find((f) => f.id === asRun.id)!;
      return { id: row.id, xM: row.xM, yM: row.yM, widthM: row.widthM, lengthM: row.shape === 'rectangle' ? row.lengthM! : row.widthM, depthM: row.depthM, pressureKpa: asRun.netPressureKpa };
    }),
    options: { sublayerMaxThicknessM: 0.5, totalSettlementLimitM: 0.05, pairMaxDistanceM: 12 },
  });
  for (const footing of direct.footings) {
    await expect(page.getByTestId(`total-${footing.id}`)).toHaveText((footing.totalM * 1000).toFixed(1));
  }

  // Where a value came from: the record, its approver and the readings file's hash.
  await page.getByRole('region', { name: 'Layers used' }).getByRole('row', { name: /Upper clay/ }).getByRole('button').first().click();
  const trace = page.getByRole('dialog', { name: 'Where this value came from' });
  await expect(trace).toContainText('Approved by');
  await expect(trace).toContainText(/SHA-256 [0-9a-f]{64}/);
  await page.keyboard.press('Escape');

  // Size F1 for three quarters of its settlement and apply it: revision 2.
  await page.getByRole('navigation', { name: 'Parts of the check' }).getByRole('button', { name: 'Sizing' }).click();
  const sizing = page.getByRole('form', { name: 'Size a footing' });
  await sizing.getByLabel('Footing to size').selectOption('F1');
  await fill(sizing, 'Target total settlement (mm)', (shownF1 * 0.75).toFixed(1));
  await fill(sizing, 'Largest width to try (m)', '8');
  await sizing.getByRole('button', { name: 'Find the width' }).click();
  await expect(page.getByTestId('sizing-answer')).toContainText(/F1 needs B = \d\.\d\d m/, { timeout: 30_000 });
  await page.getByRole('button', { name: /Apply B = .* to the schedule and run/ }).click();
  await expect(page.locator('#revision-pick')).toHaveValue('2', { timeout: 60_000 });
  const sizedF1 = Number(await page.getByTestId('total-F1').textContent());
  expect(sizedF1).toBeLessThan(shownF1);

  // Compare the two revisions side by side.
  await page.getByRole('navigation', { name: 'Parts of the check' }).getByRole('button', { name: 'Revisions' }).click();
  await expect(page.getByRole('table', { name: 'Inputs that differ' })).toContainText('Footing F1');
  const before = page.getByRole('table', { name: 'Settlement of each footing before and after' }).getByRole('row', { name: /^F1 / });
  await expect(before).toContainText(shownF1.toFixed(1));
  await expect(before).toContainText(sizedF1.toFixed(1));

  // The workbook holds the numbers shown.
  await page.getByRole('navigation', { name: 'Parts of the check' }).getByRole('button', { name: 'Results' }).click();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export to XLSX' }).click()]);
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load((await readFile((await download.path())!)) as unknown as ArrayBuffer);
  const sheet = workbook.getWorksheet('Footings')!;
  const headings = (sheet.getRow(3).values as unknown[]).map(String);
  const totalColumn = headings.indexOf('Total (mm)');
  for (const id of ['F1', 'F2', 'F3', 'F4']) {
    const row = sheet.getRows(4, sheet.rowCount - 3)!.find((r) => r.getCell(1).value === id)!;
    await expect(page.getByTestId(`total-${id}`)).toHaveText((row.getCell(totalColumn).value as number).toFixed(1));
  }
  expect(String(sheet.getRow(1).getCell(1).value)).toMatch(/qualified geotechnical engineer/);
  await context.close();
});
