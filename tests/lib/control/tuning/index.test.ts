import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { modelErrorOf } from '../helpers';

const models = {
  fopdt: { type: 'fopdt', k: 1, tau: 10, theta: 2 },
  sopdt: { type: 'sopdt', k: 1, tau1: 10, tau2: 3, theta: 2 },
  ipdt: { type: 'ipdt', k: 0.1, theta: 2 },
  ultimate: { type: 'ultimate', ku: 3, pu: 12 },
} as const;

/** The applicability table of api-v1.md, POST /calc/tune, transcribed row by row. */
const contractTable: Record<string, Record<string, string>> = {
  simc: { 'fopdt pi': 'ideal', 'sopdt pid': 'series', 'ipdt pi': 'ideal' },
  lambda: { 'fopdt pi': 'ideal' },
  imc: { 'fopdt pi': 'ideal', 'fopdt pid': 'ideal' },
  'zn-open-loop': { 'fopdt pi': 'ideal', 'fopdt pid': 'ideal' },
  'zn-ultimate': { 'ultimate pi': 'ideal', 'ultimate pid': 'ideal' },
  'cohen-coon': { 'fopdt pi': 'ideal', 'fopdt pid': 'ideal' },
  amigo: { 'fopdt pi': 'ideal', 'fopdt pid': 'ideal', 'ipdt pi': 'ideal', 'ipdt pid': 'ideal' },
};

const combinations = Object.keys(contractTable).flatMap((rule) =>
  Object.keys(models).flatMap((model) => (['pi', 'pid'] as const).map((controller) => ({ rule, model, controller }))),
);

describe('tune', () => {
  it.each(combinations)('follows the contract table for $rule, $model, $controller (api-v1.md)', ({ rule, model, controller }) => {
    const expectedForm = contractTable[rule][`${model} ${controller}`];
    const request = { model: models[model as keyof typeof models], rule, controller };
    if (expectedForm) {
      const result = tune(request);
      expect(result.controller.form).toBe(expectedForm);
      expect(Object.keys(result).sort()).toEqual(['controller', 'rule', 'source']);
      expect(Object.keys(result.controller).sort()).toEqual(['form', 'kc', 'td', 'ti']);
      if (controller === 'pi') expect(result.controller.td).toBe(0);
    } else {
      const error = modelErrorOf(() => tune(request));
      expect(error.code).toBe('invalid_request');
      expect(['model.type', 'controller']).toContain(error.field);
    }
  });

  it('names controller when the model fits but the controller kind does not', () => {
    expect(modelErrorOf(() => tune({ model: models.fopdt, rule: 'lambda', controller: 'pid' })).field).toBe('controller');
  });

  it('names model.type when the rule takes no model of that type', () => {
    expect(modelErrorOf(() => tune({ model: models.sopdt, rule: 'imc', controller: 'pid' })).field).toBe('model.type');
  });

  const badRequests = [
    { why: 'an unknown rule', request: { model: models.fopdt, rule: 'tyreus', controller: 'pi' }, field: 'rule' },
    { why: 'an unknown controller', request: { model: models.fopdt, rule: 'simc', controller: 'pd' }, field: 'controller' },
    { why: 'a zero gain', request: { model: { ...models.fopdt, k: 0 }, rule: 'simc', controller: 'pi' }, field: 'model.k' },
    { why: 'a negative time constant', request: { model: { ...models.fopdt, tau: -1 }, rule: 'simc', controller: 'pi' }, field: 'model.tau' },
    { why: 'a negative dead time', request: { model: { ...models.fopdt, theta: -1 }, rule: 'simc', controller: 'pi' }, field: 'model.theta' },
    { why: 'tau2 above tau1', request: { model: { ...models.sopdt, tau2: 20 }, rule: 'simc', controller: 'pid' }, field: 'model.tau1' },
    { why: 'a non-finite option', request: { model: models.fopdt, rule: 'imc', controller: 'pi', options: { lambda: Number.NaN } }, field: 'options.lambda' },
    { why: 'an unknown option', request: { model: models.fopdt, rule: 'imc', controller: 'pi', options: { speed: 2 } }, field: 'options' },
    { why: 'an option the rule does not read', request: { model: models.fopdt, rule: 'lambda', controller: 'pi', options: { tauC: 4 } }, field: 'options.tauC' },
    { why: 'any option for Ziegler–Nichols', request: { model: models.fopdt, rule: 'zn-open-loop', controller: 'pi', options: { lambda: 4 } }, field: 'options.lambda' },
    { why: 'a missing model', request: { rule: 'imc', controller: 'pi' }, field: 'model' },
  ];

  it.each(badRequests)('answers invalid_request naming the field for $why', ({ request, field }) => {
    const error = modelErrorOf(() => tune(request));
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe(field);
    expect(error.message.length).toBeGreaterThan(10);
  });
});

