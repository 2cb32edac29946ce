/**
 * One worked request per calculation route, shown in the OpenAPI document and sent by the tests
 * (they must validate and answer 200). Numbers are Brindlewood Creamery's own: the HTST
 * hot-water set TIC-210, the CIP return tank LIC-330, a glycol step test on TIC-415.
 */
export const analyzeExample = {
  plant: { num: [1], den: [10, 1], delay: 2 },
  sensor: { num: [1], den: [0.5, 1] },
  controller: { form: 'ideal', kc: 2.1, ti: 11, td: 0.8, n: 10 },
  analyses: {
    step: { tFinal: 120, points: 1201, input: 'setpoint' },
    frequency: { w: [0.01, 0.1, 1] },
    margins: true,
    poles: true,
  },
} as const;

export const tuneExample = {
  model: { type: 'fopdt', k: 0.8, tau: 45, theta: 6 },
  rule: 'simc',
  controller: 'pi',
} as const;

const stepTimes = Array.from({ length: 31 }, (_, i) => i * 2);
export const identifyExample = {
  t: stepTimes,
  // TIC-415 glycol supply: PV rises about 1.5 °C per % output with 4 s dead time and τ ≈ 12 s.
  y: stepTimes.map((t) => (t < 4 ? 0 : Math.round(1.5 * (1 - Math.exp(-(t - 4) / 12)) * 1000) / 1000)),
  model: 'fopdt',
};

export const discretizeExample = {
  tf: { num: [0.6], den: [30, 1], delay: 3 },
  ts: 0.5,
  method: 'zoh',
} as const;
