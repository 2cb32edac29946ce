import fs from 'node:fs';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resetCalcLimiter } from '../../../src/lib/api/calc-route';
import { RateLimiter } from '../../../src/lib/api/rate-limit';
import { analyzeExample, discretizeExample, identifyExample, tuneExample } from '../../../src/lib/api/examples';
import { artifactPath } from '../../support/browser';
import { CALC_ROUTES, callInProcess, callOverHttp, type CalcAnswer, type CalcCall, type CalcRoute } from '../../support/calc-routes';
import { responseValidator } from '../../support/openapi-validator';
import { startServer, type RunningServer } from '../../support/server';
import { mutate, mutation } from './mutations';

const examples: Record<CalcRoute, unknown> = {
  analyze: analyzeExample,
  tune: tuneExample,
  identify: identifyExample,
  discretize: discretizeExample,
};

const route = fc.constantFrom(...CALC_ROUTES);

/** Any JSON at all, sent to any route. */
const arbitraryBody: fc.Arbitrary<CalcCall> = fc.record({ route, body: fc.jsonValue({ maxDepth: 4 }) });

/** Raw text: mostly broken JSON, some huge-number literals JSON.parse turns into Infinity. */
const rawBody: fc.Arbitrary<CalcCall> = fc.record({
  route,
  raw: fc.oneof(
    fc.string({ maxLength: 60 }),
    fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v).replace(/\d+(\.\d+)?/g, '1e999')),
  ),
});

/** A valid example with one to three mutations: the bodies that get furthest into the engine. */
const nearValidBody: fc.Arbitrary<CalcCall> = fc
  .tuple(route, fc.array(mutation, { minLength: 1, maxLength: 3 }))
  .map(([r, ms]) => ({ route: r, body: ms.reduce((body, m) => mutate(body, m), examples[r] as any) }));

const validate = responseValidator();

/** The body in flight, so that a run that hangs in the engine leaves its culprit behind. */
const inFlight = artifactPath('calc-fuzz-in-flight.json');
async function send(call: CalcCall, via: (call: CalcCall) => Promise<CalcAnswer>): Promise<CalcAnswer> {
  fs.writeFileSync(inFlight, JSON.stringify(call));
  // In-process calls settle in microtasks; let the test runner's own messages through.
  await new Promise((resolve) => setImmediate(resolve));
  return via(call);
}

/** What every answer must be: below 500, the contract's error body unless 200, the documented shape when 200. */
function check(call: CalcCall, answer: CalcAnswer, unexpected: unknown[], tally?: Map<number, number>): void {
  tally?.set(answer.status, (tally.get(answer.status) ?? 0) + 1);
  const shown = call.raw ?? JSON.stringify(call.body)?.slice(0, 400);
  if (answer.status >= 500) throw new Error(`${answer.status} for ${call.route} ${shown}: ${JSON.stringify(answer.json)}`);
  if (answer.status === 200) {
    const problem = validate(`/api/v1/calc/${call.route}`, 'post', answer.json);
    if (problem) throw new Error(`200 from ${call.route} breaks the documented shape (${problem}) for ${shown}`);
    return;
  }
  const error = answer.json?.error;
  if (typeof error?.code !== 'string' || typeof error?.message !== 'string') {
    throw new Error(`${answer.status} without the contract's error body for ${call.route} ${shown}`);
  }
  if (answer.status === 422) unexpected.push({ route: call.route, body: call.body ?? call.raw, answer: answer.json });
}

describe('calculation routes in-process, random bodies', () => {
  const unexpected: unknown[] = [];
  beforeAll(() => resetCalcLimiter(new RateLimiter({ perMinute: 1e9, burst: 1e9 })));
  afterAll(() => {
    // A 422 is a valid-looking request the engine could not finish: kept for the engine's owners.
    fs.writeFileSync(artifactPath('calc-fuzz-422.json'), JSON.stringify(unexpected, null, 1));
  });

  it('never answers 5xx to arbitrary JSON', { timeout: 300_000 }, async () => {
    await fc.assert(fc.asyncProperty(arbitraryBody, async (call) => check(call, await send(call, callInProcess), unexpected)), { numRuns: 2000 });
  });

  it('never answers 5xx to broken or overflowing JSON text', { timeout: 300_000 }, async () => {
    await fc.assert(fc.asyncProperty(rawBody, async (call) => check(call, await send(call, callInProcess), unexpected)), { numRuns: 1000 });
  });

  it('never answers 5xx to near-valid mutations of the worked examples', { timeout: 600_000 }, async () => {
    const tally = new Map<number, number>();
    await fc.assert(fc.asyncProperty(nearValidBody, async (call) => check(call, await send(call, callInProcess), unexpected, tally)), { numRuns: 3000 });
    // The mutations must reach the engine often enough to test it, not only the schemas.
    expect(tally.get(200) ?? 0).toBeGreaterThan(150);
    expect(tally.has(429)).toBe(false);
  });
});

describe('calculation routes over HTTP, random bodies', () => {
  let server: RunningServer;
  const unexpected: unknown[] = [];
  beforeAll(async () => {
    server = await startServer({ env: { LOOPWRIGHT_CALC_RATE_PER_MIN: '1000000', LOOPWRIGHT_CALC_BURST: '1000000' } });
  });
  afterAll(async () => server?.stop());

  it('never answers 5xx to a sample of arbitrary and near-valid bodies', { timeout: 300_000 }, async () => {
    const body = fc.oneof(arbitraryBody, rawBody, nearValidBody, nearValidBody);
    await fc.assert(fc.asyncProperty(body, async (call) => check(call, await send(call, (c) => callOverHttp(server.url, c)), unexpected)), { numRuns: 300 });
    expect(server.output()).not.toMatch(/\n\s+at .*\.mjs:\d+/); // no stack trace from a 5xx
  });
});
