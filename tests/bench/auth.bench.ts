/**
 * What signing in costs: the median time of one email-and-password sign-in (scrypt hashing is
 * deliberately slow), and the throughput and p50/p99 latency of a small route served anonymously
 * versus with a session cookie (the middleware's session lookup on every request). Needs a
 * build (`npm run build`). Figures only; machines are noisy, so compare ratios.
 */
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';
import { startServer } from '../support/server';
import { demoAccount, signIn } from '../support/session';

const SIGN_INS = 9;

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

async function load(url: string, headers: Record<string, string>) {
  const r = await autocannon({ url, connections: 8, duration: 5, headers });
  return { rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, non2xx: r.non2xx };
}

export async function run(): Promise<void> {
  const server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '1000' } });
  try {
    const { email, password } = demoAccount('reader');
    const times: number[] = [];
    let cookie = '';
    for (let i = 0; i < SIGN_INS; i++) {
      const t0 = performance.now();
      cookie = await signIn(server.url, email, password);
      times.push(performance.now() - t0);
    }
    console.log(`sign-in (email + password, scrypt): median ${median(times).toFixed(0)} ms over ${SIGN_INS}`);

    const anonymous = await load(`${server.url}/api/health`, {});
    const signedIn = await load(`${server.url}/api/health`, { cookie });
    for (const [name, r] of [['GET /api/health, anonymous', anonymous], ['GET /api/health, with session', signedIn]] as const) {
      console.log(`${name}: ${r.rps.toFixed(0)} req/s, p50 ${r.p50} ms, p99 ${r.p99} ms${r.non2xx ? `, ${r.non2xx} non-2xx` : ''}`);
    }
    console.log(`session lookup cost: throughput ratio ${(signedIn.rps / anonymous.rps).toFixed(2)} (with session / anonymous)`);
  } finally {
    await server.stop();
  }
}
