/**
 * Requests per second of POST /api/v1/calc/analyze over loopback against the built server
 * (`npm run build` first): autocannon, keep-alive, 8 connections, 10 s, the OpenAPI worked
 * example (HTST loop TIC-210: step of 1201 points, three frequencies, margins, poles). The rate
 * limit is raised by environment so the route itself is measured. Prints req/s and latency
 * p50/p99; the machine is shared, so read the figures as orders of magnitude.
 */
import autocannon from 'autocannon';
import { analyzeExample } from '../../src/lib/api/examples';
import { startServer } from '../support/server';

const DURATION_S = 10;
const CONNECTIONS = 8;

export async function run(): Promise<void> {
  const server = await startServer({ env: { LOOPWRIGHT_CALC_RATE_PER_MIN: '100000000', LOOPWRIGHT_CALC_BURST: '100000000' } });
  try {
    const url = `${server.url}/api/v1/calc/analyze`;
    const body = JSON.stringify(analyzeExample);
    const check = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
    if (check.status !== 200) throw new Error(`analyze answered ${check.status}: ${await check.text()}`);
    const result = await autocannon({
      url,
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body,
      connections: CONNECTIONS,
      duration: DURATION_S,
    });
    const non2xx = result.non2xx + result.errors + result.timeouts;
    console.log(
      `analyze over HTTP: ${result.requests.average.toFixed(0)} req/s (${result.requests.total} in ${DURATION_S} s, ` +
        `${CONNECTIONS} keep-alive connections), latency p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms` +
        (non2xx ? `, ${non2xx} failed` : ''),
    );
  } finally {
    await server.stop();
  }
}
