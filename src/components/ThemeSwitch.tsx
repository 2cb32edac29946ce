import { useEffect, useState } from 'react';

type Theme = 'light' | 'dark';

/** Switches between the light and dark palettes and remembers the choice in this browser. */
export default function ThemeSwitch() {
  const [theme, setTheme] = useState<Theme | null>(null);

  useEffect(() => {
    setTheme(document.documentElement.dataset.theme === 'dark' ? 'dark' : 'light');
  }, []);

  function toggle() {
    const next: Theme = theme === 'dark' ? 'light' : 'dark';
    document.documentElement.dataset.theme = next;
    localStorage.setItem('loopwright-theme', next);
    setTheme(next);
  }

  return (
    <button
      type="button"
      onClick={toggle}
      disabled={theme === null}
      data-testid="theme-switch"
      aria-label={theme === 'dark' ? 'Use the light palette' : 'Use the dark palette'}
      className="whitespace-nowrap rounded-md border border-rule px-2 py-1 text-sm text-muted hover:text-ink disabled:opacity-50"
    >
      {theme === 'dark' ? '☀ Light' : '☾ Dark'}
    </button>
  );
}
