import { describe, expect, it } from 'vitest';
import { claimLabel, formatFigure } from '../../../src/lib/recipes/claim-label';

describe('formatFigure', () => {
  it.each([
    { value: 4.0411, unit: '%', text: '4.04 %' },
    { value: 62.463, unit: '°', text: '62.5°' },
    { value: 1316.6, unit: 's', text: '1317 s' },
    { value: 2.22e-14, unit: '%', text: '0 %' },
    { value: Number.POSITIVE_INFINITY, unit: '', text: '∞' },
    { value: null, unit: 's', text: '—' },
  ])('shows $value as "$text"', ({ value, unit, text }) => {
    expect(formatFigure(value, unit)).toBe(text);
  });
});

describe('claimLabel', () => {
  it('names the metric, the bound with its unit and, for time responses, the step', () => {
    expect(claimLabel({ metric: 'overshootPct', op: '<=', value: 5, input: 'setpoint' })).toBe('Overshoot ≤ 5 % (setpoint step)');
    expect(claimLabel({ metric: 'peak', op: '<=', value: 0.5, input: 'load' })).toBe('Peak ≤ 0.5 (load step)');
    expect(claimLabel({ metric: 'phaseMarginDeg', op: '>=', value: 45, input: 'setpoint' })).toBe('Phase margin ≥ 45°');
  });
});
