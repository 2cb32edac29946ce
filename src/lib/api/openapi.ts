import { createDocument, type ZodOpenApiPathsObject } from 'zod-openapi';
import { APP_VERSION } from '../version';
import { calcPaths } from './paths/calc';
import { metaPaths } from './paths/meta';
import { editorialPaths } from './paths/editorial';
import { fieldDataPaths } from './paths/fielddata';
import { searchPaths } from './paths/search';

/**
 * The OpenAPI 3.1 document of /api/v1, generated from the same zod schemas that validate the
 * requests. To document a route, add its paths module under `src/lib/api/paths/` and list it
 * here; tests/lib/api/openapi.test.ts fails for any route file under src/pages/api/v1 that is
 * missing.
 */
export const pathGroups: readonly ZodOpenApiPathsObject[] = [calcPaths, metaPaths, editorialPaths, fieldDataPaths, searchPaths];

let cached: ReturnType<typeof createDocument> | null = null;

/** The document (built once; schemas do not change while the server runs). */
export function openApiDocument(): ReturnType<typeof createDocument> {
  cached ??= createDocument({
    openapi: '3.1.0',
    info: {
      title: 'Loopwright API',
      version: APP_VERSION,
      description:
        'Control-loop calculations and the recipe book. Times in s, frequency in rad/s, phase in degrees, gains as plain ratios unless a key ends in Db.',
    },
    servers: [{ url: '/' }],
    paths: mergePaths(pathGroups),
  });
  return cached;
}

/** Joins path groups; two groups may share a path but not a method on it. */
export function mergePaths(groups: readonly ZodOpenApiPathsObject[]): ZodOpenApiPathsObject {
  const merged: ZodOpenApiPathsObject = {};
  for (const group of groups) {
    for (const [path, item] of Object.entries(group)) {
      const existing = merged[path] ?? {};
      for (const method of Object.keys(item)) {
        if (method in existing) throw new Error(`OpenAPI: ${method.toUpperCase()} ${path} is documented twice.`);
      }
      merged[path] = { ...existing, ...item };
    }
  }
  return merged;
}
