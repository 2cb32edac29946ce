/** Pages a signed-out person may open: signing in and the links that arrive by e-mail. */
const PUBLIC_PAGES = new Set(['/sign-in', '/forgot-password', '/reset-password', '/invite']);

/** Routes that need no session by the API contract (calculations and their description). */
export function isSessionFree(pathname: string): boolean {
  return pathname.startsWith('/api/v1/calc/') || pathname === '/api/v1/openapi.json';
}

/** Built assets and public files (anything with an extension outside /api), and the dev server's own URLs. */
export function isStaticAsset(pathname: string): boolean {
  if (pathname.startsWith('/api/')) return false;
  return /^\/(_astro|_image|@vite|@id|@fs|@react-refresh|node_modules|src)\//.test(pathname) || /\/[^/]+\.[a-z0-9]{1,8}$/i.test(pathname);
}

/** True for paths anyone may request without signing in. */
export function isPublicPath(pathname: string): boolean {
  const path = pathname.length > 1 ? pathname.replace(/\/+$/, '') : pathname;
  return (
    PUBLIC_PAGES.has(path) ||
    path === '/api/health' ||
    path === '/api/auth' ||
    path.startsWith('/api/auth/') ||
    isSessionFree(path) ||
    isStaticAsset(path)
  );
}

/** A `next` target that stays on this site (a path, never another host), else "/". */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  return next;
}
