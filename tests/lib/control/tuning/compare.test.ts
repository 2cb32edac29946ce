import { describe, expect, it } from 'vitest';
import { compareRules } from '../../../../src/lib/control/tuning/compare';
import { modelErrorOf } from '../helpers';

/** Ultimate point of K·e^(−θs)/(τs+1): atan(wτ) + wθ = π, Ku = √(1 + (wτ)²)/K (closed form, by bisection). */
function fopdtUltimate(k: number, tau: number, theta: number): { ku: number; pu: number } {
  let lo = 1e-9;
  let hi = Math.PI / theta;
  for (let i = 0; i < 200; i++) {
    const w = (lo + hi) / 2;
    if (Math.atan(w * tau) + w * theta < Math.PI) lo = w;
    else hi = w;
  }
  const w = (lo + hi) / 2;
  return { ku: Math.sqrt(1 + (w * tau) ** 2) / k, pu: (2 * Math.PI) / w };
}

describe('compareRules', () => {
  const fopdt = { type: 'fopdt', k: 0.42, tau: 30, theta: 4 } as const;

  it('lists every rule with a PI setting for an fopdt model, ZN ultimate from the model', () => {
    const { rows, skipped } = compareRules({ model: fopdt, controller: 'pi' });
    expect(rows.map((r) => r.rule)).toEqual(['simc', 'lambda', 'imc', 'zn-open-loop', 'zn-ultimate', 'cohen-coon', 'amigo']);
    expect(skipped).toEqual([]);
    for (const row of rows) {
      expect(row.predicted.stable).toBe(true);
      expect(row.predicted.ms).toBeGreaterThan(1);
    }
  });

  it('gives SIMC (τc = θ, ti = τ ≤ 8θ) the closed-form margins of L = e^(−θs)/(2θs): GM = π, PM = 90° − 180°/(2π) (Skogestad 2003: 3.14, 61.4°)', () => {
    const row = compareRules({ model: fopdt, controller: 'pi' }).rows.find((r) => r.rule === 'simc')!;
    expect(row.predicted.gainMargin).toBeCloseTo(Math.PI, 3);
    expect(row.predicted.phaseMarginDeg).toBeCloseTo(90 - 90 / Math.PI, 2);
    // Ms = 1.59 as printed in Skogestad 2003 (value from memory)
    expect(row.predicted.ms).toBeGreaterThan(1.57);
    expect(row.predicted.ms).toBeLessThan(1.61);
  });

  it('gives SIMC on an integrating process GM 2.96, PM 46.9°, Ms 1.70 (Skogestad 2003; values from memory)', () => {
    const row = compareRules({ model: { type: 'ipdt', k: 0.015, theta: 8 }, controller: 'pi' }).rows.find((r) => r.rule === 'simc')!;
    expect(row.predicted.gainMargin!).toBeCloseTo(2.96, 1);
    expect(Math.abs(row.predicted.phaseMarginDeg! - 46.9)).toBeLessThan(0.5);
    expect(Math.abs(row.predicted.ms - 1.70)).toBeLessThan(0.02);
  });

  const robustness = [0.05, 0.3, 1, 2].flatMap((ratio) => [
    { ratio, rule: 'simc', controller: 'pi', low: 1.55, high: 1.7, source: 'Skogestad 2003: τc = θ gives Ms 1.59–1.70 (from memory)' },
    { ratio, rule: 'amigo', controller: 'pi', low: 1.2, high: 1.5, source: 'Åström & Hägglund 2006: AMIGO fitted for Ms = 1.4 (approximate rule)' },
    { ratio, rule: 'amigo', controller: 'pid', low: 1.3, high: 1.5, source: 'Åström & Hägglund 2006: AMIGO fitted for Ms = 1.4 (approximate rule)' },
  ] as const);

  it.each(robustness)('predicts Ms in [$low, $high] for $rule $controller at θ/τ = $ratio ($source)', ({ ratio, rule, controller, low, high }) => {
    const row = compareRules({ model: { type: 'fopdt', k: 1.3, tau: 10, theta: 10 * ratio }, controller }).rows.find((r) => r.rule === rule)!;
    expect(row.predicted.ms).toBeGreaterThanOrEqual(low);
    expect(row.predicted.ms).toBeLessThanOrEqual(high);
  });

  it('takes the ultimate point from the model: Ku, Pu of K·e^(−θs)/(τs+1) in closed form', () => {
    const row = compareRules({ model: fopdt, controller: 'pid' }).rows.find((r) => r.rule === 'zn-ultimate')!;
    const exact = fopdtUltimate(fopdt.k, fopdt.tau, fopdt.theta);
    expect(row.via).toBe('ultimate-point');
    expect(row.tunedOn.type).toBe('ultimate');
    if (row.tunedOn.type !== 'ultimate') return;
    expect(row.tunedOn.ku).toBeCloseTo(exact.ku, 4);
    expect(row.tunedOn.pu).toBeCloseTo(exact.pu, 4);
    expect(row.controller.kc).toBeCloseTo(0.6 * exact.ku, 4);
  });

  it('meets the integrated-error identity IAE ≥ IE = ti/kc for a unit load step, with equality when y keeps its sign (Åström & Hägglund 2006, IE = 1/ki)', () => {
    const { rows } = compareRules({ model: fopdt, controller: 'pi' });
    for (const row of rows) {
      const ie = row.controller.ti / row.controller.kc;
      expect(row.predicted.loadIae!).toBeGreaterThanOrEqual(ie * 0.995);
    }
    // lambda with λ = τ is overdamped for this loop: the load response does not cross zero
    const lambda = rows.find((r) => r.rule === 'lambda')!;
    expect(lambda.predicted.loadIae!).toBeCloseTo(lambda.controller.ti / lambda.controller.kc, 0);
  });

  it('tunes an sopdt model with the fopdt rules through the half rule (Skogestad 2003: τ = τ1 + τ2/2, θ = θ + τ2/2)', () => {
    const { rows } = compareRules({ model: { type: 'sopdt', k: 1, tau1: 2, tau2: 1.2, theta: 0.77 }, controller: 'pi' });
    const simc = rows.find((r) => r.rule === 'simc')!;
    expect(simc.via).toBe('half-rule');
    expect(simc.tunedOn).toEqual({ type: 'fopdt', k: 1, tau: 2.6, theta: 0.77 + 0.6 });
    const pid = compareRules({ model: { type: 'sopdt', k: 1, tau1: 2, tau2: 1.2, theta: 0.77 }, controller: 'pid' }).rows;
    expect(pid.find((r) => r.rule === 'simc')!.via).toBe('model');
    expect(pid.find((r) => r.rule === 'simc')!.controller.form).toBe('series');
  });

  it('ranks Ziegler–Nichols as less robust than SIMC and AMIGO (common practice: ZN aims at quarter decay)', () => {
    const { rows } = compareRules({ model: fopdt, controller: 'pi' });
    const ms = (id: string) => rows.find((r) => r.rule === id)!.predicted.ms;
    expect(ms('zn-open-loop')).toBeGreaterThan(ms('simc'));
    expect(ms('zn-open-loop')).toBeGreaterThan(ms('amigo'));
  });

  it('keeps the sign for a reverse-acting process', () => {
    const { rows } = compareRules({ model: { ...fopdt, k: -0.42 }, controller: 'pi' });
    for (const row of rows) {
      expect(row.controller.kc).toBeLessThan(0);
      expect(row.predicted.stable).toBe(true);
    }
  });

  it('skips rules that divide by θ for a model without dead time, saying why', () => {
    const { rows, skipped } = compareRules({ model: { type: 'fopdt', k: 1, tau: 10, theta: 0 }, controller: 'pi', options: { tauC: 2 } });
    expect(rows.map((r) => r.rule)).toEqual(['simc', 'lambda', 'imc']);
    expect(skipped.map((s) => s.rule)).toEqual(['zn-open-loop', 'zn-ultimate', 'cohen-coon', 'amigo']);
    for (const s of skipped) expect(s.reason.length).toBeGreaterThan(10);
    // K/(τs+1) has phase above −90°: no ultimate point (handbook fact)
    expect(skipped.find((s) => s.rule === 'zn-ultimate')!.reason).toMatch(/never reaches −180°/);
  });

  it('refuses a bad request naming the field', () => {
    const error = modelErrorOf(() => compareRules({ model: { type: 'ultimate', ku: 2, pu: 10 }, controller: 'pi' }));
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe('model.type');
  });
});
