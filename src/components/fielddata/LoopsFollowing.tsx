import { useEffect, useState } from 'react';

export interface LoopsFollowingProps {
  /** The recipe about to be retired. */
  slug: string;
}

type Row = { tag: string; description: string; ownerEmail: string };

/**
 * For the retire dialog: the registered loops that still follow the recipe, whose owners will
 * be e-mailed when it is retired.
 */
export default function LoopsFollowing({ slug }: LoopsFollowingProps) {
  const [loops, setLoops] = useState<Row[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    fetch(`/api/v1/loops?recipe=${encodeURIComponent(slug)}`, { headers: { Accept: 'application/json' } })
      .then(async (r) => (r.ok ? setLoops((await r.json()).loops) : setError('The loop register could not be read.')))
      .catch(() => setError('The loop register could not be read.'));
  }, [slug]);
  if (error) return <p className="text-sm text-fails" data-testid="loops-following">{error}</p>;
  if (!loops) return <p className="text-sm text-muted" data-testid="loops-following">Looking up the loops that follow it…</p>;
  if (loops.length === 0) return <p className="text-sm text-muted" data-testid="loops-following" data-count="0">No registered loop follows this recipe.</p>;
  return (
    <div className="text-sm" data-testid="loops-following" data-count={loops.length}>
      <p>{loops.length === 1 ? 'One registered loop still follows' : `${loops.length} registered loops still follow`} this recipe; their owners will be e-mailed:</p>
      <ul className="ml-5 list-disc">
        {loops.map((l) => <li key={l.tag}><span className="font-mono">{l.tag}</span>{l.description ? ` – ${l.description}` : ''} ({l.ownerEmail})</li>)}
      </ul>
    </div>
  );
}
