import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { loadSeries, storeStepTest, type StepTestDetails } from '../../../src/lib/fielddata/upload';
import { stepTestFolder } from '../../../src/lib/fielddata/storage';
import { seed as seedAreas } from '../../../src/lib/db/seeds/01-plant-areas';
import { tempDatabase } from '../../support/temp-db';

const enc = (s: string) => new TextEncoder().encode(s);
const GOOD = `t;pv;co\n${Array.from({ length: 20 }, (_, i) => `${i};${(50 + (i > 4 ? 1 - Math.exp(-(i - 5) / 3) : 0)).toFixed(3).replace('.', ',')};${i < 5 ? 40 : 45}`).join('\n')}\n`;
const DETAILS: StepTestDetails = {
  tag: 'TIC-210', area: 'htst', note: 'Hot-water set step',
  mapping: { time: { column: 1, unit: 's' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } },
};

let db: Awaited<ReturnType<typeof tempDatabase>>;
let folder: string;
beforeEach(async () => {
  db = await tempDatabase();
  await seedAreas(db.knex);
  folder = stepTestFolder(db.file);
});
afterEach(async () => db.cleanup());

const filesIn = (dir: string) => (fs.existsSync(dir) ? fs.readdirSync(dir) : []);

describe('storeStepTest', () => {
  it('stores the file under a generated name and one row, and reads the series back', async () => {
    const r = await storeStepTest(db.knex, folder, { bytes: enc(GOOD), originalName: '../../etc/passwd', details: DETAILS, uploadedBy: 'ines@brindlewood.example' });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(filesIn(folder)).toEqual([r.stepTest.storedName]);
    expect(r.stepTest.storedName).toMatch(/^[0-9a-f-]{36}\.csv$/);
    expect(r.stepTest.originalName).toBe('passwd');
    expect(r.stepTest.rowCount).toBe(20);
    expect(r.stepTest.dialect).toEqual({ delimiter: ';', decimal: ',' });
    expect(loadSeries(folder, r.stepTest).co?.[5]).toBe(45);
    expect(await db.knex('step_tests').count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('leaves no file and no row behind when the file is rejected', async () => {
    const bad = GOOD.replace('\n7;', '\n7;x;');
    const r = await storeStepTest(db.knex, folder, { bytes: enc(bad), originalName: 'test.csv', details: DETAILS, uploadedBy: 'ines@brindlewood.example' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues[0].message).toBe('Line 9: expected 3 cells, found 4.');
    expect(filesIn(folder)).toEqual([]);
    expect(await db.knex('step_tests').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('leaves no file and no row behind when the database refuses the row', async () => {
    const details = { ...DETAILS, area: 'no-such-area' };
    await expect(
      storeStepTest(db.knex, folder, { bytes: enc(GOOD), originalName: 'test.csv', details, uploadedBy: 'ines@brindlewood.example' }),
    ).rejects.toThrow(/FOREIGN KEY/);
    expect(filesIn(folder)).toEqual([]);
    expect(await db.knex('step_tests').count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(path.dirname(folder)).toBe(path.dirname(db.file));
  });
});
