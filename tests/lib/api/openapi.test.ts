import fs from 'node:fs';
import path from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { mergePaths, openApiDocument } from '../../../src/lib/api/openapi';

const ROUTES_DIR = path.resolve('src/pages/api/v1');

/**
 * Route files that landed before their paths were added to the document (their owners add a
 * module under src/lib/api/paths/ and remove the line). Any other undocumented route fails,
 * and so does a line here whose route is now documented.
 */
const NOT_YET_DOCUMENTED = new Set<string>([]);
const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

/** `calc/analyze.ts` → `/api/v1/calc/analyze`, `recipes/[slug].ts` → `/api/v1/recipes/{slug}`. */
function routePath(file: string): string {
  const rel = path.relative(ROUTES_DIR, file).replace(/\.(ts|js)$/, '').split(path.sep);
  if (rel[rel.length - 1] === 'index') rel.pop();
  const segments = rel.map((s) => s.replace(/^\[(?:\.\.\.)?(\w+)\]$/, '{$1}'));
  return ['/api/v1', ...segments].join('/');
}

function routeFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? routeFiles(full) : /\.(ts|js)$/.test(entry.name) ? [full] : [];
  });
}

/** The HTTP methods a route file exports (`export const GET`, `export const { POST, ALL }`, `export async function PUT`). */
function exportedMethods(source: string): string[] {
  const found = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:const|async\s+function|function)\s+(\w+)/g)) found.add(m[1]!);
  for (const m of source.matchAll(/export\s+const\s*\{([^}]*)\}/g)) {
    for (const name of m[1]!.split(',')) found.add(name.trim().split(':').pop()!.trim());
  }
  return METHODS.filter((method) => found.has(method));
}

type Doc = {
  openapi: string;
  paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: object; example?: unknown }> } }>>;
  components: { schemas: Record<string, object> };
};
const doc = openApiDocument() as unknown as Doc;

describe('openApiDocument', () => {
  it('is an OpenAPI 3.1 document', () => {
    expect(doc.openapi).toBe('3.1.0');
  });

  const files = routeFiles(ROUTES_DIR);
  const pending = files.filter((f) => NOT_YET_DOCUMENTED.has(path.relative(ROUTES_DIR, f)));
  const tracked = files.filter((f) => !NOT_YET_DOCUMENTED.has(path.relative(ROUTES_DIR, f)));

  it('lists as not yet documented only route files that exist and are still missing', () => {
    const names = new Set(files.map((f) => path.relative(ROUTES_DIR, f)));
    for (const name of NOT_YET_DOCUMENTED) expect(names, `${name} no longer exists`).toContain(name);
    for (const file of pending) expect(Object.keys(doc.paths), `${routePath(file)} is documented now`).not.toContain(routePath(file));
  });

  it.each(tracked.map((f) => [path.relative(ROUTES_DIR, f), f]))('documents every method of the route file %s', (_name, file) => {
    const route = routePath(file);
    const methods = exportedMethods(fs.readFileSync(file, 'utf8'));
    expect(methods.length).toBeGreaterThan(0);
    expect(Object.keys(doc.paths)).toContain(route);
    for (const method of methods) expect(Object.keys(doc.paths[route]!)).toContain(method.toLowerCase());
  });

  it('documents no route that has no file', () => {
    const routes = new Set(files.map(routePath));
    for (const documented of Object.keys(doc.paths)) expect(routes).toContain(documented);
  });

  it('resolves every $ref to a component', () => {
    const refs = [...JSON.stringify(doc).matchAll(/"\$ref":"#\/components\/schemas\/([^"]+)"/g)].map((m) => m[1]!);
    expect(refs.length).toBeGreaterThan(0);
    for (const name of refs) expect(doc.components.schemas).toHaveProperty(name);
  });

  const examples = Object.entries(doc.paths).flatMap(([route, item]) =>
    Object.entries(item).flatMap(([method, op]) =>
      Object.entries(op.requestBody?.content ?? {}).map(([type, media]) => ({ label: `${method.toUpperCase()} ${route} (${type})`, media })),
    ),
  );
  it.each(examples.map((e) => [e.label, e.media]))('has an example for %s that its own schema accepts', (_label, media) => {
    expect(media.example).toBeDefined();
    const ajv = new Ajv2020({ strict: false, allErrors: true });
    const validate = ajv.compile({ ...media.schema, components: doc.components });
    const ok = validate(media.example);
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it('rejects through its schemas what the routes reject (a negative dead time, an unknown key)', () => {
    const ajv = new Ajv2020({ strict: false });
    const validate = ajv.compile({ $ref: '#/components/schemas/AnalyzeRequest', components: doc.components });
    expect(validate({ plant: { num: [1], den: [1, 1], delay: -1 } })).toBe(false);
    expect(validate({ plant: { num: [1], den: [1, 1] }, plnat: {} })).toBe(false);
    expect(validate({ plant: { num: [1], den: [1, 1] } })).toBe(true);
  });
});

describe('mergePaths', () => {
  it('joins methods of one path from two groups and refuses the same method twice', () => {
    const get = { get: { responses: {} } };
    const put = { put: { responses: {} } };
    expect(Object.keys(mergePaths([{ '/a': get }, { '/a': put }])['/a']!)).toEqual(['get', 'put']);
    expect(() => mergePaths([{ '/a': get }, { '/a': get }])).toThrow(/documented twice/);
  });
});
