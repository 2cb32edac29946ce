import type { APIRoute } from 'astro';
import { CLIENT_IP_HEADER, getAuth } from '../../../lib/auth/auth';
import { rateLimitAddress } from '../../../lib/auth/rate-limit-key';

export const prerender = false;

/**
 * better-auth's own routes (sign-in, sign-out, session, password reset, admin plugin). The
 * address its rate limiter counts against is set here (src/lib/auth/rate-limit-key.ts); any
 * such header a client sends is dropped.
 */
export const ALL: APIRoute = async ({ request, clientAddress, url }) => {
  const headers = new Headers(request.headers);
  headers.delete(CLIENT_IP_HEADER);
  const hasBody = request.method !== 'GET' && request.method !== 'HEAD';
  const body = hasBody ? await request.arrayBuffer() : undefined;
  let address = '';
  try {
    address = clientAddress;
  } catch {
    // no client address known; better-auth then counts in one shared bucket
  }
  const counted = rateLimitAddress(url.pathname, body, address);
  if (counted) headers.set(CLIENT_IP_HEADER, counted);
  return getAuth().handler(new Request(request.url, { method: request.method, headers, body }));
};
