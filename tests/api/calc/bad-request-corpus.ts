import type { CalcCall } from '../../support/calc-routes';

/** One bad request and the answer the contract (shared/api-v1.md) demands for it. */
export interface BadRequest {
  name: string;
  call: CalcCall;
  status: number;
  code: string;
  /** Dotted path into the request; undefined when the body as a whole is wrong. */
  field: string | undefined;
}

const tf = { num: [1], den: [10, 1], delay: 2 };
const analyze = (body: unknown): CalcCall => ({ route: 'analyze', body });
const analyzeRaw = (raw: string): CalcCall => ({ route: 'analyze', raw });
const withAnalyses = (analyses: unknown) => analyze({ plant: tf, analyses });
const withController = (controller: unknown) => analyze({ plant: tf, controller });
const tune = (body: unknown): CalcCall => ({ route: 'tune', body });
const fopdt = { type: 'fopdt', k: 2, tau: 30, theta: 5 };
const identify = (body: unknown): CalcCall => ({ route: 'identify', body });
const times = Array.from({ length: 20 }, (_, i) => i);
const response = times.map((t) => (t < 3 ? 0 : 1 - Math.exp(-(t - 3) / 4)));
const discretize = (body: unknown): CalcCall => ({ route: 'discretize', body });
const lowPass = { num: [1], den: [1, 1] };

/** A JSON text just over 1 MB that would otherwise be a valid request. */
const overOneMegabyte = JSON.stringify({ plant: tf, analyses: { frequency: { w: new Array(120_000).fill(0.123456789) } } });

const row = (name: string, call: CalcCall, status: number, code: string, field?: string): BadRequest => ({ name, call, status, code, field });

