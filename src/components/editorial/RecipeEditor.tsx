import './editorial.css';
import { useEffect, useRef, useState } from 'react';
import { callApi, type ApiError } from './api';
import ClaimFields from './ClaimFields';
import ControllerFields, { type ControllerValue } from './ControllerFields';
import { claimsPayload, sensorPayload, tuningPayload, type ClaimRow, type SensorRow, type TuningRow } from './loop-fields';
import SensorFields from './SensorFields';
import TuningFields from './TuningFields';
import ModelFields, { type ModelValue } from './ModelFields';
import Preview from './Preview';
import { EMPTY_LOOP_FIELDS, fieldsFromRecipe, type RecipeForForm } from './editor-fields';

/** The frontmatter fields the editor's form holds, and the body. */
export interface EditorFields {
  title: string;
  summary: string;
  loopType: string;
  area: string;
  loopTags: string;
  /** Unit of the measurement, e.g. °C. */
  pvUnit: string;
  /** Unit of the controller output, e.g. % valve. */
  mvUnit: string;
  tags: string;
  cautions: string;
  model: ModelValue | null;
  controller: ControllerValue | null;
  /** Where the model's numbers came from. */
  modelSource: string;
  /** Measurement path H(s), as typed; null = ideal sensor. */
  sensor: SensorRow | null;
  tuningRule: TuningRow;
  /** Performance claims, one row each. */
  claims: ClaimRow[];
  body: string;
}

export interface RecipeEditorProps {
  /** Absent for a new recipe. */
  slug?: string;
  revision?: number;
  status?: string;
  /** Whether the signed-in person may submit it (its owner). */
  canSubmit?: boolean;
  loopTypes: string[];
  /** The plant's process areas (code and name). */
  areas: { code: string; name: string }[];
  initial: EditorFields;
}

interface ConflictState {
  mine: EditorFields;
  theirs: RecipeForForm & { revision: number; revisionAuthorEmail?: string; revisionMessage?: string };
}

const list = (s: string) => s.split(',').map((x) => x.trim()).filter(Boolean);

/** The request body; an update sends null for an emptied sensor, tuning rule or model source so the saved one is removed. */
function payload(f: EditorFields, update: boolean) {
  const sensor = sensorPayload(f.sensor);
  const tuningRule = tuningPayload(f.tuningRule);
  const cleared = update ? { sensor: null, tuningRule: null, modelSource: null } : {};
  return {
    ...cleared,
    title: f.title,
    summary: f.summary,
    loopType: f.loopType,
    body: f.body,
    ...(f.area.trim() ? { area: f.area.trim() } : {}),
    ...(list(f.loopTags).length ? { loopTags: list(f.loopTags) } : {}),
    ...(f.pvUnit.trim() && f.mvUnit.trim() ? { units: { pv: f.pvUnit.trim(), mv: f.mvUnit.trim() } } : {}),
    tags: list(f.tags),
    cautions: f.cautions.split('\n').map((x) => x.trim()).filter(Boolean),
    ...(f.model ? { model: f.model } : {}),
    ...(f.controller ? { controller: f.controller } : {}),
    ...(f.modelSource.trim() ? { modelSource: f.modelSource.trim() } : {}),
    ...(sensor ? { sensor } : {}),
    ...(tuningRule ? { tuningRule } : {}),
    claims: claimsPayload(f.claims),
  };
}

/**
 * Writing a recipe: the frontmatter as a form, the MDX body, a live preview beside it, a
 * save with a short message, and submit for review. A failed save keeps every character and
 * says why; a 409 shows both versions; unsaved text is also kept in this browser.
 */
