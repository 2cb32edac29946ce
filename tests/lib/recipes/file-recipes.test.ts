import { describe, expect, it } from 'vitest';
import { roots } from '../../../src/lib/control';
import { readRecipeFiles } from '../../../src/lib/recipes/file-reader';
import { AREA_CODES } from '../../../src/lib/recipes/vocabulary';

const files = readRecipeFiles();
const bySlug = new Map(files.map((r) => [r.slug, r]));

describe('the file recipes as a library', () => {
  it('covers the loop patterns the team relies on', () => {
    const types = new Set(files.map((r) => r.data.loopType));
    for (const t of ['flow', 'level', 'temperature', 'pressure', 'speed', 'ph', 'position']) expect(types, t).toContain(t);
    const structures = new Set(files.map((r) => r.data.structure));
    expect(structures).toContain('cascade');
    expect(structures.has('ratio') || structures.has('feedforward')).toBe(true);
    expect(files.some((r) => r.data.chain), 'a recipe built from blocks').toBe(true);
    expect(files.filter((r) => r.data.status === 'retired').length).toBeGreaterThanOrEqual(2);
  });

  it('includes a process with a right-half-plane zero or pole (non-minimum-phase or open-loop unstable)', () => {
    const rhp = files.filter((r) => {
      const m = r.data.model;
      if (m.type !== 'tf') return false;
      return [...roots(m.num), ...roots(m.den)].some((z) => z.re > 1e-12);
    });
    expect(rhp.map((r) => r.slug)).toContain('boiler-drum-level-inverse-response');
  });

  it('links every retired recipe to a published successor', () => {
    for (const r of files.filter((x) => x.data.status === 'retired')) {
      const successor = r.data.supersededBy ? bySlug.get(r.data.supersededBy) : undefined;
      expect(successor?.data.status, `${r.slug} → ${r.data.supersededBy}`).toBe('published');
    }
  });

  it('gives every published recipe that changes a running loop its commissioning steps and a formula', () => {
    for (const r of files.filter((x) => x.data.status === 'published')) {
      expect(r.data.changesRunningLoop, r.slug).toBe(true);
      expect(r.data.commissioning.length, r.slug).toBeGreaterThanOrEqual(3);
      expect(r.body, r.slug).toMatch(/\$\$[\s\S]+?\$\$/);
      expect(r.data.claims.length, r.slug).toBeGreaterThanOrEqual(3);
    }
  });

  it('uses plant-area codes that the database seeds, and fictional e-mail addresses', () => {
    for (const r of files) {
      expect(AREA_CODES, r.slug).toContain(r.data.area);
      expect(r.data.owner.email, r.slug).toMatch(/@brindlewood\.example$/);
    }
  });
});
