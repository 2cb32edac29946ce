import { describe, expect, it } from 'vitest';
import { loopsToCsv, readLoopsCsv } from '../../../src/lib/fielddata/loops-csv';
import type { Loop } from '../../../src/lib/schemas/loop';

const enc = (s: string) => new TextEncoder().encode(s);
const LOOP: Loop = {
  id: 1, tag: 'TIC-210', area: 'htst', description: 'Hot-water set, "booster" side', recipeSlug: 'htst-hot-water',
  tuning: { form: 'series', gain: 1.8, integral: 2.5, derivative: null, timeUnit: 'min', gainUnit: '%/%' },
  commissionedBy: 'Wren Okafor', commissionedAt: '2025-11-04', ownerEmail: 'wren.okafor@brindlewood.example',
  evidenceIds: [], createdAt: '', updatedAt: '',
};

describe('loopsToCsv', () => {
  it('writes a header and one quoted-where-needed row per loop, and neutralizes formula-looking text', () => {
    const csv = loopsToCsv([LOOP, { ...LOOP, tag: 'FIC-101', description: '=HYPERLINK("x")', tuning: null, recipeSlug: null }]);
    expect(csv.split('\r\n')).toEqual([
      'tag,area,description,recipe,form,gain,integral,derivative,time_unit,gain_unit,commissioned_by,commissioned_at,owner_email',
      'TIC-210,htst,"Hot-water set, ""booster"" side",htst-hot-water,series,1.8,2.5,,min,%/%,Wren Okafor,2025-11-04,wren.okafor@brindlewood.example',
      `FIC-101,htst,"'=HYPERLINK(""x"")",,,,,,,,Wren Okafor,2025-11-04,wren.okafor@brindlewood.example`,
      '',
    ]);
  });
});

describe('readLoopsCsv', () => {
  it('reads back what it wrote', () => {
    const r = readLoopsCsv(enc(loopsToCsv([LOOP, { ...LOOP, tag: 'FIC-101', description: '=SUM(A1)', tuning: null }])));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const { id: _id, evidenceIds: _e, createdAt: _c, updatedAt: _u, ...input } = LOOP;
    expect(r.loops[0]).toEqual({ line: 2, loop: input });
    expect(r.loops[1].loop.description).toBe('=SUM(A1)');
    expect(r.loops[1].loop.tuning).toBe(null);
  });

  it('accepts columns in any order, semicolons and decimal commas', () => {
    const r = readLoopsCsv(enc('owner_email;tag;area;form;gain;integral\nana@brindlewood.example;lic-301;silos;ideal;0,75;120\n'));
    expect(r.ok && r.loops[0].loop).toMatchObject({ tag: 'LIC-301', area: 'silos', tuning: { form: 'ideal', gain: 0.75, integral: 120, timeUnit: 's' } });
  });

  it('reports each bad row by line with an exact message and accepts none', () => {
    const text = [
      'tag,area,owner_email,commissioned_at,form,gain',
      'TIC-210,htst,a@brindlewood.example,2025-01-01,ideal,2',
      'TIC 210,htst,a@brindlewood.example,,,',
      'FIC-101,htst,not-an-email,,,',
      'FIC-102,htst,a@brindlewood.example,04/11/2025,,',
      'FIC-103,htst,a@brindlewood.example,,ideal,x',
      'TIC-210,cip,a@brindlewood.example,,,',
    ].join('\n');
    const r = readLoopsCsv(enc(text));
    expect(!r.ok && r.issues.map((i) => i.message)).toEqual([
      'Line 3, column 1 (tag): A loop tag is 2–5 letters, a hyphen and 2–5 digits, e.g. TIC-210 or FIC-101A.',
      'Line 4, column 3 (owner_email): The owner must be an e-mail address.',
      'Line 5, column 4 (commissioned_at): Use a date written YYYY-MM-DD.',
      'Line 6, column 6 (gain): "x" is not a number.',
      'Line 7: the tag TIC-210 is already on line 2.',
    ]);
  });

  it('refuses a file without the needed columns or with unknown ones', () => {
    const r = readLoopsCsv(enc('tag,area,colour\nTIC-210,htst,red\n'));
    expect(!r.ok && r.issues.map((i) => i.message)).toEqual([
      'Line 1: unknown column "colour"; the columns are tag, area, description, recipe, form, gain, integral, derivative, time_unit, gain_unit, commissioned_by, commissioned_at, owner_email.',
      'Line 1: the column "owner_email" is missing.',
    ]);
  });
});
