/**
 * Step responses of the low-order models, per unit of input step, as functions of the time
 * since the step x (s); zero before the dead time.
 */

/** FOPDT: 1 − e^(−(x−θ)/τ). */
export function fopdtStep(x: number, tau: number, theta: number): number {
  const s = x - theta;
  return s > 0 ? -Math.expm1(-s / tau) : 0;
}

/**
 * SOPDT: 1 − (τ1·e^(−s/τ1) − τ2·e^(−s/τ2))/(τ1 − τ2), s = x − θ; for τ1 ≈ τ2 the repeated-pole
 * limit 1 − (1 + s/τ)·e^(−s/τ), which the difference formula loses to cancellation.
 */
export function sopdtStep(x: number, tau1: number, tau2: number, theta: number): number {
  const s = x - theta;
  if (s <= 0) return 0;
  if (Math.abs(tau1 - tau2) <= 1e-6 * Math.max(tau1, tau2)) {
    const tau = (tau1 + tau2) / 2;
    return 1 - (1 + s / tau) * Math.exp(-s / tau);
  }
  return 1 - (tau1 * Math.exp(-s / tau1) - tau2 * Math.exp(-s / tau2)) / (tau1 - tau2);
}

/** IPDT: the ramp max(0, x − θ). */
export function ipdtStep(x: number, theta: number): number {
  return Math.max(0, x - theta);
}

/** ∂/∂(τ, θ) of fopdtStep. */
export function fopdtStepGradient(x: number, tau: number, theta: number): number[] {
  const s = x - theta;
  if (s <= 0) return [0, 0];
  const e = Math.exp(-s / tau);
  return [(-s / (tau * tau)) * e, -e / tau];
}

/** ∂/∂(τ1, τ2, θ) of sopdtStep; central differences where τ1 ≈ τ2 (the closed form cancels there). */
export function sopdtStepGradient(x: number, tau1: number, tau2: number, theta: number): number[] {
  const s = x - theta;
  if (s <= 0) return [0, 0, 0];
  const d = tau1 - tau2;
  if (Math.abs(d) <= 1e-3 * Math.max(tau1, tau2)) {
    const h = 1e-6 * Math.max(tau1, tau2);
    const f = (a: number, b: number, c: number) => sopdtStep(x, a, b, c);
    return [
      (f(tau1 + h, tau2, theta) - f(tau1 - h, tau2, theta)) / (2 * h),
      (f(tau1, tau2 + h, theta) - f(tau1, tau2 - h, theta)) / (2 * h),
      (f(tau1, tau2, theta + h) - f(tau1, tau2, theta - h)) / (2 * h),
    ];
  }
  const e1 = Math.exp(-s / tau1);
  const e2 = Math.exp(-s / tau2);
  const n = tau1 * e1 - tau2 * e2;
  const dn1 = e1 * (1 + s / tau1);
  const dn2 = -e2 * (1 + s / tau2);
  return [-(dn1 * d - n) / (d * d), -(dn2 * d + n) / (d * d), -(e1 - e2) / d];
}

/** ∂/∂θ of ipdtStep. */
export function ipdtStepGradient(x: number, theta: number): number[] {
  return [x - theta > 0 ? -1 : 0];
}
