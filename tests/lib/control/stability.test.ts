import { describe, expect, it } from 'vitest';
import { factor } from '../../../src/lib/control/frequency';
import { closedLoopStable, nyquistUnstableCount, openPathStable, rootInfo } from '../../../src/lib/control/stability';
import type { TransferFunction } from '../../../src/lib/control/types';

const g = (num: number[], den: number[], delay = 0): TransferFunction => ({ num, den, delay });
const stable = (blocks: TransferFunction[]) => closedLoopStable(blocks, factor(blocks));

describe('closedLoopStable', () => {
  // K·e^(−θs)/s is closed-loop stable iff Kθ < π/2 (closed form: phase crossover π/(2θ), GM π/(2Kθ)).
  const rows = [
    { k: 1, theta: 1.5, stable: true },
    { k: 1, theta: 1.6, stable: false },
    { k: 0.01, theta: 150, stable: true },
    { k: 0.01, theta: 160, stable: false },
  ];
  for (const r of rows) {
    it(`${r.stable ? 'accepts' : 'rejects'} K·e^(−θs)/s with Kθ = ${r.k * r.theta} (limit π/2)`, () => {
      expect(stable([g([r.k], [1, 0], r.theta)])).toBe(r.stable);
    });
  }

  it('finds the ultimate gain of e^(−s)/(s+1) under P control: Ku = √(1 + ω²), ω + atan ω = π (closed form)', () => {
    // ω = 2.0287578381104345 (solved by hand with Newton's method, from memory of the classic figure 2.26).
    const w = 2.0287578381104345;
    const ku = Math.hypot(1, w);
    expect(stable([g([ku * 0.999], [1, 1], 1)])).toBe(true);
    expect(stable([g([ku * 1.001], [1, 1], 1)])).toBe(false);
  });

  it('handles dead time 100 times the time constant: e^(−100s)/(s+1), Ku just above 1', () => {
    expect(stable([g([0.99], [1, 1], 100)])).toBe(true);
    expect(stable([g([1.01], [1, 1], 100)])).toBe(false);
  });

  it('counts open-loop RHP poles: 1/(s−1)·e^(−0.2s) under P control is stable only for 1 < K < Kmax', () => {
    // Kmax = √(1 + ω²) with atan ω = 0.2ω... solved as ω where −π + atan ω − 0.2ω = −π (closed form).
    let w = 5;
    for (let i = 0; i < 50; i++) w -= (Math.atan(w) - 0.2 * w) / (1 / (1 + w * w) - 0.2);
    const kMax = Math.hypot(1, w);
    expect(stable([g([0.9], [1, -1], 0.2)])).toBe(false);
    expect(stable([g([1.1], [1, -1], 0.2)])).toBe(true);
    expect(stable([g([kMax * 0.999], [1, -1], 0.2)])).toBe(true);
    expect(stable([g([kMax * 1.001], [1, -1], 0.2)])).toBe(false);
  });

  it('uses the characteristic polynomial without dead time: 8/(s+1)³ is marginal, 7.9 stable, 8.1 not (Routh)', () => {
    expect(stable([g([7.9], [1, 3, 3, 1])])).toBe(true);
    expect(stable([g([8.1], [1, 3, 3, 1])])).toBe(false);
  });

  it('handles a double integrator with lead and dead time (poles on the imaginary axis indented)', () => {
    // L = (s + 0.1)/s² · e^(−0.1 s): stable (PM about 84°−6° at wc ≈ 1, common practice check).
    expect(stable([g([1, 0.1], [1, 0, 0], 0.1)])).toBe(true);
    expect(stable([g([1, 0.1], [1, 0, 0], 3)])).toBe(false);
  });
});

describe('nyquistUnstableCount', () => {
  it('counts two closed-loop RHP roots when K·e^(−s)/s has Kθ between π/2 and 5π/2', () => {
    expect(nyquistUnstableCount(factor([g([3], [1, 0], 1)]))).toBe(2);
  });

  it('calls a neutral loop with |L(∞)| ≥ 1 and dead time unstable', () => {
    expect(nyquistUnstableCount(factor([g([2, 1], [1, 1], 0.5)]))).toBe(Infinity);
  });
});

describe('openPathStable', () => {
  it('is false for integrators and RHP poles, true for LHP poles whatever the dead time', () => {
    expect(openPathStable(factor([g([1], [1, 0])]))).toBe(false);
    expect(openPathStable(factor([g([1], [1, -1])]))).toBe(false);
    expect(openPathStable(factor([g([1], [1, 1], 50)]))).toBe(true);
  });
});

describe('rootInfo', () => {
  it('gives damping ratio and natural frequency: −3 ± 4j has ζ = 0.6, ωn = 5', () => {
    expect(rootInfo({ re: -3, im: 4 })).toEqual({ re: -3, im: 4, damping: 0.6, naturalFrequency: 5 });
    expect(rootInfo({ re: 0, im: 0 }).damping).toBeNull();
  });
});

describe('closedLoopStable (cross-check with simulation)', () => {
  it('agrees with long exact-delay simulations on a seeded sweep of PI/PID loops with dead time', async () => {
    const { analyze } = await import('../../../src/lib/control/analyze');
    let seed = 2024;
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648), seed / 2147483648);
    const lg = (a: number, b: number) => 10 ** (a + (b - a) * rnd());
    let compared = 0;
    for (let i = 0; i < 40; i++) {
      const plant = Array.from({ length: 1 + Math.floor(rnd() * 3) }, () => ({ num: [lg(-0.5, 0.5)], den: [lg(-1, 1), rnd() < 0.1 ? -1 : 1], delay: lg(-1, 1) }));
      const controller = { form: 'ideal' as const, kc: lg(-1.5, 0.5), ti: lg(0, 1.5), td: rnd() < 0.5 ? 0 : lg(-1, 0) };
      const stableByNyquist = analyze({ plant, controller, analyses: { poles: true } }).stable;
      let y: number[];
      try {
        y = analyze({ plant, controller, analyses: { step: { tFinal: 400, points: 4001 } } }).step!.y;
      } catch {
        expect(stableByNyquist).toBe(false); // the response overflowed: clearly unstable
        compared++;
        continue;
      }
      const tail = Math.max(...y.slice(3000).map((v) => Math.abs(v - 1)));
      const middle = Math.max(...y.slice(1000, 2000).map((v) => Math.abs(v - 1)));
      if (tail < 1e-3) expect(stableByNyquist).toBe(true);
      else if (tail > middle && tail > 0.05) expect(stableByNyquist).toBe(false);
      else continue; // too close to the stability limit to call from 400 s of response
      compared++;
    }
    expect(compared).toBeGreaterThan(25);
  });
});
