import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createLoop, exportLoops, getLoop, importLoops, queryLoops, removeLoop, replaceLoop } from '../../../../src/lib/fielddata/service/loops';
import { FieldDataProblem } from '../../../../src/lib/fielddata/problem';
import { seed as seedAreas } from '../../../../src/lib/db/seeds/01-plant-areas';
import { tempDatabase } from '../../../support/temp-db';
import { listCatalog } from '../../../support/recipe-catalog';

const enc = (s: string) => new TextEncoder().encode(s);
let db: Awaited<ReturnType<typeof tempDatabase>>;
const catalog = listCatalog([{ slug: 'htst-hot-water', title: 'HTST hot water', loopType: 'temperature', status: 'published', url: '/recipes/htst-hot-water', model: null }]);
const base = { area: 'htst', ownerEmail: 'wren@brindlewood.example' };

beforeEach(async () => {
  db = await tempDatabase();
  await seedAreas(db.knex);
});
afterEach(async () => db.cleanup());

const problem = (p: Promise<unknown>) => p.then(() => null, (e: FieldDataProblem) => ({ status: e.status, message: e.message, field: e.field }));

describe('loop register', () => {
  it('creates, filters by area, recipe and age of tuning, replaces and deletes', async () => {
    await createLoop(db.knex, { ...base, tag: 'TIC-210', recipeSlug: 'htst-hot-water', commissionedAt: '2021-05-01' }, catalog);
    await createLoop(db.knex, { ...base, tag: 'TIC-211', commissionedAt: '2025-09-10' }, catalog);
    await createLoop(db.knex, { ...base, tag: 'LIC-301', area: 'silos' }, catalog);
    expect((await queryLoops(db.knex, { area: 'htst' })).map((l) => l.tag)).toEqual(['TIC-210', 'TIC-211']);
    expect((await queryLoops(db.knex, { recipe: 'htst-hot-water' })).map((l) => l.tag)).toEqual(['TIC-210']);
    expect((await queryLoops(db.knex, { tunedBefore: '2023-01-01' })).map((l) => l.tag)).toEqual(['TIC-210']);
    expect((await queryLoops(db.knex, { tunedSince: '2023-01-01' })).map((l) => l.tag)).toEqual(['TIC-211']);
    expect((await queryLoops(db.knex, { untuned: 'true' })).map((l) => l.tag)).toEqual(['LIC-301']);
    const changed = await replaceLoop(db.knex, 'tic-211', { ...base, tag: 'TIC-212', description: 'Renumbered' }, catalog);
    expect(changed).toMatchObject({ tag: 'TIC-212', description: 'Renumbered', commissionedAt: null });
    await removeLoop(db.knex, 'TIC-212');
    expect(await problem(getLoop(db.knex, 'TIC-212'))).toEqual({ status: 404, message: 'There is no loop TIC-212 in the register.', field: undefined });
  });

  it('refuses a duplicate tag, an unknown area or recipe, and a bad date, with the field named', async () => {
    await createLoop(db.knex, { ...base, tag: 'TIC-210' }, catalog);
    expect(await problem(createLoop(db.knex, { ...base, tag: 'TIC-210' }, catalog))).toEqual({ status: 409, message: 'The loop TIC-210 is already in the register; change it there.', field: 'tag' });
    expect(await problem(createLoop(db.knex, { ...base, tag: 'TIC-220', area: 'moon' }, catalog))).toEqual({ status: 400, message: 'Unknown plant area "moon"; use one of boiler, cip, glycol, htst, packaging, silos, wastewater.', field: 'area' });
    expect(await problem(createLoop(db.knex, { ...base, tag: 'TIC-220', recipeSlug: 'nope' }, catalog))).toEqual({ status: 400, message: 'There is no recipe "nope"; leave recipeSlug empty or name an existing recipe.', field: 'recipeSlug' });
    expect(await problem(createLoop(db.knex, { ...base, tag: 'TIC-220', commissionedAt: '2025-13-01' }, catalog))).toEqual({ status: 400, message: 'Check commissionedAt: Use a date written YYYY-MM-DD.', field: 'commissionedAt' });
    expect(await problem(queryLoops(db.knex, { tunedBefore: 'last year' }))).toEqual({ status: 400, message: 'Check tunedBefore: Use a date written YYYY-MM-DD.', field: 'tunedBefore' });
  });

  it('imports all rows or none, and exports what it imported', async () => {
    await createLoop(db.knex, { ...base, tag: 'TIC-210', description: 'old' }, catalog);
    const good = 'tag,area,description,owner_email,form,gain,integral,time_unit\nTIC-210,htst,Hot water,wren@brindlewood.example,series,1.8,2.5,min\nFIC-101,silos,Reception flow,ana@brindlewood.example,,,,\n';
    expect(await importLoops(db.knex, enc(good), catalog)).toEqual({ created: ['FIC-101'], updated: ['TIC-210'] });
    const csv = await exportLoops(db.knex, {});
    expect(csv.split('\r\n')[1]).toBe('FIC-101,silos,Reception flow,,,,,,,,,,ana@brindlewood.example');
    expect(csv.split('\r\n')[2]).toBe('TIC-210,htst,Hot water,,series,1.8,2.5,,min,%/%,,,wren@brindlewood.example');
    const bad = 'tag,area,owner_email\nTIC-230,htst,a@brindlewood.example\nTIC-231,moon,a@brindlewood.example\n';
    expect(await problem(importLoops(db.knex, enc(bad), catalog))).toMatchObject({ status: 400, message: 'Line 3: unknown plant area "moon"; use one of boiler, cip, glycol, htst, packaging, silos, wastewater.' });
    expect((await queryLoops(db.knex, {})).map((l) => l.tag)).toEqual(['FIC-101', 'TIC-210']);
  });
});
