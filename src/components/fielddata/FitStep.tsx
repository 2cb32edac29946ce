import { useEffect, useState } from 'react';
import Chart from '../calculators/Chart';
import { ApiFailure, fmt, getJson, postJson } from './api';
import { Problem } from './FileStep';
import type { FitAnswer, FitView } from './types';

export interface FitStepProps {
  stepTestId: number;
  loopTypes: readonly string[];
  onChosen(fit: FitView | null, answer: FitAnswer | null): void;
}

const NAMES = { fopdt: 'First order plus dead time', sopdt: 'Second order plus dead time', ipdt: 'Integrator plus dead time' } as const;

/** Plots the uploaded data, fits the three models, shows each over the data with residuals; one is picked. */
export default function FitStep({ stepTestId, loopTypes, onChosen }: FitStepProps) {
  const [answer, setAnswer] = useState<FitAnswer | null>(null);
  const [loopType, setLoopType] = useState<string>('');
  const [chosen, setChosen] = useState<number | null>(null);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<ApiFailure | null>(null);

  useEffect(() => {
    getJson<FitAnswer>(`/api/v1/step-tests/${stepTestId}`).then((a) => {
      setAnswer(a);
      setLoopType(a.loopType);
    }, (e) => setFailure(e as ApiFailure));
  }, [stepTestId]);

  async function fit() {
    setBusy(true);
    setFailure(null);
    try {
      const a = await postJson<FitAnswer>(`/api/v1/step-tests/${stepTestId}/fits`, { loopType });
      setAnswer(a);
      const best = [...a.fits].sort((x, y) => x.fit.rmse - y.fit.rmse)[0] ?? null;
      setChosen(best?.id ?? null);
      onChosen(best, a);
    } catch (e) {
      setFailure(e as ApiFailure);
    } finally {
      setBusy(false);
    }
  }

  function choose(f: FitView) {
    setChosen(f.id);
    onChosen(f, answer);
  }

  const plot = answer?.plot;
  const unit = answer?.stepTest.mapping.pv.unit ?? '';
  const coUnit = answer?.stepTest.mapping.co?.unit ?? '';
  const fits = answer?.fits.filter((f) => plot?.curves.some((c) => c.fitId === f.id)) ?? [];
  const latest = fits.slice(-3);
  return (
    <section className="calc" aria-labelledby="fd-fit">
      <div className="calc-head">
        <h2 id="fd-fit" className="calc-title">2 · Data and model fits</h2>
        {answer && <span className="calc-sub">{answer.stepTest.tag} · {answer.stepTest.rowCount} samples</span>}
      </div>
      {failure && <Problem failure={failure} />}
      {plot && (
        <div className="calc-charts" data-testid="fd-data-chart">
          <Chart title="Measured process value" xLabel="t (s)" yLabel={`PV ${unit}`} height={200}
            series={[{ label: 'PV', color: 'ink', unit }]} data={[plot.t, plot.pv]} />
          {plot.co && (
            <Chart title="Controller output" xLabel="t (s)" yLabel={`CO ${coUnit}`} height={120}
              series={[{ label: 'CO', color: 'copper', unit: coUnit }]} data={[plot.t, plot.co]} />
          )}
        </div>
      )}
      <div className="mt-3 flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          Loop type (for matching recipes)
          <select className="rounded border border-rule bg-paper px-2 py-1" value={loopType} onChange={(e) => setLoopType(e.target.value)}>
            {loopTypes.map((t) => <option key={t} value={t}>{t}</option>)}
          </select>
        </label>
        <button type="button" className="calc-button" onClick={fit} disabled={busy || !answer} data-testid="fd-fit-button">
          {busy ? 'Fitting…' : 'Fit FOPDT, SOPDT and IPDT'}
        </button>
      </div>
      {answer?.failed?.map((f) => <p key={f.type} className="calc-problem">{f.type.toUpperCase()}: {f.message}</p>)}
      {plot && latest.length > 0 && (
        <div className="mt-4 grid gap-4" role="radiogroup" aria-label="Model to use">
          {latest.map((f) => {
            const curve = plot.curves.find((c) => c.fitId === f.id)!;
            return (
              <article key={f.id} className="rounded border border-rule p-3" data-testid={`fd-fit-${f.type}`}>
                <label className="flex flex-wrap items-baseline gap-3">
                  <input type="radio" name="fd-model" checked={chosen === f.id} onChange={() => choose(f)} data-testid={`fd-choose-${f.type}`} />
                  <strong>{NAMES[f.type]}</strong>
                  <span className="num text-sm">{describeModel(f)}</span>
                  <span className="num text-sm text-muted">RMSE {fmt(f.fit.rmse, 3)} {unit} · R² {fmt(f.fit.r2, 4)}</span>
                </label>
                <Chart title={`${f.type} fit over the data`} xLabel="t (s)" yLabel={unit} height={170}
                  series={[{ label: 'PV', color: 'muted', unit }, { label: 'model', color: 'copper', width: 2.5, unit }]}
                  data={[plot.t, plot.pv, curve.y]} />
                <Chart title={`${f.type} residuals`} xLabel="t (s)" yLabel={`residual ${unit}`} height={90}
                  series={[{ label: 'PV − model', color: 'slate', unit }]} data={[plot.t, curve.residual]} />
                {chosen === f.id && f.matches.length > 0 && (
                  <div className="mt-2 text-sm" data-testid="fd-matches">
                    <p className="calc-note">This loop behaves most like:</p>
                    <ol className="ml-5 list-decimal">
                      {f.matches.map((m) => (
                        <li key={m.slug}>
                          <a href={`/recipes/${m.slug}`}>{m.title}</a>{' '}
                          <span className="calc-note">({m.loopType}{m.sameLoopType ? '' : ', other loop type'}; distance {fmt(m.distance, 2)})</span>
                        </li>
                      ))}
                    </ol>
                  </div>
                )}
              </article>
            );
          })}
        </div>
      )}
    </section>
  );
}

export function describeModel(f: { model: FitView['model'] }): string {
  const m = f.model;
  if (m.type === 'fopdt') return `K ${fmt(m.k)} · τ ${fmt(m.tau)} s · θ ${fmt(m.theta)} s`;
  if (m.type === 'sopdt') return `K ${fmt(m.k)} · τ1 ${fmt(m.tau1)} s · τ2 ${fmt(m.tau2)} s · θ ${fmt(m.theta)} s`;
  return `K ${fmt(m.k)} 1/s · θ ${fmt(m.theta)} s`;
}
