import { afterAll, describe, expect, it, vi } from 'vitest';
import { compileBody } from '../../../../src/lib/recipes/authored-mdx/compile';
import { compileBodyIsolated, stopCompileWorker } from '../../../../src/lib/recipes/authored-mdx/compile-isolated';
import { HOSTILE_BODIES } from './hostile-bodies';
import { findActiveContent } from './inert';

const GOOD_BODY = [
  '## When to use it',
  '',
  'The HTST hot-water loop TIC-210 holds the heating medium at 78 °C; the model is',
  '$G(s) = \\dfrac{K e^{-\\theta s}}{\\tau s + 1}$ with a footnote[^fit].',
  '',
  '<LoopResponse model={{ type: "fopdt", k: 0.9, tau: 45, theta: -0 }} controller={{ form: "ideal", kc: 1.4, ti: 45 }} claims={[{ metric: "overshootPct", op: "<=", value: 5 }]} title="Hot-water loop" />',
  '',
  '{/* the fit came from the March step test */}',
  '',
  '| tag | range |',
  '|---|---|',
  '| TIC-210 | 0–100 °C |',
  '',
  '[^fit]: Fitted on the plant, see [the step-test notes](/recipes/hot-water-step-test).',
].join('\n');

// The first compile starts the worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });

describe('compileBody', () => {
  it('renders Markdown, math, tables, footnotes and a calculator placeholder with validated props', () => {
    const result = compileBody(GOOD_BODY);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.html).toContain('<h2>When to use it</h2>');
    expect(result.html).toContain('class="katex"');
    expect(result.html).toContain('<table>');
    expect(result.html).toContain('id="user-content-fn-fit"');
    expect(result.html).toContain('data-island="LoopResponse"');
    expect(result.islands).toEqual([
      {
        name: 'LoopResponse',
        props: {
          model: { type: 'fopdt', k: 0.9, tau: 45, theta: -0 },
          controller: { form: 'ideal', kc: 1.4, ti: 45 },
          claims: [{ metric: 'overshootPct', op: '<=', value: 5, input: 'setpoint' }],
          title: 'Hot-water loop',
        },
      },
    ]);
    expect(findActiveContent(result.html)).toEqual([]);
  });

  it('reports the line and column of a refused expression', () => {
    const result = compileBody('# Title\n\nGain is {1 + 1} here.');
    expect(result).toMatchObject({ ok: false, problems: [{ line: 3, column: 9 }] });
  });

  it('reports the line of a bad prop inside a calculator', () => {
    const result = compileBody('Intro\n\n<PidConverter controller={{ form: "ideal", kc: window.k }} />');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problems[0].line).toBe(3);
    expect(result.problems[0].reason).toContain('property access');
  });

  it('does not share KaTeX macros between bodies', () => {
    compileBody('$\\gdef\\plantgain{K_p}$');
    const second = compileBody('$\\plantgain$');
    expect(second.ok).toBe(true);
    if (second.ok) expect(second.html).not.toContain('K_p');
  });
});

describe('compileBody on the hostile corpus', () => {
  it('holds at least 50 hostile bodies', () => {
    expect(HOSTILE_BODIES.length).toBeGreaterThanOrEqual(50);
  });

  it.each(HOSTILE_BODIES.filter((b) => b.expect === 'refused'))('refuses $name with a located reason', ({ body }) => {
    const result = compileBody(body);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problems[0].line).toBeGreaterThanOrEqual(1);
    expect(result.problems[0].reason.length).toBeGreaterThan(10);
  });

  it.each(HOSTILE_BODIES.filter((b) => b.expect === 'inert'))('renders $name inert', ({ body }) => {
    const result = compileBody(body);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(findActiveContent(result.html)).toEqual([]);
    expect(result.html).not.toMatch(/<script/i);
  });
});

describe('findActiveContent', () => {
  it('finds what the corpus guards against, so the inert checks can fail', () => {
    expect(findActiveContent('<img src="x" onerror="a()">')).toEqual(["element <img>", "src=\"x\" on <img>", "handler onerror on <img>"]);
    expect(findActiveContent('<a href="&#x6A;avascript:x">y</a>')).toEqual(['href="javascript:x" on <a>']);
    expect(findActiveContent('<span style="background:url(x)">y</span>')).toHaveLength(1);
  });
});

describe('compileBodyIsolated', () => {
  afterAll(() => stopCompileWorker());

  it('compiles in a worker thread with the same answer as in-thread', async () => {
    expect(await compileBodyIsolated(GOOD_BODY)).toEqual(compileBody(GOOD_BODY));
  });

  it('refuses a body that runs past its time budget and recovers with a fresh worker', async () => {
    const slow = await compileBodyIsolated('x '.repeat(20_000), 1);
    expect(slow).toMatchObject({ ok: false, problems: [{ reason: expect.stringContaining('took longer') }] });
    expect(await compileBodyIsolated('# Fine again')).toMatchObject({ ok: true, html: '<h1>Fine again</h1>' });
  });
});
