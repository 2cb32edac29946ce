import { useState } from 'react';
import { ApiFailure, postForm } from './api';
import { Problem } from './FileStep';

/** Curators: import a register CSV (all rows or none); shows what was created and replaced. */
export default function LoopImport() {
  const [file, setFile] = useState<File | null>(null);
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const [done, setDone] = useState<{ created: string[]; updated: string[] } | null>(null);

  async function send() {
    if (!file) return;
    const form = new FormData();
    form.set('file', file);
    setFailure(null);
    setDone(null);
    try {
      setDone(await postForm('/api/v1/loops/import', form));
    } catch (e) {
      setFailure(e as ApiFailure);
    }
  }

  return (
    <section className="rounded border border-rule p-3 text-sm" aria-labelledby="loop-import" data-testid="loop-import">
      <h2 id="loop-import" className="font-semibold">Import the register from CSV</h2>
      <p className="text-muted">Columns: tag, area, description, recipe, form, gain, integral, derivative, time_unit, gain_unit, commissioned_by, commissioned_at, owner_email (as the export writes them). Existing tags are replaced; any bad row stops the whole import.</p>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <input type="file" accept=".csv,text/csv" onChange={(e) => setFile(e.target.files?.[0] ?? null)} data-testid="loop-import-file" />
        <button type="button" className="rounded border border-copper px-3 py-1 text-copper" onClick={send} disabled={!file}>Import</button>
      </div>
      {failure && <Problem failure={failure} />}
      {done && (
        <p className="mt-2 text-holds" role="status">
          {done.created.length} created, {done.updated.length} replaced. <a href="/loops">Reload the list</a>.
        </p>
      )}
    </section>
  );
}
