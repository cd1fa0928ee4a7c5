import type { FootingImportResult, GroundModelCreate, GroundModelDetail, SettlementCheckDetail } from '@porestack/types';
import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { createCheck, createGroundModel, designWorld, type DesignWorld } from '../../../testing/design-fixtures.js';

const app = createApp();

const MODEL: GroundModelCreate = {
  name: 'Ten metres',
  waterTableDepthM: 1,
  layers: [
    { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 },
    { name: 'clay', kind: 'compressible', thicknessM: 9, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'hand' }, parameters: { e0: 1.1, cc: 0.4 } },
  ],
};
const F1 = { id: 'F1', shape: 'square' as const, widthM: 2, depthM: 1, load: 600, xM: 0, yM: 0 };

async function count(table: 'ground_models' | 'settlement_checks' | 'settlement_check_revisions', projectId: string): Promise<number> {
  const column = table === 'settlement_check_revisions' ? 'c.project_id' : 'project_id';
  const from = table === 'settlement_check_revisions' ? 'settlement_check_revisions r JOIN settlement_checks c ON c.id = r.check_id' : table;
  const [row] = (await dataSource.query(`SELECT count(*)::int AS n FROM ${from} WHERE ${column} = $1`, [projectId])) as Array<{ n: number }>;
  return row!.n;
}

