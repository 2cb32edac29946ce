import { createElement, type ComponentType } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { ALLOWED_COMPONENT_NAMES } from '../../lib/recipes/authored-mdx/component-names';

/**
 * Brings the calculators of an authored recipe to life: every `[data-island]` placeholder the
 * server wrote (name from the whitelist, props already validated at save time) becomes a React
 * root. One bundled module, no inline scripts; each calculator's code loads only when used.
 */
const roots = new Map<HTMLElement, Root>();
const calculators = import.meta.glob<{ default?: ComponentType<Record<string, unknown>> }>('../calculators/*.tsx');

async function hydrate(el: HTMLElement): Promise<void> {
  const name = el.dataset.island ?? '';
  const load = calculators[`../calculators/${name}.tsx`];
  const fallback = el.querySelector('.island-fallback');
  if (!(ALLOWED_COMPONENT_NAMES as readonly string[]).includes(name) || !load) {
    if (fallback) fallback.textContent = `The ${name} calculator is not available on this site yet.`;
    return;
  }
  let props: Record<string, unknown>;
  try {
    props = JSON.parse(el.dataset.props ?? '{}');
  } catch {
    if (fallback) fallback.textContent = 'This calculator could not be read.';
    return;
  }
  const Component = (await load()).default;
  if (!Component) return;
  el.dataset.hydrated = 'loading';
  const root = createRoot(el);
  roots.set(el, root);
  root.render(createElement(Component, props));
  el.dataset.hydrated = 'true';
}

function hydrateAll(): void {
  document.querySelectorAll<HTMLElement>('[data-island]:not([data-hydrated])').forEach((el) => {
    el.dataset.hydrated = 'pending';
    void hydrate(el);
  });
}

/** Unmounts the calculators inside `container` before the editor's preview replaces its HTML. */
function unmountWithin(container: Element): void {
  for (const [el, root] of roots) {
    if (container.contains(el)) {
      root.unmount();
      roots.delete(el);
    }
  }
}

// The editor's live preview inserts placeholders after load: it asks for hydration by event.
document.addEventListener('loopwright:unmount-islands', (e) => unmountWithin((e as CustomEvent<Element>).detail));
document.addEventListener('loopwright:islands', hydrateAll);
if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', hydrateAll);
else hydrateAll();
