import { describe, expect, it } from 'vitest';
import { claimRows, claimsPayload, sensorPayload, sensorRow, tuningPayload, tuningRow, typedNumber } from '../../../src/components/editorial/loop-fields';
import { fieldsFromRecipe } from '../../../src/components/editorial/editor-fields';

describe('typedNumber', () => {
  it.each([
    ['5', 5],
    [' 0.25 ', 0.25],
    ['-3e-2', -0.03],
    ['', ''],
    ['five', 'five'],
    ['1e', '1e'],
    ['Infinity', 'Infinity'],
  ])('reads %j as %j (text that is not a finite number stays text for the server to name)', (text, expected) => {
    expect(typedNumber(text)).toBe(expected);
  });
});

describe('claimsPayload', () => {
  it('turns every row into a claim, keeping a row whose value is not a number', () => {
    expect(claimsPayload([
      { metric: 'overshootPct', op: '<=', value: '5', input: 'setpoint' },
      { metric: 'settlingTime', op: '<=', value: 'soon', input: 'load' },
    ])).toEqual([
      { metric: 'overshootPct', op: '<=', value: 5, input: 'setpoint' },
      { metric: 'settlingTime', op: '<=', value: 'soon', input: 'load' },
    ]);
  });

  it('gives back the claims it was loaded from (form round trip)', () => {
    const claims = [{ metric: 'gainMargin', op: '>=', value: 2.5, input: 'setpoint' }, { metric: 'peak', op: '<=', value: 0.8, input: 'load' }];
    expect(claimsPayload(claimRows(claims))).toEqual(claims);
  });

  it('reads a claim without input as a setpoint step, as the schema does', () => {
    expect(claimRows([{ metric: 'ms', op: '<=', value: 1.6 }])).toEqual([{ metric: 'ms', op: '<=', value: '1.6', input: 'setpoint' }]);
  });
});

describe('sensorPayload', () => {
  it('is null with no sensor or empty coefficients', () => {
    expect(sensorPayload(null)).toBeNull();
    expect(sensorPayload({ num: ' ', den: '', delay: '0' })).toBeNull();
  });

  it('reads comma-separated coefficients, highest power first, and an empty delay as 0', () => {
    expect(sensorPayload({ num: '1', den: '4, 1', delay: '' })).toEqual({ num: [1], den: [4, 1], delay: 0 });
  });

  it('gives back the sensor it was loaded from', () => {
    const sensor = { num: [1], den: [0.5, 3, 1], delay: 1.5 };
    expect(sensorPayload(sensorRow(sensor))).toEqual(sensor);
  });
});

describe('tuningPayload', () => {
  it('is null until a rule is chosen', () => {
    expect(tuningPayload({ rule: '', designTime: '12', note: 'x' })).toBeNull();
  });

  it('gives back the tuning rule it was loaded from, leaving out empty parts', () => {
    const rule = { rule: 'lambda', designTime: 60, note: 'λ = 2θ for the slow valve' };
    expect(tuningPayload(tuningRow(rule))).toEqual(rule);
    expect(tuningPayload(tuningRow({ rule: 'field' }))).toEqual({ rule: 'field' });
  });
});

describe('fieldsFromRecipe', () => {
  it('fills the claims, sensor, tuning rule and model source of the form from the API recipe', () => {
    const f = fieldsFromRecipe({
      title: 'Glycol supply temperature', summary: 'Holds glycol supply at −4 °C.', loopType: 'temperature', body: 'x',
      claims: [{ metric: 'overshootPct', op: '<=', value: 5, input: 'setpoint' }], sensor: null, tuningRule: { rule: 'simc', designTime: 20 }, modelSource: 'Step test, TIC-620',
    });
    expect(f).toMatchObject({
      claims: [{ metric: 'overshootPct', op: '<=', value: '5', input: 'setpoint' }], sensor: null,
      tuningRule: { rule: 'simc', designTime: '20', note: '' }, modelSource: 'Step test, TIC-620',
    });
  });
});
