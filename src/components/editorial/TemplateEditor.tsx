import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi, type ApiError } from './api';

interface Template { loopType: string; title: string; body: string; updatedAt: string | null; updatedBy: string | null; builtIn: boolean }

/** Curators edit the starting body of new recipes, one per loop type; bodies pass the same checks as recipes. */
export default function TemplateEditor() {
  const [templates, setTemplates] = useState<Template[]>([]);
  const [chosen, setChosen] = useState('');
  const [draft, setDraft] = useState<{ title: string; body: string } | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  useEffect(() => {
    void callApi<{ templates: Template[] }>('GET', '/api/v1/templates').then((r) => {
      if (!r.ok) return setError(r.error);
      setTemplates(r.data.templates);
      const first = r.data.templates[0];
      if (first) {
        setChosen(first.loopType);
        setDraft({ title: first.title, body: first.body });
      }
    });
  }, []);

  function choose(loopType: string) {
    const t = templates.find((x) => x.loopType === loopType);
    if (!t) return;
    setChosen(loopType);
    setDraft({ title: t.title, body: t.body });
    setNotice(null);
    setError(null);
  }

  async function save() {
    if (!draft) return;
    setBusy(true);
    setError(null);
    const r = await callApi<Template>('PUT', `/api/v1/templates/${chosen}`, draft);
    setBusy(false);
    if (!r.ok) return setError(r.error);
    setTemplates((ts) => ts.map((t) => (t.loopType === chosen ? r.data : t)));
    setNotice('Saved. New recipes of this loop type start from it.');
  }

  if (!draft) return <p>{error ? error.message : 'Loading templates…'}</p>;
  return (
    <div className="template-editor" data-testid="template-editor">
      <label>Loop type{' '}
        <select value={chosen} onChange={(e) => choose(e.target.value)}>
          {templates.map((t) => <option key={t.loopType} value={t.loopType}>{t.loopType}{t.builtIn ? ' (built-in)' : ''}</option>)}
        </select>
      </label>
      <label className="editor-field"><span>Title of new recipes</span><input value={draft.title} onChange={(e) => setDraft({ ...draft, title: e.target.value })} /></label>
      <label className="editor-field"><span>Starting body</span><textarea rows={24} className="font-mono" value={draft.body} onChange={(e) => setDraft({ ...draft, body: e.target.value })} /></label>
      <button type="button" onClick={() => void save()} disabled={busy}>{busy ? 'Saving…' : 'Save template'}</button>
      {error && <p className="editor-error" role="alert">{error.message}</p>}
      {notice && <p className="editor-notice" role="status">{notice}</p>}
    </div>
  );
}
