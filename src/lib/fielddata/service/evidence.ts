/**
 * Saving evidence: a step test, its chosen fit and the chosen tuning, attached to an existing
 * recipe or to a new draft started from it. One transaction: the fit is marked chosen, the
 * evidence stored and linked to the loops named; nothing is half written.
 */
import type { Knex } from 'knex';
import { findEvidence, insertEvidence, type EvidenceRecord } from '../../db/evidence';
import { chooseFit, findFit } from '../../db/model-fits';
import { findStepTest } from '../../db/step-tests';
import { linkEvidence } from '../../db/loops';
import { EvidenceRequestSchema } from '../../schemas/evidence';
import type { Actor } from '../actor';
import { fromZod, invalid, missing, FieldDataProblem } from '../problem';
import type { CatalogRecipe, RecipeCatalog } from '../recipe-catalog';
import { toPidController } from '../tuning-setting';
import { draftBody } from '../draft-body';

export async function saveEvidence(
  knex: Knex,
  actor: Actor,
  body: unknown,
  catalog: RecipeCatalog,
  now = new Date(),
): Promise<{ evidence: EvidenceRecord; recipe: CatalogRecipe; createdDraft: boolean }> {
  const parsed = EvidenceRequestSchema.safeParse(body);
  if (!parsed.success) throw fromZod(parsed.error);
  const req = parsed.data;
  const stepTest = await findStepTest(knex, req.stepTestId);
  if (!stepTest) throw invalid(`There is no step test ${req.stepTestId}.`, 'stepTestId');
  const fit = await findFit(knex, req.fitId);
  if (!fit || fit.stepTestId !== stepTest.id) throw invalid(`Fit ${req.fitId} does not belong to step test ${stepTest.id}.`, 'fitId');

  const loops = req.loopTags.length ? await knex('loops').whereIn('tag', req.loopTags).select('id', 'tag') : [];
  const unknownTag = req.loopTags.find((t) => !loops.some((l: { tag: string }) => l.tag === t));
  if (unknownTag) throw invalid(`The loop ${unknownTag} is not in the register; add it there first or leave it out.`, 'loopTags');

  let recipe: CatalogRecipe | null;
  let createdDraft = false;
  if (req.recipeSlug !== undefined) {
    recipe = await catalog.find(req.recipeSlug);
    if (!recipe) throw invalid(`There is no recipe "${req.recipeSlug}" that you can see.`, 'recipeSlug');
    if (recipe.status === 'retired') throw new FieldDataProblem(409, 'recipe_retired', `The recipe "${recipe.slug}" is retired; attach the evidence to the recipe that supersedes it.`, 'recipeSlug');
  } else {
    const body = draftBody({ tag: stepTest.tag, testedAt: stepTest.uploadedAt, by: actor.name, model: fit.model, fit: { rmse: fit.rmse, r2: fit.r2 }, tuning: req.tuning, note: req.note });
    recipe = await catalog.createDraft({ ...req.newDraft!, body, model: fit.model, controller: toPidController(req.tuning.setting) });
    if (!recipe) throw new FieldDataProblem(409, 'drafts_unavailable', 'New draft recipes cannot be started here yet; attach the evidence to an existing recipe.', 'newDraft');
    createdDraft = true;
  }

  const id = await knex.transaction(async (trx) => {
    await chooseFit(trx, fit);
    const evidenceId = await insertEvidence(trx, {
      recipeSlug: recipe.slug, stepTestId: stepTest.id, fitId: fit.id, tuning: req.tuning, note: req.note,
      createdBy: actor.email, createdAt: now.toISOString(),
    });
    await linkEvidence(trx, evidenceId, loops.map((l: { id: number }) => l.id));
    return evidenceId;
  });
  const evidence = await findEvidence(knex, id);
  if (!evidence) throw missing(`Evidence ${id} vanished while it was saved.`);
  return { evidence, recipe, createdDraft };
}
