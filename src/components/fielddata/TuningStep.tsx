import { useEffect, useState } from 'react';
import { ApiFailure, fmt } from './api';
import { applicableRules, designController } from '../../lib/control/tuning/rules';
import { Problem } from './FileStep';
import type { ProcessModel } from './types';
import type { TuningSetting } from '../../lib/schemas/tuning-setting';
import TuningComparison from '../calculators/TuningComparison';

export interface TunedChoice {
  rule: string | null;
  source: string | null;
  setting: TuningSetting;
}

export interface TuningStepProps {
  model: ProcessModel;
  /** The chosen fit (names the comparison's URL state, one per model). */
  fitId: number;
  /** Unit of the process value, for the gain unit label (output % per PV unit). */
  pvUnit: string;
  coUnit: string;
  onChange(choice: TunedChoice | null): void;
}

type Tuned = { rule: string; source: string; via: string | null; controller: { form: 'ideal' | 'series'; kc: number; ti: number; td: number } };

/**
 * Every published rule that tunes this model for the controller, computed here by the engine's
 * rules (the same code as POST /api/v1/calc/tune); an SOPDT model is also offered to the FOPDT
 * rules through Skogestad's half rule, as the comparison above does.
 */
function tunedRows(model: ProcessModel, controller: 'pi' | 'pid'): Tuned[] {
  const out: Tuned[] = [];
  const attempt = (m: ProcessModel, via: string | null) => {
    for (const rule of applicableRules(m.type, controller)) {
      if (out.some((r) => r.rule === rule.id)) continue;
      try {
        const r = designController(m, rule.id, controller);
        out.push({ rule: r.rule, source: r.source, via, controller: { form: r.controller.form, kc: r.controller.kc, ti: r.controller.ti, td: r.controller.td } });
      } catch {
        // a rule that gives no finite settings for this model (e.g. θ = 0) is left out
      }
    }
  };
  attempt(model, null);
  if (model.type === 'sopdt') attempt({ type: 'fopdt', k: model.k, tau: model.tau1 + model.tau2 / 2, theta: model.theta + model.tau2 / 2 }, 'half-rule FOPDT');
  return out;
}

