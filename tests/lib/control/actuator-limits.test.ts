import { describe, expect, it } from 'vitest';
import { simulateLimitedLoop } from '../../../src/lib/control/actuator-limits';
import { closedLoopStep } from '../../../src/lib/control/closed-loop';
import { pidToTransferFunction } from '../../../src/lib/control/pid';
import { stepInfo } from '../../../src/lib/control/step-info';
import { timeGrid } from '../../../src/lib/control/time-grid';
import type { PidController } from '../../../src/lib/control/types';

// Brindlewood Creamery CIP supply heater TIC-410 (fictional): steam valve 0–100 %, FOPDT plant.
const plant = { num: [0.8], den: [30, 1], delay: 4 };
const pi: PidController = { form: 'ideal', kc: 2.5, ti: 25 };

describe('simulateLimitedLoop', () => {
  it('approaches the continuous closed loop when the limits are never reached (digital PI, fine step)', () => {
    const t = timeGrid(200, 401);
    const limited = simulateLimitedLoop({ controller: pi, plant, t, limits: { min: -1e9, max: 1e9 }, minSteps: 20000 });
    const linear = closedLoopStep({ controller: pidToTransferFunction(pi), plant, sensor: { num: [1], den: [1], delay: 0 } }, t);
    limited.y.forEach((v, i) => expect(Math.abs(v - linear.y[i])).toBeLessThan(2e-3));
    expect(limited.saturatedFraction).toBe(0);
  });

  it('keeps the output within 0–100 % and still reaches the setpoint', () => {
    const t = timeGrid(600, 601);
    const r = simulateLimitedLoop({ controller: pi, plant, t, setpoint: 60, bias: 20, limits: { min: 0, max: 100 } });
    r.u.forEach((u) => {
      expect(u).toBeGreaterThanOrEqual(0);
      expect(u).toBeLessThanOrEqual(100);
    });
    expect(r.saturatedFraction).toBeGreaterThan(0);
    expect(r.y[r.y.length - 1]).toBeCloseTo(60, 2);
  });

  it('cuts the windup overshoot with back-calculation and with conditional integration (Åström & Hägglund §3.5)', () => {
    const t = timeGrid(800, 1601);
    const run = (antiWindup: 'none' | 'back-calculation' | 'conditional') =>
      stepInfo(t, simulateLimitedLoop({ controller: pi, plant, t, setpoint: 60, bias: 20, limits: { min: 0, max: 100 }, antiWindup }).y, { finalValue: 60 });
    const none = run('none'), back = run('back-calculation'), cond = run('conditional');
    expect(none.overshootPct!).toBeGreaterThan(back.overshootPct! + 5);
    expect(none.overshootPct!).toBeGreaterThan(cond.overshootPct! + 5);
  });

  it('refuses limits that are not an interval', () => {
    expect(() => simulateLimitedLoop({ controller: pi, plant, t: [0, 1], limits: { min: 5, max: 5 } })).toThrow(/min below/);
  });
});
