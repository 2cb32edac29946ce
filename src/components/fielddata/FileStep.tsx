import { useState } from 'react';
import { ApiFailure, postForm } from './api';
import MappingForm from './MappingForm';
import type { ColumnMapping, Preview } from './types';

export interface FileStepProps {
  areas: { code: string; name: string }[];
  onUploaded(stepTestId: number): void;
}

/** Choose a file, see its first rows and the detected format, map the columns, upload. */
export default function FileStep({ areas, onUploaded }: FileStepProps) {
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const [tag, setTag] = useState('');
  const [area, setArea] = useState('');
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<ApiFailure | null>(null);

  async function choose(f: File | null) {
    setFile(f);
    setPreview(null);
    setFailure(null);
    if (!f) return;
    const form = new FormData();
    form.set('file', f);
    setBusy(true);
    try {
      const p = await postForm<Preview>('/api/v1/step-tests/preview', form);
      setPreview(p);
      setMapping(p.suggestedMapping);
      const guess = /([A-Z]{2,5}-\d{2,5}[A-Z]?)/i.exec(`${p.header?.join(' ') ?? ''} ${f.name}`);
      if (guess && !tag) setTag(guess[1].toUpperCase());
    } catch (e) {
      setFailure(e as ApiFailure);
    } finally {
      setBusy(false);
    }
  }

  async function upload() {
    if (!file || !mapping) return;
    const form = new FormData();
    form.set('file', file);
    form.set('tag', tag);
    form.set('area', area);
    form.set('note', note);
    form.set('mapping', JSON.stringify(mapping));
    setBusy(true);
    setFailure(null);
    try {
      const r = await postForm<{ stepTest: { id: number } }>('/api/v1/step-tests', form);
      onUploaded(r.stepTest.id);
    } catch (e) {
      setFailure(e as ApiFailure);
    } finally {
      setBusy(false);
    }
  }

  const sep = preview ? ({ ',': 'commas', ';': 'semicolons', '\t': 'tabs' } as Record<string, string>)[preview.dialect.delimiter] : '';
  return (
    <section className="calc" aria-labelledby="fd-file">
      <div className="calc-head">
        <h2 id="fd-file" className="calc-title">1 · The step-test file</h2>
        <span className="calc-sub">CSV: time, process value and (optionally) controller output; at most 5 MB and 200 000 rows.</span>
      </div>
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col gap-1">
          File
          <input type="file" accept=".csv,.txt,text/csv,text/plain" data-testid="fd-file" onChange={(e) => choose(e.target.files?.[0] ?? null)} />
        </label>
        <label className="flex flex-col gap-1">
          Loop tag
          <input className="rounded border border-rule bg-paper px-2 py-1 font-mono" value={tag} onChange={(e) => setTag(e.target.value)} placeholder="TIC-210" data-testid="fd-tag" />
        </label>
        <label className="flex flex-col gap-1">
          Area
          <select className="rounded border border-rule bg-paper px-2 py-1" value={area} onChange={(e) => setArea(e.target.value)} data-testid="fd-area">
            <option value="">(not said)</option>
            {areas.map((a) => <option key={a.code} value={a.code}>{a.name}</option>)}
          </select>
        </label>
        <label className="flex min-w-64 flex-1 flex-col gap-1">
          Note on the test
          <input className="rounded border border-rule bg-paper px-2 py-1" value={note} onChange={(e) => setNote(e.target.value)} placeholder="Valve, operating point, who ran it" />
        </label>
      </div>
      {busy && <p className="calc-note" role="status">Reading…</p>}
      {failure && <Problem failure={failure} />}
      {preview && mapping && (
        <>
          <p className="calc-note mt-3" data-testid="fd-format">
            {preview.rowCount} data rows, separated by {sep}, decimal {preview.dialect.decimal === ',' ? 'comma' : 'point'},{' '}
            {preview.header ? 'with a header row' : 'no header row'}.
          </p>
          <div className="calc-scroll mt-2">
            <table className="calc-table" data-testid="fd-preview">
              <thead>
                <tr>
                  <th>line</th>
                  {Array.from({ length: preview.columns }, (_, i) => <th key={i}>{i + 1}{preview.header?.[i] ? ` · ${preview.header[i]}` : ''}</th>)}
                </tr>
              </thead>
              <tbody>
                {preview.rows.slice(0, 8).map((r) => (
                  <tr key={r.line}>
                    <td className="num">{r.line}</td>
                    {r.cells.map((c, i) => <td key={i} className="num">{c}</td>)}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {preview.issueCount > 0 && <Problem failure={new ApiFailure(preview.issueCount === 1 ? 'One row is malformed; fix it in the file before uploading:' : `${preview.issueCount} rows are malformed; fix them in the file before uploading:`, 400, null, preview.issues)} />}
          <MappingForm columns={preview.columns} header={preview.header} mapping={mapping} onChange={setMapping} />
          <button type="button" className="calc-button mt-3" disabled={busy || !tag} onClick={upload} data-testid="fd-upload">
            Upload and plot
          </button>
        </>
      )}
    </section>
  );
}

/** The API's message and, for a file, every issue by line. */
export function Problem({ failure }: { failure: ApiFailure }) {
  return (
    <div className="calc-problem mt-2" role="alert" data-testid="fd-problem">
      <p>{failure.message}</p>
      {failure.issues.length > 0 && !(failure.issues.length === 1 && failure.message.startsWith(failure.issues[0].message.replace(/\.$/, ''))) && (
        <ul className="ml-5 list-disc">
          {failure.issues.map((i, n) => <li key={n}>{i.message}</li>)}
        </ul>
      )}
    </div>
  );
}