export const badRequests: BadRequest[] = [
  // The body itself
  row('broken JSON (missing closing brace)', analyzeRaw('{"plant": {"num": [1], "den": [1, 1]}'), 400, 'invalid_json'),
  row('a trailing comma', analyzeRaw('{"plant": {"num": [1], "den": [1, 1],}}'), 400, 'invalid_json'),
  row('an empty body', analyzeRaw(''), 400, 'invalid_json'),
  row('NaN written bare in JSON', analyzeRaw('{"plant": {"num": [1], "den": [NaN, 1]}}'), 400, 'invalid_json'),
  row('a JSON list instead of an object', analyze([tf]), 400, 'invalid_request'),
  row('JSON null', analyzeRaw('null'), 400, 'invalid_request'),
  row('a body over 1 MB', analyzeRaw(overOneMegabyte), 413, 'body_too_large'),
  row('a body sent as XML', { route: 'analyze', raw: '<plant/>', contentType: 'application/xml' }, 415, 'unsupported_media_type'),
  row('GET on a POST route', { route: 'analyze', method: 'GET' }, 405, 'method_not_allowed'),
  row('an unknown top-level key (typo of plant)', analyze({ plnat: tf }), 400, 'invalid_request', 'plnat'),
  // Plant and sensor models
  row('no plant', analyze({ analyses: { margins: true } }), 400, 'invalid_request', 'plant'),
  row('plant given as text', analyze({ plant: '1/(10s+1)' }), 400, 'invalid_model', 'plant'),
  row('an empty denominator', analyze({ plant: { num: [1], den: [] } }), 400, 'invalid_model', 'plant.den'),
  row('an all-zero denominator', analyze({ plant: { num: [1], den: [0, 0] } }), 400, 'invalid_model', 'plant.den'),
  row('an all-zero numerator', analyze({ plant: { num: [0], den: [1, 1] } }), 400, 'invalid_model', 'plant.num'),
  row('"NaN" as text in the denominator', analyze({ plant: { num: [1], den: ['NaN', 1] } }), 400, 'invalid_model', 'plant.den.0'),
  row('"Infinity" as text in the numerator', analyze({ plant: { num: ['Infinity'], den: [1, 1] } }), 400, 'invalid_model', 'plant.num.0'),
  row('1e999 (parses to Infinity) as dead time', analyzeRaw('{"plant": {"num": [1], "den": [1, 1], "delay": 1e999}}'), 400, 'invalid_model', 'plant.delay'),
  row('a coefficient given as a number in text', analyze({ plant: { num: [1], den: ['10', 1] } }), 400, 'invalid_model', 'plant.den.0'),
  row('an improper model (s²/(s+1))', analyze({ plant: { num: [1, 0, 0], den: [1, 1] } }), 400, 'invalid_model', 'plant.num'),
  row('order 25', analyze({ plant: { num: [1], den: [1, ...new Array(25).fill(0)] } }), 400, 'invalid_model', 'plant.den'),
  row('a negative dead time', analyze({ plant: { ...tf, delay: -0.5 } }), 400, 'invalid_model', 'plant.delay'),
  row('an all-zero denominator in the second block of a series', analyze({ plant: [tf, { num: [1], den: [0] }] }), 400, 'invalid_model', 'plant.1.den'),
  row('"NaN" deep in a series', analyze({ plant: [tf, tf, { num: [1], den: [1, 'NaN'] }] }), 400, 'invalid_model', 'plant.2.den.1'),
  row('an empty series', analyze({ plant: [] }), 400, 'invalid_model', 'plant'),
  row('an unknown key in a model (Delay)', analyze({ plant: { num: [1], den: [1, 1], Delay: 2 } }), 400, 'invalid_request', 'plant.Delay'),
  row('an all-zero sensor denominator', analyze({ plant: tf, sensor: { num: [1], den: [0] } }), 400, 'invalid_model', 'sensor.den'),
  row('an improper sensor', analyze({ plant: tf, sensor: { num: [1, 0], den: [1] } }), 400, 'invalid_model', 'sensor.num'),
  // Controller
  row('an unknown PID form', withController({ form: 'pd', kc: 1 }), 400, 'invalid_request', 'controller.form'),
  row('a controller without a form', withController({ kc: 1, ti: 10 }), 400, 'invalid_request', 'controller.form'),
  row('a controller gain as text', withController({ form: 'ideal', kc: '2.1' }), 400, 'invalid_request', 'controller.kc'),
  row('a negative integral time', withController({ form: 'ideal', kc: 2, ti: -11 }), 400, 'invalid_request', 'controller.ti'),
  row('a typo Ti for ti', withController({ form: 'series', kc: 2, Ti: 11 }), 400, 'invalid_request', 'controller.Ti'),
  row('a parallel PID given kc instead of kp', withController({ form: 'parallel', kc: 2, ki: 0.2 }), 400, 'invalid_request', 'controller.kc'),
  row('a zero derivative filter divisor', withController({ form: 'ideal', kc: 2, ti: 11, td: 1, n: 0 }), 400, 'invalid_request', 'controller.n'),
  // Analyses
  row('10^7 step points', withAnalyses({ step: { points: 1e7 } }), 400, 'invalid_request', 'analyses.step.points'),
  row('one step point', withAnalyses({ step: { points: 1 } }), 400, 'invalid_request', 'analyses.step.points'),
  row('a fractional number of points', withAnalyses({ step: { points: 100.5 } }), 400, 'invalid_request', 'analyses.step.points'),
  row('a negative tFinal', withAnalyses({ step: { tFinal: -5 } }), 400, 'invalid_request', 'analyses.step.tFinal'),
  row('tFinal "Infinity" as text', withAnalyses({ step: { tFinal: 'Infinity' } }), 400, 'invalid_request', 'analyses.step.tFinal'),
  row('an unknown step input', withAnalyses({ step: { input: 'disturbance' } }), 400, 'invalid_request', 'analyses.step.input'),
  row('an empty frequency list', withAnalyses({ frequency: { w: [] } }), 400, 'invalid_request', 'analyses.frequency.w'),
  row('a negative frequency', withAnalyses({ frequency: { w: [0.1, -1] } }), 400, 'invalid_request', 'analyses.frequency.w.1'),
  row('a zero frequency', withAnalyses({ frequency: { w: [0, 1] } }), 400, 'invalid_request', 'analyses.frequency.w.0'),
  row('margins as text', withAnalyses({ margins: 'yes' }), 400, 'invalid_request', 'analyses.margins'),
  row('an unknown analysis', withAnalyses({ nyquist: true }), 400, 'invalid_request', 'analyses.nyquist'),
  // Tune
  row('an unknown tuning rule', tune({ model: fopdt, rule: 'ziegler', controller: 'pi' }), 400, 'invalid_request', 'rule'),
  row('an unknown controller kind', tune({ model: fopdt, rule: 'simc', controller: 'pd' }), 400, 'invalid_request', 'controller'),
  row('an unknown model type', tune({ model: { ...fopdt, type: 'foptd' }, rule: 'simc', controller: 'pi' }), 400, 'invalid_request', 'model.type'),
  row('an fopdt without tau', tune({ model: { type: 'fopdt', k: 2, theta: 5 }, rule: 'simc', controller: 'pi' }), 400, 'invalid_model', 'model.tau'),
  row('a zero process gain', tune({ model: { ...fopdt, k: 0 }, rule: 'simc', controller: 'pi' }), 400, 'invalid_model', 'model.k'),
  row('a negative dead time in a tuning model', tune({ model: { ...fopdt, theta: -1 }, rule: 'imc', controller: 'pi' }), 400, 'invalid_model', 'model.theta'),
  row('an sopdt with tau1 below tau2', tune({ model: { type: 'sopdt', k: 1, tau1: 2, tau2: 8, theta: 1 }, rule: 'simc', controller: 'pid' }), 400, 'invalid_model', 'model.tau1'),
  row('lambda asked for a PID (PI only)', tune({ model: fopdt, rule: 'lambda', controller: 'pid' }), 400, 'invalid_request', 'controller'),
  row('zn-ultimate given an fopdt', tune({ model: fopdt, rule: 'zn-ultimate', controller: 'pi' }), 400, 'invalid_request', 'model.type'),
  row('Ziegler–Nichols on a model without dead time', tune({ model: { ...fopdt, theta: 0 }, rule: 'zn-open-loop', controller: 'pid' }), 400, 'invalid_request', 'model.theta'),
  row('an unknown tuning option', tune({ model: fopdt, rule: 'simc', controller: 'pi', options: { tauc: 5 } }), 400, 'invalid_request', 'options.tauc'),
  // Identify
  row('a step test of 9 samples', identify({ t: times.slice(0, 9), y: response.slice(0, 9), model: 'fopdt' }), 400, 'invalid_request', 't'),
  row('unsorted sample times', identify({ t: [...times.slice(0, 5), 3.5, ...times.slice(6)], y: response, model: 'fopdt' }), 400, 'invalid_request', 't.5'),
  row('a repeated sample time', identify({ t: [0, 1, 2, 2, ...times.slice(4)], y: response, model: 'fopdt' }), 400, 'invalid_request', 't.3'),
  row('y shorter than t', identify({ t: times, y: response.slice(0, 15), model: 'fopdt' }), 400, 'invalid_request', 'y'),
  row('"NaN" as text among the samples', identify({ t: times, y: response.map((v, i) => (i === 7 ? 'NaN' : v)), model: 'fopdt' }), 400, 'invalid_request', 'y.7'),
  row('an unknown model to fit', identify({ t: times, y: response, model: 'foptd' }), 400, 'invalid_request', 'model'),
  row('a controller output without a step', identify({ t: times, y: response, u: times.map(() => 40), model: 'fopdt' }), 400, 'invalid_request', 'u'),
  // Discretize
  row('a dead time that is not a whole number of samples', discretize({ tf: { ...lowPass, delay: 0.25 }, ts: 0.1, method: 'zoh' }), 400, 'invalid_request', 'tf.delay'),
  row('a zero sample time', discretize({ tf: lowPass, ts: 0, method: 'zoh' }), 400, 'invalid_request', 'ts'),
  row('an unknown discretization method', discretize({ tf: lowPass, ts: 0.1, method: 'euler' }), 400, 'invalid_request', 'method'),
  row('an improper model to discretize', discretize({ tf: { num: [1, 0], den: [1] }, ts: 0.1, method: 'tustin' }), 400, 'invalid_model', 'tf.num'),
  row('an all-zero denominator to discretize', discretize({ tf: { num: [1], den: [0, 0] }, ts: 0.1, method: 'zoh' }), 400, 'invalid_model', 'tf.den'),
];
