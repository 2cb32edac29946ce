/** The chart palette, read from the page's tokens so charts follow the light and dark themes. */
export type ChartColor = 'ink' | 'muted' | 'rule' | 'copper' | 'holds' | 'fails' | 'caution' | 'slate' | 'plum' | 'teal';

/** Line colours beyond the site tokens, for overlaid curves (one per tuning rule). */
const EXTRA: Record<string, { light: string; dark: string }> = {
  slate: { light: '#3d5a80', dark: '#8fb3de' },
  plum: { light: '#7b3f72', dark: '#d69bcb' },
  teal: { light: '#1d7874', dark: '#6cc5bf' },
};

/** A CSS colour string for a palette name, as the canvas needs it. */
export function chartColor(name: ChartColor): string {
  const dark = document.documentElement.dataset.theme === 'dark';
  const extra = EXTRA[name];
  if (extra) return dark ? extra.dark : extra.light;
  const value = getComputedStyle(document.documentElement).getPropertyValue(`--color-${name}`).trim();
  return value || '#555';
}

const NAMES: ChartColor[] = ['ink', 'muted', 'rule', 'copper', 'holds', 'fails', 'caution', 'slate', 'plum', 'teal'];

/** Every palette colour at once (read once per chart, not per frame). */
export function resolvePalette(): Record<ChartColor, string> {
  return Object.fromEntries(NAMES.map((n) => [n, chartColor(n)])) as Record<ChartColor, string>;
}

/** Colours for the n-th of several overlaid curves. */
export const OVERLAY_COLORS: ChartColor[] = ['copper', 'slate', 'holds', 'plum', 'teal', 'caution', 'fails', 'muted'];
