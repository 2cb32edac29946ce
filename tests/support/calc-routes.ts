import type { APIContext, APIRoute } from 'astro';
import * as analyzeRoute from '../../src/pages/api/v1/calc/analyze';
import * as discretizeRoute from '../../src/pages/api/v1/calc/discretize';
import * as identifyRoute from '../../src/pages/api/v1/calc/identify';
import * as tuneRoute from '../../src/pages/api/v1/calc/tune';

export const CALC_ROUTES = ['analyze', 'tune', 'identify', 'discretize'] as const;
export type CalcRoute = (typeof CALC_ROUTES)[number];

const modules: Record<CalcRoute, { POST: APIRoute; ALL: APIRoute }> = {
  analyze: analyzeRoute,
  tune: tuneRoute,
  identify: identifyRoute,
  discretize: discretizeRoute,
};

/** A request as the tests describe it: a JSON value, or raw text to send as it is. */
export interface CalcCall {
  route: CalcRoute;
  /** Sent through JSON.stringify unless `raw` is given. */
  body?: unknown;
  /** Text sent byte for byte (broken JSON, 1e999, huge bodies). */
  raw?: string;
  method?: string;
  contentType?: string | null;
  /** Client address for the rate limit (in-process calls only). */
  clientAddress?: string;
}

export interface CalcAnswer {
  status: number;
  headers: Headers;
  json: any;
}

function bodyText(call: CalcCall): string | undefined {
  if (call.raw !== undefined) return call.raw;
  return call.body === undefined ? undefined : JSON.stringify(call.body);
}

function headersOf(call: CalcCall): Record<string, string> {
  const type = call.contentType === undefined ? 'application/json' : call.contentType;
  return type === null ? {} : { 'content-type': type };
}

async function answer(res: Response): Promise<CalcAnswer> {
  const text = await res.text();
  let json: unknown = null;
  try {
    json = JSON.parse(text);
  } catch {
    json = { unparsed: text };
  }
  return { status: res.status, headers: res.headers, json };
}

/** Calls the route's handler in this process, as Astro would (no server, no network). */
export async function callInProcess(call: CalcCall): Promise<CalcAnswer> {
  const method = call.method ?? 'POST';
  const body = method === 'GET' || method === 'HEAD' ? undefined : bodyText(call);
  const request = new Request(`http://localhost/api/v1/calc/${call.route}`, { method, body, headers: headersOf(call) });
  const handler = method === 'POST' ? modules[call.route].POST : modules[call.route].ALL;
  const context = { request, clientAddress: call.clientAddress ?? '127.0.0.1' } as unknown as APIContext;
  return answer(await handler(context));
}

/** Sends the same request to a running server. */
export async function callOverHttp(baseUrl: string, call: CalcCall): Promise<CalcAnswer> {
  const method = call.method ?? 'POST';
  const body = method === 'GET' || method === 'HEAD' ? undefined : bodyText(call);
  return answer(await fetch(`${baseUrl}/api/v1/calc/${call.route}`, { method, body, headers: headersOf(call) }));
}
