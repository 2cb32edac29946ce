import { analyze } from '../control/analyze';
import { roots } from '../control/roots';
import { ApiError } from './errors';
import type { AnalyzeRequest } from './schemas/analyze';

/**
 * Limits on closed loops with dead time, checked before the engine simulates them. Both bound
 * work that grows without limit in the engine's closed-loop simulation and stability test, and
 * both only refuse loops no one would build: see DEVELOPERS.md ("Calculation API").
 */

/**
 * Largest accepted ratio of a closed loop's dead time to its fastest time constant. The
 * engine's closed-loop simulation and stability test with dead time take time in proportion to
 * this ratio (about 0.7 s at 2·10^4 on this hardware, a minute at 2·10^6), so the API refuses
 * wider spreads rather than hold a server thread. A lag that much faster than the dead time does
 * not change the loop's response at the time scale of the dead time.
 */
export const MAX_DELAY_TO_FASTEST_LAG = 2e4;

interface Lag {
  /** Time constant, s. */
  seconds: number;
  /** Request field that holds it. */
  field: string;
}

function fastestPoleLag(den: readonly number[], field: string): Lag | null {
  const rates = roots(den).map((p) => Math.hypot(p.re, p.im));
  // A pole too fast to compute (overflow) counts as instantaneous.
  if (rates.some((r) => !Number.isFinite(r))) return { seconds: 0, field };
  const moving = rates.filter((r) => r > 0);
  return moving.length === 0 ? null : { seconds: 1 / Math.max(...moving), field };
}

function controllerLag(c: NonNullable<AnalyzeRequest['controller']>): Lag | null {
  if (c.form === 'parallel') return c.tf && c.tf > 0 ? { seconds: c.tf, field: 'controller.tf' } : null;
  return c.td && c.td > 0 ? { seconds: c.td / (c.n ?? 10), field: 'controller.td' } : null;
}

/**
 * Largest accepted product of the highest gain-crossover frequency (rad/s) and the dead time
 * (s). A designed loop has it below π/2 (else it has no phase margin); above 1000 rad the loop
 * has hundreds of unstable oscillatory modes, and each one costs the engine time.
 */
export const MAX_CROSSOVER_TIMES_DELAY = 1000;

/**
 * Refuses with 400 invalid_request a closed loop with dead time, when a step response or the
 * stability verdict is asked for, whose dead time exceeds MAX_DELAY_TO_FASTEST_LAG times its
 * fastest time constant (field: that lag) or whose highest gain crossover times the dead time
 * exceeds MAX_CROSSOVER_TIMES_DELAY (field: `controller`). Open paths and loops without dead
 * time pass.
 */
export function checkLoopBudget(request: AnalyzeRequest): void {
  if (!request.controller) return;
  const a = request.analyses;
  const simulates = a === undefined || Boolean(a.step) || Boolean(a.poles);
  if (!simulates) return;
  const plants = Array.isArray(request.plant) ? request.plant : [request.plant];
  const delay = [...plants, request.sensor].reduce((sum, g) => sum + (g?.delay ?? 0), 0);
  if (delay === 0) return;
  const lags = [
    ...plants.map((g, i) => fastestPoleLag(g.den, Array.isArray(request.plant) ? `plant.${i}.den` : 'plant.den')),
    request.sensor ? fastestPoleLag(request.sensor.den, 'sensor.den') : null,
    controllerLag(request.controller),
  ].filter((lag): lag is Lag => lag !== null);
  const fastest = lags.reduce<Lag | null>((a, b) => (a === null || b.seconds < a.seconds ? b : a), null);
  if (fastest && delay > MAX_DELAY_TO_FASTEST_LAG * fastest.seconds) throw spreadError(delay, fastest);
  checkCrossover(request, delay);
}

/**
 * Frequency evaluations are cheap: take the highest crossover from the margin scan, and look at
 * |L| on a grid above MAX_CROSSOVER_TIMES_DELAY/delay, where the scan may not reach.
 */
function checkCrossover(request: AnalyzeRequest, delay: number): void {
  const edge = MAX_CROSSOVER_TIMES_DELAY / delay;
  const w = Array.from({ length: 13 }, (_, i) => edge * 10 ** (i / 2));
  const out = analyze({ ...request, analyses: { margins: true, frequency: { w } } });
  const crossovers = out.margins?.gainCrossovers ?? [];
  const aboveOne = (out.frequency?.w ?? []).filter((_, i) => !(out.frequency!.mag[i]! < 1));
  const highest = Math.max(0, ...crossovers, ...aboveOne);
  if (!(highest * delay > MAX_CROSSOVER_TIMES_DELAY)) return;
  throw new ApiError(
    400,
    'invalid_request',
    `The loop gain stays above 1 at least up to ${fmt(highest)} rad/s, which with ${fmt(delay)} s of dead time makes the loop violently unstable; lower the controller gain (or check the process gain).`,
    'controller',
  );
}

function spreadError(delay: number, fastest: Lag): ApiError {
  return new ApiError(
    400,
    'invalid_request',
    `The loop's dead time (${fmt(delay)} s) is more than ${MAX_DELAY_TO_FASTEST_LAG.toLocaleString('en-US')} times its fastest time constant (${fmt(fastest.seconds)} s at ${fastest.field}); leave out a lag that fast, since it does not change the response at this time scale.`,
    fastest.field,
  );
}

function fmt(x: number): string {
  return Number(x.toPrecision(3)).toString();
}
