import { useState } from 'react';
import { ApiFailure } from './api';
import { Problem } from './FileStep';
import type { LoopInput } from '../../lib/schemas/loop';
import type { TuningSetting } from '../../lib/schemas/tuning-setting';

export interface LoopEditorProps {
  /** The loop being changed, or null for a new one. */
  loop: LoopInput | null;
  areas: { code: string; name: string }[];
  /** May delete (curator+). */
  canDelete: boolean;
}

const EMPTY: LoopInput = { tag: '', area: '', description: '', recipeSlug: null, tuning: null, commissionedBy: null, commissionedAt: null, ownerEmail: '' };
const NO_TUNING: TuningSetting = { form: 'ideal', gain: 1, integral: null, derivative: null, timeUnit: 's', gainUnit: '%/%' };

/** Register a loop or change one: tag, area, recipe, tuning as left (form and units), commissioning. */
export default function LoopEditor({ loop, areas, canDelete }: LoopEditorProps) {
  const [value, setValue] = useState<LoopInput>(loop ?? EMPTY);
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const set = (patch: Partial<LoopInput>) => setValue({ ...value, ...patch });
  const setTuning = (patch: Partial<TuningSetting>) => set({ tuning: { ...(value.tuning ?? NO_TUNING), ...patch } });

  async function save() {
    setFailure(null);
    const res = await fetch(loop ? `/api/v1/loops/${encodeURIComponent(loop.tag)}` : '/api/v1/loops', {
      method: loop ? 'PUT' : 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(value),
    });
    const body = await res.json().catch(() => null);
    if (!res.ok) return setFailure(new ApiFailure(body?.error?.message ?? `The server answered ${res.status}.`, res.status, body?.error?.field ?? null, []));
    location.href = `/loops/${body.tag}`;
  }

  async function remove() {
    if (!loop || !confirm(`Remove ${loop.tag} from the register?`)) return;
    const res = await fetch(`/api/v1/loops/${encodeURIComponent(loop.tag)}`, { method: 'DELETE' });
    if (res.ok) location.href = '/loops';
    else setFailure(new ApiFailure((await res.json().catch(() => null))?.error?.message ?? 'Could not remove it.', res.status, null, []));
  }

  const field = 'rounded border border-rule bg-paper px-2 py-1';
  const t = value.tuning;
  return (
    <form className="grid max-w-3xl gap-3 text-sm sm:grid-cols-2" onSubmit={(e) => { e.preventDefault(); void save(); }} data-testid="loop-editor">
      <label className="flex flex-col gap-1">Tag (ISA-5.1)<input className={`${field} font-mono`} value={value.tag} onChange={(e) => set({ tag: e.target.value })} placeholder="TIC-210" required /></label>
      <label className="flex flex-col gap-1">Area
        <select className={field} value={value.area} onChange={(e) => set({ area: e.target.value })} required>
          <option value="">choose…</option>
          {areas.map((a) => <option key={a.code} value={a.code}>{a.name}</option>)}
        </select>
      </label>
      <label className="flex flex-col gap-1 sm:col-span-2">Description<input className={field} value={value.description} onChange={(e) => set({ description: e.target.value })} /></label>
      <label className="flex flex-col gap-1">Recipe it follows (slug)<input className={`${field} font-mono`} value={value.recipeSlug ?? ''} onChange={(e) => set({ recipeSlug: e.target.value || null })} /></label>
      <label className="flex flex-col gap-1">Owner (e-mail)<input className={field} type="email" value={value.ownerEmail} onChange={(e) => set({ ownerEmail: e.target.value })} required /></label>
      <label className="flex flex-col gap-1">Commissioned by<input className={field} value={value.commissionedBy ?? ''} onChange={(e) => set({ commissionedBy: e.target.value || null })} /></label>
      <label className="flex flex-col gap-1">Commissioned on<input className={field} type="date" value={value.commissionedAt ?? ''} onChange={(e) => set({ commissionedAt: e.target.value || null })} /></label>
      <fieldset className="flex flex-wrap items-end gap-3 sm:col-span-2">
        <legend className="mb-1 text-xs uppercase tracking-widest text-copper">Tuning as left in the controller</legend>
        <label className="flex items-center gap-2"><input type="checkbox" checked={t !== null} onChange={(e) => set({ tuning: e.target.checked ? NO_TUNING : null })} /> recorded</label>
        {t && (
          <>
            <label className="flex flex-col gap-1">Form
              <select className={field} value={t.form} onChange={(e) => setTuning({ form: e.target.value as TuningSetting['form'] })}>
                <option value="ideal">ideal</option><option value="series">series</option><option value="parallel">parallel</option>
              </select>
            </label>
            <label className="flex flex-col gap-1">{t.form === 'parallel' ? 'Kp' : 'Kc'}<input className={`${field} w-24 font-mono`} type="number" step="any" value={t.gain} onChange={(e) => setTuning({ gain: Number(e.target.value) })} /></label>
            <label className="flex flex-col gap-1">{t.form === 'parallel' ? `Ki (1/${t.timeUnit})` : `Ti (${t.timeUnit})`}<input className={`${field} w-24 font-mono`} type="number" step="any" min="0" value={t.integral ?? ''} onChange={(e) => setTuning({ integral: e.target.value === '' ? null : Number(e.target.value) })} /></label>
            <label className="flex flex-col gap-1">{t.form === 'parallel' ? `Kd (${t.timeUnit})` : `Td (${t.timeUnit})`}<input className={`${field} w-24 font-mono`} type="number" step="any" min="0" value={t.derivative ?? ''} onChange={(e) => setTuning({ derivative: e.target.value === '' ? null : Number(e.target.value) })} /></label>
            <label className="flex flex-col gap-1">Time unit
              <select className={field} value={t.timeUnit} onChange={(e) => setTuning({ timeUnit: e.target.value as TuningSetting['timeUnit'] })}><option value="s">s</option><option value="min">min</option></select>
            </label>
            <label className="flex flex-col gap-1">Gain unit<input className={`${field} w-20`} value={t.gainUnit} onChange={(e) => setTuning({ gainUnit: e.target.value })} /></label>
          </>
        )}
      </fieldset>
      <p className="calc-caution sm:col-span-2 rounded border-l-4 border-caution bg-caution-soft p-2">
        The register records what is in the controller; it changes nothing in the plant. When you retune a
        running loop, test in manual first, keep interlocks and the safety system in service, and follow site procedures.
      </p>
      <div className="flex gap-3 sm:col-span-2">
        <button className="rounded border border-copper px-3 py-1 text-copper" type="submit">{loop ? 'Save changes' : 'Register the loop'}</button>
        {loop && canDelete && <button type="button" className="rounded border border-fails px-3 py-1 text-fails" onClick={remove}>Remove from the register</button>}
      </div>
      {failure && <div className="sm:col-span-2"><Problem failure={failure} /></div>}
    </form>
  );
}
