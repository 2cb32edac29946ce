/** Age of a loop's tuning, as the register filters and shows it. */

/** The register's age filters: tuning left within a year, one to three years ago, longer, or never recorded. */
export const AGE_BUCKETS = [
  { id: 'lt1y', label: 'less than a year' },
  { id: '1to3y', label: '1 to 3 years' },
  { id: 'gt3y', label: 'more than 3 years' },
  { id: 'unknown', label: 'not recorded' },
] as const;

/** The list query (tunedSince / tunedBefore / untuned) for a bucket id; {} for any other. */
export function ageQuery(bucket: string, now: Date): Record<string, string> {
  const yearsAgo = (n: number) => {
    const d = new Date(now);
    d.setUTCFullYear(d.getUTCFullYear() - n);
    return d.toISOString().slice(0, 10);
  };
  if (bucket === 'lt1y') return { tunedSince: yearsAgo(1) };
  if (bucket === '1to3y') return { tunedSince: yearsAgo(3), tunedBefore: yearsAgo(1) };
  if (bucket === 'gt3y') return { tunedBefore: yearsAgo(3) };
  if (bucket === 'unknown') return { untuned: 'true' };
  return {};
}

/** "3 months", "2 years": whole units, rounded down. */
export function tuningAge(date: string, now: Date): string {
  const days = Math.floor((now.getTime() - Date.parse(`${date}T00:00:00Z`)) / 86_400_000);
  if (days < 0) return 'in the future';
  if (days < 62) return `${days} day${days === 1 ? '' : 's'}`;
  const months = Math.floor(days / 30.44);
  if (months < 24) return `${months} months`;
  return `${Math.floor(days / 365.25)} years`;
}
