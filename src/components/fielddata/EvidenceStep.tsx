import { useState } from 'react';
import { ApiFailure, postJson } from './api';
import { Problem } from './FileStep';
import type { TunedChoice } from './TuningStep';
import type { RecipeMatch, RecipeOption } from './types';

export interface EvidenceStepProps {
  stepTestId: number;
  fitId: number;
  tuning: TunedChoice;
  recipes: RecipeOption[];
  matches: RecipeMatch[];
  loopTypes: readonly string[];
  loopType: string;
  tag: string;
}

type Saved = { evidence: { id: number }; recipe: { slug: string; title: string; url: string }; createdDraft: boolean };

/** Saves the test, the chosen fit and tuning as evidence: for a recipe, or as a new draft. */
export default function EvidenceStep(props: EvidenceStepProps) {
  const { stepTestId, fitId, tuning, recipes, matches, loopTypes } = props;
  const first = matches[0]?.slug ?? recipes[0]?.slug ?? '';
  const [target, setTarget] = useState<'recipe' | 'draft'>(recipes.length ? 'recipe' : 'draft');
  const [slug, setSlug] = useState(first);
  const [title, setTitle] = useState(`${props.tag} `);
  const [summary, setSummary] = useState('');
  const [loopType, setLoopType] = useState(props.loopType);
  const [note, setNote] = useState('');
  const [loopTags, setLoopTags] = useState('');
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const [saved, setSaved] = useState<Saved | null>(null);

  const ordered = [...recipes].sort((a, b) => rank(a.slug) - rank(b.slug) || a.title.localeCompare(b.title));
  function rank(s: string) {
    const i = matches.findIndex((m) => m.slug === s);
    return i < 0 ? 1000 : i;
  }

  async function save() {
    setBusy(true);
    setFailure(null);
    try {
      const tags = loopTags.split(/[\s,;]+/).filter(Boolean);
      const body = {
        stepTestId, fitId, tuning, note, loopTags: tags,
        ...(target === 'recipe' ? { recipeSlug: slug } : { newDraft: { title, summary, loopType } }),
      };
      setSaved(await postJson<Saved>('/api/v1/evidence', body));
    } catch (e) {
      setFailure(e as ApiFailure);
    } finally {
      setBusy(false);
    }
  }

  const field = 'rounded border border-rule bg-paper px-2 py-1';
  return (
    <section className="calc" aria-labelledby="fd-evidence">
      <div className="calc-head"><h2 id="fd-evidence" className="calc-title">4 · Save as evidence</h2></div>
      <div className="flex flex-col gap-3 text-sm">
        <fieldset className="flex flex-wrap gap-4">
          <legend className="sr-only">Where the evidence goes</legend>
          <label><input type="radio" checked={target === 'recipe'} onChange={() => setTarget('recipe')} disabled={!recipes.length} /> for an existing recipe</label>
          <label><input type="radio" checked={target === 'draft'} onChange={() => setTarget('draft')} data-testid="fd-target-draft" /> as the start of a new draft recipe</label>
        </fieldset>
        {target === 'recipe' ? (
          <label className="flex flex-col gap-1">Recipe
            <select className={field} value={slug} onChange={(e) => setSlug(e.target.value)} data-testid="fd-recipe">
              {ordered.map((r) => <option key={r.slug} value={r.slug}>{r.title}{rank(r.slug) < 1000 ? ' (close match)' : ''}</option>)}
            </select>
          </label>
        ) : (
          <div className="grid gap-2 sm:grid-cols-2">
            <label className="flex flex-col gap-1">Title<input className={field} value={title} onChange={(e) => setTitle(e.target.value)} data-testid="fd-draft-title" /></label>
            <label className="flex flex-col gap-1">Loop type
              <select className={field} value={loopType} onChange={(e) => setLoopType(e.target.value)}>{loopTypes.map((t) => <option key={t}>{t}</option>)}</select>
            </label>
            <label className="flex flex-col gap-1 sm:col-span-2">Summary<input className={field} value={summary} onChange={(e) => setSummary(e.target.value)} data-testid="fd-draft-summary" /></label>
          </div>
        )}
        <label className="flex flex-col gap-1">Note for the next reader<textarea className={field} rows={2} value={note} onChange={(e) => setNote(e.target.value)} data-testid="fd-note" /></label>
        <label className="flex flex-col gap-1">Registered loops this backs (tags, optional)<input className={field} value={loopTags} onChange={(e) => setLoopTags(e.target.value)} placeholder="TIC-210, TIC-211" /></label>
        <div><button type="button" className="calc-button" onClick={save} disabled={busy} data-testid="fd-save">Save evidence</button></div>
        {failure && <Problem failure={failure} />}
        {saved && (
          <p className="calc-status" role="status" data-testid="fd-saved">
            Saved as evidence {saved.evidence.id} {saved.createdDraft ? 'on the new draft' : 'for'}{' '}
            <a href={saved.recipe.url}>{saved.recipe.title}</a>.
          </p>
        )}
      </div>
    </section>
  );
}
