import fs from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { getStepTest, previewStepTest, uploadStepTest } from '../../../../src/lib/fielddata/service/step-tests';
import { FieldDataProblem } from '../../../../src/lib/fielddata/problem';
import { stepTestFolder } from '../../../../src/lib/fielddata/storage';
import { seed as seedAreas } from '../../../../src/lib/db/seeds/01-plant-areas';
import { tempDatabase } from '../../../support/temp-db';
import { listCatalog } from '../../../support/recipe-catalog';
import { toCsv } from '../../../support/step-test-csv';

const enc = (s: string) => new TextEncoder().encode(s);
const actor = { email: 'ines.marlow@brindlewood.example', name: 'Ines Marlow', role: 'author' };
const CSV = toCsv({ model: { type: 'fopdt', k: 0.42, tau: 30, theta: 4 }, dt: 0.5, n: 100, stepAt: 5, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 3 }, { european: true });
let db: Awaited<ReturnType<typeof tempDatabase>>;
beforeEach(async () => {
  db = await tempDatabase();
  await seedAreas(db.knex);
});
afterEach(async () => db.cleanup());

describe('previewStepTest', () => {
  it('shows the format, the first 20 rows and a suggested mapping without storing anything', () => {
    const p = previewStepTest(enc(CSV));
    expect(p).toMatchObject({ dialect: { delimiter: ';', decimal: ',' }, columns: 3, rowCount: 100, issueCount: 0 });
    expect(p.rows).toHaveLength(20);
    expect(p.rows[0].line).toBe(2);
    expect(p.suggestedMapping).toEqual({ time: { column: 1, unit: 's' }, pv: { column: 2, unit: '' }, co: { column: 3, unit: '%' } });
    expect(fs.existsSync(stepTestFolder(db.file))).toBe(false);
  });
});

describe('uploadStepTest', () => {
  it('stores with the suggested mapping when none is given and reads the data back', async () => {
    const r = await uploadStepTest(db.knex, stepTestFolder(db.file), actor, { bytes: enc(CSV), fileName: 'x.csv', fields: { tag: 'tic-210', area: 'htst' } });
    expect(r).toMatchObject({ rowCount: 100, duration: 49.5, stepTest: { tag: 'TIC-210', uploadedBy: actor.email } });
    expect(r.stepTest).not.toHaveProperty('storedName');
    const back = await getStepTest(db.knex, stepTestFolder(db.file), r.stepTest.id, listCatalog([]));
    expect(back.plot.t).toHaveLength(100);
    expect(back.loopType).toBe('temperature');
  });

  it('refuses a bad file with the first issue as the message and all issues listed, storing nothing', async () => {
    const bad = CSV.replace(/\r\n10,000;/, '\r\n10,000;;;');
    const err = (await uploadStepTest(db.knex, stepTestFolder(db.file), actor, { bytes: enc(bad), fileName: 'x.csv', fields: { tag: 'TIC-210' } }).catch((e) => e)) as FieldDataProblem;
    expect(err.code).toBe('invalid_file');
    expect(err.message).toBe('Line 22: expected 3 cells, found 5.');
    expect(err.issues?.count).toBe(1);
    expect(await db.knex('step_tests').count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(fs.readdirSync(stepTestFolder(db.file))).toEqual([]);
  });

  it('refuses a bad tag, an unknown area and a mapping that is not JSON', async () => {
    const call = (fields: Record<string, unknown>) =>
      uploadStepTest(db.knex, stepTestFolder(db.file), actor, { bytes: enc(CSV), fileName: 'x.csv', fields }).catch((e: FieldDataProblem) => [e.field, e.message]);
    expect(await call({ tag: 'boiler 1' })).toEqual(['tag', 'Check tag: A loop tag is 2–5 letters, a hyphen and 2–5 digits, e.g. TIC-210 or FIC-101A.']);
    expect(await call({ tag: 'TIC-210', area: 'moon' })).toEqual(['area', 'Unknown plant area "moon"; use one of boiler, cip, glycol, htst, packaging, silos, wastewater.']);
    expect(await call({ tag: 'TIC-210', mapping: '{time' })).toEqual(['mapping', 'The mapping field is not valid JSON; send {"time":{"column":1,"unit":"s"},"pv":{...},"co":{...}|null}.']);
    expect(await call({ tag: 'TIC-210', mapping: '{"time":{"column":0,"unit":"s"},"pv":{"column":2,"unit":""}}' })).toEqual(['mapping.time.column', 'Check mapping.time.column: Columns are numbered from 1.']);
  });
});
