import { useEffect, useState } from 'react';
import { ApiFailure, fmt, postJson } from './api';
import { Problem } from './FileStep';
import type { ProcessModel } from './types';
import type { TuningSetting } from '../../lib/schemas/tuning-setting';

export interface TunedChoice {
  rule: string | null;
  source: string | null;
  setting: TuningSetting;
}

export interface TuningStepProps {
  model: ProcessModel;
  /** Unit of the process value, for the gain unit label (output % per PV unit). */
  pvUnit: string;
  coUnit: string;
  onChange(choice: TunedChoice | null): void;
}

type Tuned = { rule: string; source: string; controller: { form: 'ideal' | 'series'; kc: number; ti: number; td: number } };

const RULES = ['simc', 'lambda', 'imc', 'amigo', 'cohen-coon', 'zn-open-loop'] as const;

/** The tuning rules that apply to the chosen model, one picked and adjusted to the controller's units. */
export default function TuningStep({ model, pvUnit, coUnit, onChange }: TuningStepProps) {
  const [controller, setController] = useState<'pi' | 'pid'>('pi');
  const [rows, setRows] = useState<Tuned[]>([]);
  const [picked, setPicked] = useState<string | null>(null);
  const [setting, setSetting] = useState<TuningSetting | null>(null);
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const gainUnit = `${coUnit || '%'}/${pvUnit || 'PV'}`;

  useEffect(() => {
    let live = true;
    setFailure(null);
    Promise.all(
      RULES.map((rule) => postJson<Tuned>('/api/v1/calc/tune', { model, rule, controller }).catch((e: unknown) => (e instanceof ApiFailure && e.status === 400 ? null : Promise.reject(e)))),
    ).then((all) => {
      if (!live) return;
      const ok = all.filter((r): r is Tuned => r !== null);
      setRows(ok);
      if (ok[0]) pick(ok[0], 's');
      else {
        setPicked(null);
        setSetting(null);
        onChange(null);
      }
    }, (e) => live && setFailure(e as ApiFailure));
    return () => {
      live = false;
    };
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
      <div className="calc-scroll mt-3">
        <table className="calc-table" data-testid="fd-rules">
          <thead><tr><th></th><th>rule</th><th>form</th><th>Kc</th><th>Ti (s)</th><th>Td (s)</th><th>source</th></tr></thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.rule}>
                <td><input type="radio" name="fd-rule" checked={picked === r.rule} onChange={() => pick(r, setting?.timeUnit ?? 's')} aria-label={`Use ${r.rule}`} data-testid={`fd-rule-${r.rule}`} /></td>
                <td>{r.rule}</td>
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
