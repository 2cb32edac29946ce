import Ajv2020, { type ValidateFunction } from 'ajv/dist/2020';
import { openApiDocument } from '../../src/lib/api/openapi';

type Doc = { components: { schemas: Record<string, object> }; paths: Record<string, any> };

/** Validators for the 200 answer of each documented operation, compiled from the OpenAPI document itself. */
export function responseValidator(doc: Doc = openApiDocument() as unknown as Doc) {
  const ajv = new Ajv2020({ strict: false, allErrors: false });
  const cache = new Map<string, ValidateFunction>();
  return (route: string, method: string, body: unknown): string | null => {
    const key = `${method} ${route}`;
    let validate = cache.get(key);
    if (!validate) {
      const schema = doc.paths[route]?.[method]?.responses?.['200']?.content?.['application/json']?.schema;
      if (!schema) return `${key} has no documented 200 answer`;
      validate = ajv.compile({ ...schema, components: doc.components });
      cache.set(key, validate);
    }
    return validate(body) ? null : ajv.errorsText(validate.errors);
  };
}
