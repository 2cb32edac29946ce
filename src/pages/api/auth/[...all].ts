import type { APIRoute } from 'astro';
import { CLIENT_IP_HEADER, getAuth } from '../../../lib/auth/auth';

export const prerender = false;

/**
 * better-auth's own routes (sign-in, sign-out, session, password reset, admin plugin). The
 * client address comes from the socket, never from a header the client could forge, and keys
 * the sign-in rate limit.
 */
export const ALL: APIRoute = async ({ request, clientAddress }) => {
  const headers = new Headers(request.headers);
  headers.delete(CLIENT_IP_HEADER);
  let address = '';
  try {
    address = clientAddress;
  } catch {
    // no socket address (e.g. a prerender); better-auth then uses one shared bucket
  }
  if (address) headers.set(CLIENT_IP_HEADER, address.replace(/^::ffff:/, ''));
  const hasBody = request.method !== 'GET' && request.method !== 'HEAD';
  const forwarded = new Request(request.url, {
    method: request.method,
    headers,
    body: hasBody ? await request.arrayBuffer() : undefined,
  });
  return getAuth().handler(forwarded);
};
