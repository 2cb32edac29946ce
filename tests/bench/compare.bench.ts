/**
 * Rule comparison: median time to tune and predict (setpoint and load steps, margins) every
 * applicable rule for one fopdt model, PI and PID.
 */
import { compareRules } from '../../src/lib/control/tuning/compare';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

export async function run(): Promise<void> {
  const model = { type: 'fopdt', k: 0.42, tau: 30, theta: 4 } as const;
  for (const controller of ['pi', 'pid'] as const) {
    compareRules({ model, controller }); // warm-up
    const times: number[] = [];
    for (let i = 0; i < 15; i++) {
      const start = performance.now();
      compareRules({ model, controller });
      times.push(performance.now() - start);
    }
    const ms = median(times);
    const rules = compareRules({ model, controller }).rows.length;
    console.log(`compare ${controller.toUpperCase()}, ${rules} rules: median ${ms.toFixed(1)} ms (${(ms / rules).toFixed(1)} ms per rule)`);
  }
}
