import { describe, expect, it } from 'vitest';
import { ApiRecipeSchema } from '../../../src/lib/recipes/api-recipe-schema';
import { toApiRecipe } from '../../../src/lib/recipes/api-recipe';
import { readRecipeFiles } from '../../../src/lib/recipes/file-reader';

const files = readRecipeFiles();
const noRating = { average: null, count: 0 };

describe('ApiRecipeSchema', () => {
  it.each(files.map((r) => [r.slug, r]))('accepts the read routes\' answer for %s', (_slug, record) => {
    const parsed = ApiRecipeSchema.safeParse(toApiRecipe(record, noRating));
    expect(parsed.error?.issues ?? []).toEqual([]);
  });

  it('holds retiredReason and supersededBy on retired recipes only, as toApiRecipe gives them', () => {
    for (const r of files) {
      const answer = toApiRecipe(r, noRating);
      expect('retiredReason' in answer, r.slug).toBe(r.data.status === 'retired');
    }
  });

  it('refuses an answer missing a contract key or with a status outside the vocabulary', () => {
    const answer = toApiRecipe(files[0]!, noRating);
    const { ownerEmail: _dropped, ...withoutOwner } = answer;
    expect(ApiRecipeSchema.safeParse(withoutOwner).success).toBe(false);
    expect(ApiRecipeSchema.safeParse({ ...answer, status: 'archived' }).success).toBe(false);
  });
});
