import { startServer, type RunningServer } from './server';

/** The built server with the calculation rate limit raised, so reference tests measure answers. */
export function startCalcServer(): Promise<RunningServer> {
  return startServer({ env: { LOOPWRIGHT_CALC_RATE_PER_MIN: '100000', LOOPWRIGHT_CALC_BURST: '100000' } });
}

/** POSTs a JSON body to /api/v1/calc/{route}; anything but 200 fails the test with the answer. */
export async function postCalc(baseUrl: string, route: string, body: unknown): Promise<any> {
  const res = await fetch(`${baseUrl}/api/v1/calc/${route}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  const json = await res.json();
  if (res.status !== 200) throw new Error(`${route} answered ${res.status}: ${JSON.stringify(json)}`);
  return json;
}
