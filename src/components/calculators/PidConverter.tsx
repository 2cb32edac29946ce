import { useMemo } from 'react';
import { z } from 'zod';
import { convertForm, settingRows, settingsText, type PidForm, type PidUnits } from '../../lib/calculators/pid-display';
import { formatNumber } from '../../lib/calculators/units';
import type { PidController } from '../../lib/control/types';
import { PidControllerSchema, type PidControllerInput } from '../../lib/schemas/controller';
import ExportBar from './ExportBar';
import NumberField from './NumberField';
import { controllerFields } from './model-fields';
import { useCalcUpdate } from './useCalcUpdate';
import { useUrlState } from './useUrlState';
import './calculators.css';

export interface PidConverterProps {
  /** The settings to convert, in any contract form. */
  controller: PidControllerInput;
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({
  controller: PidControllerSchema,
  units: z.object({ gain: z.enum(['ratio', 'pb']), integral: z.enum(['s', 'min', 'rpm']), derivative: z.enum(['s', 'min']) }),
});
type State = z.infer<typeof StateSchema>;

const FORMS: { form: PidForm; name: string; formula: string }[] = [
  { form: 'ideal', name: 'Ideal (non-interacting)', formula: 'Kc·(1 + 1/(Ti·s) + Td·s/(1 + Td·s/N))' },
  { form: 'series', name: 'Series (interacting)', formula: 'Kc·(1 + 1/(Ti·s))·(1 + Td·s)/(1 + Td·s/N)' },
  { form: 'parallel', name: 'Parallel (independent gains)', formula: 'Kp + Ki/s + Kd·s/(1 + Tf·s)' },
];

function Choice<T extends string>({ label, value, options, onChange, testId }: { label: string; value: T; options: [T, string][]; onChange(v: T): void; testId?: string }) {
  return (
    <label className="calc-field">
      <span className="calc-field-label">{label}</span>
      <select value={value} onChange={(e) => onChange(e.target.value as T)} data-testid={testId}>
        {options.map(([v, text]) => <option key={v} value={v}>{text}</option>)}
      </select>
    </label>
  );
}

/** One controller written in the three PID forms, in the units each faceplate uses. */
export default function PidConverter({ controller, id = 'pid-converter', title = 'PID forms and units' }: PidConverterProps) {
  const { state, update } = useUrlState(id, StateSchema, { controller, units: { gain: 'ratio', integral: 's', derivative: 's' } });
  const rows = useMemo(
    () => FORMS.map((f) => ({ ...f, converted: convertForm(state.controller as PidController, f.form) })),
    [state.controller],
  );
  const begin = useCalcUpdate([rows, state.units]);
  const setUnits = (change: Partial<PidUnits>) => {
    begin();
    update((s) => ({ ...s, units: { ...s.units, ...change } }));
  };
  const setForm = (form: PidForm) => {
    const next = convertForm(state.controller as PidController, form);
    if (!next) return;
    begin();
    update((s) => ({ ...s, controller: next as State['controller'] }));
  };
  const values = state.controller as unknown as Record<string, number>;
  const lines = () => rows.map((r) => (r.converted ? settingsText(r.converted, state.units) : `${r.form}: no equivalent`)).join('\n');

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">the same controller in each form, derivative filter kept</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <Choice label="Entered as" value={state.controller.form} options={FORMS.map((f) => [f.form, f.form])} onChange={setForm} testId={`${id}-form`} />
          {controllerFields(state.controller).map((f) => (
            <NumberField
              key={`${state.controller.form}-${f.key}`}
              label={f.label}
              kind={f.kind}
              unit={f.unit}
              min={f.min}
              value={values[f.key] ?? 0}
              onChange={(v) => {
                begin();
                update((s) => ({ ...s, controller: { ...s.controller, [f.key]: v } as State['controller'] }));
              }}
              testId={`${id}-${f.key}`}
            />
          ))}
          {state.controller.form !== 'parallel' ? (
            <NumberField label="Filter divisor N" kind="plain" unit="" min={1e-6} value={values.n ?? 10} onChange={(v) => update((s) => ({ ...s, controller: { ...s.controller, n: v } as State['controller'] }))} testId={`${id}-n`} />
          ) : null}
          <Choice label="Gain as" value={state.units.gain} options={[['ratio', 'gain (ratio)'], ['pb', 'proportional band %']]} onChange={(gain) => setUnits({ gain })} testId={`${id}-gain-unit`} />
          <Choice label="Integral as" value={state.units.integral} options={[['s', 'time in s'], ['min', 'time in min'], ['rpm', 'repeats/min']]} onChange={(integral) => setUnits({ integral })} testId={`${id}-integral-unit`} />
          <Choice label="Derivative as" value={state.units.derivative} options={[['s', 'time in s'], ['min', 'time in min']]} onChange={(derivative) => setUnits({ derivative })} testId={`${id}-derivative-unit`} />
        </div>
        <div className="calc-scroll">
          <table className="calc-table" data-testid={`${id}-table`}>
            <caption className="sr-only">The controller in each PID form</caption>
            <thead>
              <tr><th scope="col">Form</th><th scope="col">Settings</th></tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.form} data-form={r.form}>
                  <th scope="row">
                    {r.name}
                    <div className="calc-note">{r.formula}</div>
                  </th>
                  <td>
                    {r.converted ? (
                      settingRows(r.converted, state.units).map((s) => (
                        <div key={s.key} data-setting={s.key}>
                          {s.label} = <span className="num">{s.value === null ? 'off' : formatNumber(s.value)}</span> {s.value === null ? '' : s.unit}
                        </div>
                      ))
                    ) : (
                      <span className="calc-note">No equivalent: the ideal zeros are complex (Ti &lt; 4·Td roughly), which a series controller cannot make.</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => {
          const table = rows.flatMap((r) => (r.converted ? settingRows(r.converted, state.units).map((s) => ({ form: r.form, ...s })) : []));
          return [
            { header: 'form', values: table.map((t) => t.form) },
            { header: 'setting', values: table.map((t) => t.label) },
            { header: 'value', values: table.map((t) => t.value) },
            { header: 'unit', values: table.map((t) => t.unit) },
          ];
        }}
        copy={lines}
        copyWhat="settings"
      />
      <p className="calc-caution">Check which form and units your controller's faceplate uses before entering settings, and change them with the loop in manual as site procedure requires.</p>
    </section>
  );
}