describe('bad input to the design work: a message naming the field or row, and nothing saved', () => {
  let world: DesignWorld;
  let model: GroundModelDetail;
  let check: SettlementCheckDetail;

  beforeAll(async () => {
    world = await designWorld(app, 'bad-input');
    model = await createGroundModel(world, MODEL);
    check = await createCheck(world, { name: 'Draft', groundModelId: model.id, footings: [F1] });
  });

  it('when a footing has a zero width or a negative load, then its row, mark and column are named and the draft is unchanged', async () => {
    const res = await world.designer.patch(`${world.base}/settlement-checks/${check.id}`, {
      footings: [F1, { ...F1, id: 'F2', widthM: 0, xM: 5 }, { ...F1, id: 'F3', load: -50, xM: 10 }],
    });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'footings.1.widthM', message: 'Row 2 (F2), B (m): The width B must be greater than zero (m).' },
      { path: 'footings.2.load', message: 'Row 3 (F3), load (kN) or pressure (kPa): The load or bearing pressure must be greater than zero (kN or kPa).' },
    ]);
    const after = (await world.designer.get(`${world.base}/settlement-checks/${check.id}`).expect(200)).body as SettlementCheckDetail;
    expect(after.footings.map((f) => f.id)).toEqual(['F1']);
  });

  it('when a footing is founded below the ground model, then its row is named and nothing is saved', async () => {
    const res = await world.designer.patch(`${world.base}/settlement-checks/${check.id}`, { footings: [F1, { ...F1, id: 'F2', depthM: 12, xM: 5 }] });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'footings.1.depthM', message: 'Row 2 (F2): it is founded at 12 m, at or below the bottom of the ground model (10 m). Extend the ground model downwards or correct the depth.' },
    ]);
    expect(((await world.designer.get(`${world.base}/settlement-checks/${check.id}`).expect(200)).body as SettlementCheckDetail).footings).toHaveLength(1);
  });

  it('when two footings overlap on plan, then a warning names both rows and asks for confirmation; confirmed, the draft is saved', async () => {
    const overlapping = [F1, { ...F1, id: 'F2', xM: 1.5 }];
    const res = await world.designer.patch(`${world.base}/settlement-checks/${check.id}`, { footings: overlapping });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('confirmation_needed');
    expect(res.body.issues).toEqual([{ path: 'footings.1', message: 'Rows 1 (F1) and 2 (F2) overlap on plan. Check their x, y and sizes.' }]);
    expect(((await world.designer.get(`${world.base}/settlement-checks/${check.id}`).expect(200)).body as SettlementCheckDetail).footings).toHaveLength(1);
    await world.designer.patch(`${world.base}/settlement-checks/${check.id}`, { footings: overlapping, acceptWarnings: true }).expect(200);
  });

  it('when the water table is below the profile, then the field is named and no ground model is saved', async () => {
    const before = await count('ground_models', world.projectId);
    const res = await world.designer.post(`${world.base}/ground-models`, { ...MODEL, waterTableDepthM: 14 });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'waterTableDepthM', message: 'The water table (14 m) is below the bottom of the profile (10 m). Add the layer it lies in, or correct its depth.' },
    ]);
    expect(await count('ground_models', world.projectId)).toBe(before);
  });

  it('when a compressible layer has no parameters, then the layer is named and no ground model is saved', async () => {
    const before = await count('ground_models', world.projectId);
    const res = await world.designer.post(`${world.base}/ground-models`, { ...MODEL, layers: [MODEL.layers[0]!, { ...MODEL.layers[1]!, parameters: null }] });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      {
        path: 'layers.1.parameters',
        message: 'Layer 2 (clay) is compressible but has no e0 and Cc. Pick an approved soil record or a characteristic set for it, or enter the values by hand.',
      },
    ]);
    expect(await count('ground_models', world.projectId)).toBe(before);
  });

  it('when a unit weight is implausible, then a warning names the layer and field; saved only once confirmed', async () => {
    const before = await count('ground_models', world.projectId);
    const odd = { ...MODEL, layers: [{ ...MODEL.layers[0]!, saturatedUnitWeightKnPerM3: 190 }, MODEL.layers[1]!] };
    const res = await world.designer.post(`${world.base}/ground-models`, odd);
    expect(res.status).toBe(409);
    expect(res.body.issues).toEqual([
      { path: 'layers.0.saturatedUnitWeightKnPerM3', message: 'Layer 1 (fill): a unit weight of 190 kN/m³ below the water table is unusual for soil (most lie between 14 and 23 kN/m³). Check the value.' },
    ]);
    expect(await count('ground_models', world.projectId)).toBe(before);
    await world.designer.post(`${world.base}/ground-models`, { ...odd, acceptWarnings: true }).expect(201);
    expect(await count('ground_models', world.projectId)).toBe(before + 1);
  });

  it('when a check with no footings is run, then the run is refused by name and no revision is stored', async () => {
    const empty = await createCheck(world, { name: 'Empty', groundModelId: model.id });
    const res = await world.designer.post(`${world.base}/settlement-checks/${empty.id}/runs`, {});
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ path: 'footings', message: 'The schedule has no footings. Add at least one row (or paste or import the schedule) before running the check.' }]);
    expect(await count('settlement_check_revisions', world.projectId)).toBe(0);
  });

  it('when a pasted schedule has bad rows, then each is listed with its row and column and the good rows come back', async () => {
    const text = ['mark\tshape\tB (m)\tL (m)\tdepth (m)\tload kind\tload (kN) or pressure (kPa)\tgross or net\tx (m)\ty (m)', 'P1\tsquare\t2\t\t1\tload\t800\tnet\t0\t0', 'P2\tsquare\t-1\t\t1\tload\t800\tnet\t6\t0', 'P3\tpentagon\t2\t\t1\tload\t800\tnet\t12\t0', 'P1\tsquare\t2\t\t1\tload\t800\tnet\t18\t0'].join('\n');
    const result = (await world.designer.post(`${world.base}/settlement-checks/footings/paste`, { text }).expect(200)).body as FootingImportResult;
    expect(result.rows.map((r) => r.id)).toEqual(['P1']);
    expect(result.issues).toEqual([
      { row: 3, column: 'B (m)', message: 'Row 3 (P2), B (m): The width B must be greater than zero (m).' },
      { row: 4, column: 'shape', message: 'Row 4 (P3), shape: The shape must be rectangle, square, circle or strip.' },
      { row: 5, column: 'mark', message: 'Row 5 (P1): the mark P1 is already used in row 2. Give each footing its own mark.' },
    ]);
  });

  it('when an XLSX schedule is imported, then its rows are read by their headings, in any order', async () => {
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('schedule');
    sheet.addRow(['x', 'y', 'Mark', 'B', 'L', 'Df', 'Q', 'shape']);
    sheet.addRow([0, 0, 'C1', 2, 3, 1.2, 950, 'rectangle']);
    sheet.addRow([7, 0, 'C2', 'two', 3, 1.2, 950, 'rectangle']);
    const bytes = Buffer.from(await workbook.xlsx.writeBuffer());
    const res = await world.designer.agent.post(`${world.base}/settlement-checks/footings/import`).set('x-csrf-token', world.designer.csrfToken).attach('file', bytes, 'schedule.xlsx');
    expect(res.status).toBe(200);
    const result = res.body as FootingImportResult;
    expect(result.rows).toEqual([{ id: 'C1', shape: 'rectangle', widthM: 2, lengthM: 3, depthM: 1.2, loadKind: 'load', load: 950, loadBasis: 'net', xM: 0, yM: 0 }]);
    expect(result.issues).toEqual([{ row: 3, column: 'B', message: 'Row 3 (C2), B: Enter the width B as a number in m.' }]);
  });

  it('when a file that is not a schedule is imported, then it is refused with a message', async () => {
    const res = await world.designer.agent.post(`${world.base}/settlement-checks/footings/import`).set('x-csrf-token', world.designer.csrfToken).attach('file', Buffer.from([0, 1, 2, 3, 0]), 'schedule.csv');
    expect(res.status).toBe(415);
    expect(res.body.message).toMatch(/neither CSV text nor an XLSX workbook/);
  });
});