export default function RecipeEditor(props: RecipeEditorProps) {
  const backupKey = `loopwright-unsaved:${props.slug ?? 'new'}`;
  const [fields, setFields] = useState<EditorFields>({ ...EMPTY_LOOP_FIELDS, ...props.initial });
  const [revision, setRevision] = useState(props.revision ?? 0);
  const [status, setStatus] = useState(props.status ?? 'draft');
  const [message, setMessage] = useState('');
  const [busy, setBusy] = useState<null | 'save' | 'submit'>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [conflict, setConflict] = useState<ConflictState | null>(null);
  const [restorable, setRestorable] = useState<EditorFields | null>(null);
  const [dirty, setDirty] = useState(false);
  const bodyRef = useRef<HTMLTextAreaElement>(null);
  const [ready, setReady] = useState(false);

  useEffect(() => {
    setReady(true);
    try {
      const saved = localStorage.getItem(backupKey);
      if (saved && saved !== JSON.stringify(props.initial)) setRestorable({ ...EMPTY_LOOP_FIELDS, ...props.initial, ...JSON.parse(saved) });
    } catch {
      // Private mode or a full store: the backup is a convenience only.
    }
  }, []);

  const update = (patch: Partial<EditorFields>) => {
    setFields((f) => {
      const next = { ...f, ...patch };
      try {
        localStorage.setItem(backupKey, JSON.stringify(next));
      } catch {
        // ignore
      }
      return next;
    });
    setDirty(true);
  };

  async function save(base = revision, current = fields) {
    setBusy('save');
    setError(null);
    setNotice(null);
    const res = props.slug
      ? await callApi<{ revision: number; status: string; slug: string }>('PUT', `/api/v1/recipes/${props.slug}`, { baseRevision: base, message: message || undefined, ...payload(current, true) })
      : await callApi<{ revision: number; status: string; slug: string }>('POST', '/api/v1/recipes', { message: message || undefined, ...payload(current, false) });
    setBusy(null);
    if (res.ok) {
      localStorage.removeItem(backupKey);
      setDirty(false);
      setConflict(null);
      setMessage('');
      if (!props.slug) {
        window.location.assign(`/recipes/${res.data.slug}/edit?created=1`);
        return;
      }
      setRevision(res.data.revision);
      setStatus(res.data.status);
      setNotice(`Saved as revision ${res.data.revision}.`);
      return;
    }
    if (res.error.code === 'conflict' && res.body.current) {
      setConflict({ mine: current, theirs: res.body.current as ConflictState['theirs'] });
    }
    setError(res.error);
  }

  async function submit() {
    setBusy('submit');
    setError(null);
    const res = await callApi<{ status: string }>('POST', `/api/v1/recipes/${props.slug}/submit`);
    setBusy(null);
    if (res.ok) {
      setStatus(res.data.status);
      setNotice('Submitted: the curators have been told and will review it.');
    } else setError(res.error);
  }

  function jumpTo(line: number, column: number) {
    const el = bodyRef.current;
    if (!el) return;
    const lines = fields.body.split('\n');
    const offset = lines.slice(0, line - 1).reduce((n, l) => n + l.length + 1, 0) + column - 1;
    el.focus();
    el.setSelectionRange(offset, offset);
  }

  const text = (key: 'title' | 'summary' | 'loopTags' | 'tags' | 'pvUnit' | 'mvUnit' | 'modelSource', label: string, hint?: string) => (
    <label className="editor-field">
      <span>{label}</span>
      <input name={key} value={fields[key]} onChange={(e) => update({ [key]: e.target.value })} aria-invalid={error?.field === key} />
      {hint && <small className="text-muted">{hint}</small>}
    </label>
  );

  return (
    <div className="recipe-editor" data-testid="recipe-editor" data-ready={ready ? 'true' : undefined}>
      {restorable && (
        <p className="editor-notice" role="status">
          This browser kept text you had not saved.{' '}
          <button type="button" onClick={() => { setFields(restorable); setRestorable(null); setDirty(true); }}>Restore it</button>{' '}
          <button type="button" onClick={() => { localStorage.removeItem(backupKey); setRestorable(null); }}>Discard it</button>
        </p>
      )}
      <div className="editor-columns">
        <form className="editor-form" onSubmit={(e) => { e.preventDefault(); void save(); }} data-testid="editor-form">
          {text('title', 'Title')}
          <label className="editor-field">
            <span>Summary</span>
            <textarea name="summary" rows={2} value={fields.summary} onChange={(e) => update({ summary: e.target.value })} aria-invalid={error?.field === 'summary'} />
          </label>
          <label className="editor-field">
            <span>Loop type</span>
            <select name="loopType" value={fields.loopType} onChange={(e) => update({ loopType: e.target.value })}>
              {props.loopTypes.map((t) => <option key={t} value={t}>{t}</option>)}
            </select>
          </label>
          <label className="editor-field">
            <span>Process area</span>
            <select name="area" value={fields.area} onChange={(e) => update({ area: e.target.value })} aria-invalid={error?.field === 'area'}>
              <option value="">choose…</option>
              {props.areas.map((a) => <option key={a.code} value={a.code}>{a.name}</option>)}
            </select>
          </label>
          {text('loopTags', 'Loop tags', 'ISA-5.1, comma-separated: TIC-210, TIC-211')}
          {text('pvUnit', 'Measurement unit (PV)', 'e.g. °C, m³/h, % level')}
          {text('mvUnit', 'Output unit (MV)', 'e.g. % valve, % speed')}
          {text('tags', 'Keywords', 'comma-separated')}
          <ModelFields value={fields.model} onChange={(model) => update({ model })} />
          {text('modelSource', 'Where the model came from', 'e.g. bump test on TIC-210, 3 March, 5 % valve step')}
          <SensorFields value={fields.sensor} onChange={(sensor) => update({ sensor })} invalidField={error?.field} />
          <ControllerFields value={fields.controller} onChange={(controller) => update({ controller })} />
          <TuningFields value={fields.tuningRule} onChange={(tuningRule) => update({ tuningRule })} invalidField={error?.field} />
          <ClaimFields rows={fields.claims} onChange={(claims) => update({ claims })} invalidField={error?.field} />
          <label className="editor-field">
            <span>Cautions for this loop (one a line)</span>
            <textarea name="cautions" rows={2} value={fields.cautions} onChange={(e) => update({ cautions: e.target.value })} />
          </label>
          <label className="editor-field">
            <span>Body (Markdown, math in $…$, calculators such as &lt;LoopResponse … /&gt;)</span>
            <textarea ref={bodyRef} name="body" rows={22} spellCheck value={fields.body} onChange={(e) => update({ body: e.target.value })} className="font-mono" aria-invalid={error?.field === 'body'} data-testid="body-input" />
          </label>
          <label className="editor-field">
            <span>What changed (a few words)</span>
            <input name="message" value={message} onChange={(e) => setMessage(e.target.value)} maxLength={200} />
          </label>
          <div className="editor-actions">
            <button type="submit" disabled={busy !== null} data-testid="save">{busy === 'save' ? 'Saving…' : props.slug ? 'Save revision' : 'Create draft'}</button>
            {props.slug && props.canSubmit && status === 'draft' && (
              <button type="button" disabled={busy !== null || dirty} onClick={() => void submit()} data-testid="submit" title={dirty ? 'Save your changes first' : undefined}>
                {busy === 'submit' ? 'Submitting…' : 'Submit for review'}
              </button>
            )}
            <span className="text-sm text-muted" data-testid="editor-status">
              {props.slug ? `Revision ${revision} · ${status.replace('_', ' ')}${dirty ? ' · unsaved changes' : ''}` : 'Not saved yet'}
            </span>
          </div>
          <div aria-live="assertive">
            {error && <p className="editor-error" role="alert" data-testid="editor-error">{error.message}{error.field ? ` (field: ${error.field})` : ''}</p>}
            {notice && <p className="editor-notice" role="status" data-testid="editor-notice">{notice}</p>}
          </div>
          {conflict && (
            <section className="editor-conflict" data-testid="conflict">
              <h3>Someone else saved revision {conflict.theirs.revision} while you were editing</h3>
              <p className="text-sm">
                {conflict.theirs.revisionAuthorEmail ? `${conflict.theirs.revisionAuthorEmail}: ` : ''}
                {conflict.theirs.revisionMessage ?? ''}. Your text is kept below; nothing was overwritten.
              </p>
              <div className="editor-conflict-columns">
                <div><h4>Theirs (saved)</h4><pre data-testid="conflict-theirs">{conflict.theirs.body}</pre></div>
                <div><h4>Yours (not saved)</h4><pre data-testid="conflict-mine">{conflict.mine.body}</pre></div>
              </div>
              <button type="button" onClick={() => void save(conflict.theirs.revision, fields)} data-testid="keep-mine">Save my text (as it is now in the editor) on top of theirs</button>{' '}
              <button type="button" onClick={() => { setFields(fieldsFromRecipe(conflict.theirs)); setRevision(conflict.theirs.revision); setConflict(null); setError(null); }}>Take theirs</button>
            </section>
          )}
        </form>
        <Preview body={fields.body} onProblemClick={jumpTo} />
      </div>
    </div>
  );
}
