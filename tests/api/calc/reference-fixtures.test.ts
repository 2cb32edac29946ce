/**
 * The engine's outside references, end to end over HTTP: the scipy fixtures in
 * tests/reference/fixtures (scipy.signal margins, step responses and cont2discrete, written by
 * the scripts beside them) sent through the calculation routes of the built server.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../support/server';
import { postCalc, startCalcServer } from '../../support/calc-http';

const FIXTURES = path.resolve('tests/reference/fixtures');
const read = (name: string) => JSON.parse(fs.readFileSync(path.join(FIXTURES, name), 'utf8'));
const margins = read('margins.json');
const times = read('time-responses.json');
const discrete = read('discrete.json');

let server: RunningServer;
beforeAll(async () => {
  server = await startCalcServer();
});
afterAll(async () => server?.stop());

const post = (route: string, body: unknown) => postCalc(server.url, route, body);

function near(actual: number | null, expected: number | null, rel: number) {
  if (expected === null) return expect(actual).toBeNull();
  expect(actual).not.toBeNull();
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(expected)));
}

describe(`POST /api/v1/calc/analyze margins against ${margins.source}`, () => {
  it.each(margins.cases as any[])('$name', async (c) => {
    const out = await post('analyze', { plant: c.blocks, analyses: { margins: true } });
    for (const key of ['gainCrossover', 'phaseMarginDeg', 'phaseCrossover', 'gainMargin', 'delayMargin', 'ms']) {
      near(out.margins[key], c[key] ?? null, 1e-5);
    }
  });
});

describe(`POST /api/v1/calc/analyze step responses against ${times.source}`, () => {
  it.each(times.cases as any[])('$name', async (c) => {
    const t: number[] = c.t;
    const out = await post('analyze', { plant: c.tf, analyses: { step: { tFinal: t[t.length - 1], points: t.length } } });
    expect(out.step.t).toHaveLength(t.length);
    const scale = Math.max(...c.step.map((v: number) => Math.abs(v)));
    out.step.y.forEach((y: number, i: number) => {
      expect(out.step.t[i]).toBeCloseTo(t[i]!, 9);
      expect(Math.abs(y - c.step[i])).toBeLessThanOrEqual(1e-6 * scale);
    });
  });
});

describe(`POST /api/v1/calc/discretize against ${discrete.source}`, () => {
  const rows = (discrete.plants as any[]).flatMap((p) => (['zoh', 'tustin'] as const).map((method) => ({ ...p, method })));
  it.each(rows)('$name by $method', async (p) => {
    const out = await post('discretize', { tf: p.tf, ts: p.ts, method: p.method });
    const expected = p[p.method];
    // Leading zeros of num may be kept or dropped (contract): compare right-aligned.
    const num = [...new Array(Math.max(0, expected.num.length - out.num.length)).fill(0), ...out.num];
    expect(num).toHaveLength(expected.num.length);
    num.forEach((v: number, i: number) => expect(v).toBeCloseTo(expected.num[i], 9));
    expect(out.den).toHaveLength(expected.den.length);
    out.den.forEach((v: number, i: number) => expect(v).toBeCloseTo(expected.den[i], 9));
    expect(out.delaySamples).toBe(0);
  });
});