/** The tuning rules that apply to the chosen model, one picked and adjusted to the controller's units. */
export default function TuningStep({ model, fitId, pvUnit, coUnit, onChange }: TuningStepProps) {
  const [controller, setController] = useState<'pi' | 'pid'>('pi');
  const [rows, setRows] = useState<Tuned[]>([]);
  const [picked, setPicked] = useState<string | null>(null);
  const [setting, setSetting] = useState<TuningSetting | null>(null);
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const gainUnit = `${coUnit || '%'}/${pvUnit || 'PV'}`;

  useEffect(() => {
    setFailure(null);
    const ok = tunedRows(model, controller);
    setRows(ok);
    if (ok[0]) pick(ok[0], 's');
    else {
      setPicked(null);
      setSetting(null);
      onChange(null);
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [JSON.stringify(model), controller]);

  function pick(r: Tuned, timeUnit: TuningSetting['timeUnit']) {
    const k = timeUnit === 'min' ? 60 : 1;
    const s: TuningSetting = {
      form: r.controller.form, gain: round(r.controller.kc), integral: r.controller.ti ? round(r.controller.ti / k) : null,
      derivative: r.controller.td ? round(r.controller.td / k) : null, timeUnit, gainUnit,
    };
    setPicked(r.rule);
    update(s, r);
  }

  function update(s: TuningSetting, r = rows.find((x) => x.rule === picked)) {
    setSetting(s);
    onChange({ rule: r?.rule ?? null, source: r?.source ?? null, setting: s });
  }

  function retime(unit: TuningSetting['timeUnit']) {
    if (!setting) return;
    const f = unit === setting.timeUnit ? 1 : unit === 'min' ? 1 / 60 : 60;
    update({ ...setting, timeUnit: unit, integral: setting.integral === null ? null : round(setting.integral * f), derivative: setting.derivative === null ? null : round(setting.derivative * f) });
  }

  const input = 'w-24 rounded border border-rule bg-paper px-2 py-1 font-mono';
  return (
    <section className="calc" aria-labelledby="fd-tune">
      <div className="calc-head">
        <h2 id="fd-tune" className="calc-title">3 · Tuning from the chosen model</h2>
        <label className="text-sm">
          Controller{' '}
          <select value={controller} onChange={(e) => setController(e.target.value as 'pi' | 'pid')} data-testid="fd-controller">
            <option value="pi">PI</option>
            <option value="pid">PID</option>
          </select>
        </label>
      </div>
      <div className="calc-caution" role="note" data-testid="fd-cautions">
        <strong>Before you apply any of these settings to a running loop:</strong> put the loop in manual and
        test there first; make small changes and watch the loop; keep interlocks and the safety instrumented
        system in service; pasteurizer hold temperatures and times are legal food-safety limits, not tuning
        targets; and follow your site's procedures, local codes and licensed engineering practice.
      </div>
      {failure && <Problem failure={failure} />}
      <TuningComparison key={`${fitId}-${controller}`} model={model} controller={controller} id={`fit-${fitId}-${controller}`} title="Tuning rules on the fitted model" />
      <h3 className="mt-3 font-semibold">Pick the settings to keep</h3>
      <div className="calc-scroll mt-1">
        <table className="calc-table" data-testid="fd-rules">
          <thead><tr><th></th><th>rule</th><th>form</th><th>Kc</th><th>Ti (s)</th><th>Td (s)</th><th>source</th></tr></thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.rule}>
                <td><input type="radio" name="fd-rule" checked={picked === r.rule} onChange={() => pick(r, setting?.timeUnit ?? 's')} aria-label={`Use ${r.rule}`} data-testid={`fd-rule-${r.rule}`} /></td>
                <td>{r.rule}{r.via ? <span className="calc-note"> (on the {r.via})</span> : null}</td>
                <td>{r.controller.form}</td>
                <td className="num">{fmt(r.controller.kc)}</td>
                <td className="num">{fmt(r.controller.ti)}</td>
                <td className="num">{fmt(r.controller.td)}</td>
                <td className="calc-note">{r.source}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length === 0 && !failure && <p className="calc-note">No published rule applies to this model and controller.</p>}
      {setting && (
        <fieldset className="mt-3 flex flex-wrap items-end gap-3 text-sm" data-testid="fd-setting">
          <legend className="mb-1 text-xs uppercase tracking-widest text-copper">As it will be entered in the controller ({setting.form} form)</legend>
          <label className="flex flex-col gap-1">Kc ({setting.gainUnit})
            <input className={input} type="number" step="any" value={setting.gain} onChange={(e) => update({ ...setting, gain: Number(e.target.value) })} data-testid="fd-kc" />
          </label>
          <label className="flex flex-col gap-1">Ti ({setting.timeUnit})
            <input className={input} type="number" step="any" min="0" value={setting.integral ?? ''} onChange={(e) => update({ ...setting, integral: e.target.value === '' ? null : Number(e.target.value) })} />
          </label>
          <label className="flex flex-col gap-1">Td ({setting.timeUnit})
            <input className={input} type="number" step="any" min="0" value={setting.derivative ?? ''} onChange={(e) => update({ ...setting, derivative: e.target.value === '' ? null : Number(e.target.value) })} />
          </label>
          <label className="flex flex-col gap-1">Time unit on the controller
            <select value={setting.timeUnit} onChange={(e) => retime(e.target.value as TuningSetting['timeUnit'])}>
              <option value="s">seconds</option>
              <option value="min">minutes</option>
            </select>
          </label>
          <label className="flex flex-col gap-1">Gain unit
            <input className={input} value={setting.gainUnit} onChange={(e) => update({ ...setting, gainUnit: e.target.value })} />
          </label>
        </fieldset>
      )}
    </section>
  );
}

function round(x: number): number {
  return Number(x.toPrecision(4));
}
