import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi, type ApiError } from './api';
import LoopsFollowing from '../fielddata/LoopsFollowing';

export interface WorkflowActionsProps {
  slug: string;
  status: string;
  isOwner: boolean;
  isCurator: boolean;
}

/**
 * The editorial buttons on a recipe page: submit (its owner, from draft), publish and return
 * with comments (curators, from review), retire with a reason and a successor (curators, from
 * published). The page reloads after a change so everything on it shows the new status.
 */
export default function WorkflowActions({ slug, status, isOwner, isCurator }: WorkflowActionsProps) {
  const [open, setOpen] = useState<null | 'return' | 'retire'>(null);
  const [comment, setComment] = useState('');
  const [reason, setReason] = useState('');
  const [successor, setSuccessor] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [ready, setReady] = useState(false);
  useEffect(() => setReady(true), []);

  async function act(action: 'submit' | 'publish' | 'return' | 'retire', body?: unknown) {
    setBusy(true);
    setError(null);
    const res = await callApi('POST', `/api/v1/recipes/${slug}/${action}`, body);
    setBusy(false);
    if (res.ok) window.location.reload();
    else setError(res.error);
  }

  return (
    <div className="workflow-actions no-print" data-testid="workflow-actions" data-ready={ready ? 'true' : undefined}>
      {isOwner && status === 'draft' && <button type="button" disabled={busy} onClick={() => void act('submit')} data-testid="action-submit">Submit for review</button>}
      {isCurator && status === 'in_review' && (
        <>
          <button type="button" disabled={busy} onClick={() => void act('publish')} data-testid="action-publish">Approve and publish</button>
          <button type="button" disabled={busy} onClick={() => setOpen('return')} data-testid="action-return">Return with comments</button>
        </>
      )}
      {isCurator && status === 'published' && <button type="button" disabled={busy} onClick={() => setOpen('retire')} data-testid="action-retire">Retire…</button>}
      {open === 'return' && (
        <form className="workflow-dialog" role="dialog" aria-label="Return to the author" onSubmit={(e) => { e.preventDefault(); void act('return', { comment }); }}>
          <label className="editor-field"><span>What should the author change?</span>
            <textarea rows={4} value={comment} onChange={(e) => setComment(e.target.value)} required minLength={3} data-testid="return-comment" /></label>
          <button type="submit" disabled={busy}>Return to draft</button> <button type="button" onClick={() => setOpen(null)}>Cancel</button>
        </form>
      )}
      {open === 'retire' && (
        <form className="workflow-dialog" role="dialog" aria-label="Retire this recipe" onSubmit={(e) => { e.preventDefault(); void act('retire', { reason, ...(successor.trim() ? { supersededBy: successor.trim() } : {}) }); }} data-testid="retire-dialog">
          <label className="editor-field"><span>Why is it retired?</span>
            <textarea rows={3} value={reason} onChange={(e) => setReason(e.target.value)} required minLength={3} data-testid="retire-reason" /></label>
          <label className="editor-field"><span>Replaced by (slug of a published recipe, optional)</span>
            <input value={successor} onChange={(e) => setSuccessor(e.target.value)} placeholder="htst-product-temperature-cascade" data-testid="retire-successor" /></label>
          <LoopsFollowing slug={slug} />
          <button type="submit" disabled={busy} data-testid="retire-confirm">Retire it</button> <button type="button" onClick={() => setOpen(null)}>Cancel</button>
        </form>
      )}
      {error && <p className="editor-error" role="alert" data-testid="workflow-error">{error.message}</p>}
    </div>
  );
}
