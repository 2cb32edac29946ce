import type { Knex } from 'knex';
import type { CleanedWhere } from 'better-auth/adapters';

/** better-auth's camelCase names become our snake_case columns and tables (`emailVerified` → `email_verified`). */
export function toSnake(name: string): string {
  return name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
}

/** A row from SQLite with its keys back in better-auth's camelCase. */
export function toCamelRow(row: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(row)) out[key.replace(/_([a-z])/g, (_m, c: string) => c.toUpperCase())] = value;
  return out;
}

/** The same object with snake_case keys, for inserts and updates. */
export function toSnakeRow(data: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(data)) if (value !== undefined) out[toSnake(key)] = value;
  return out;
}

/** `%`, `_` and the escape character itself are literal in better-auth's contains/starts/ends operators. */
function likePattern(value: unknown, before: string, after: string): string {
  return before + String(value).replace(/[\\%_]/g, (c) => `\\${c}`) + after;
}

function applyOne(q: Knex.QueryBuilder, w: CleanedWhere, or: boolean): void {
  const column = toSnake(w.field);
  const insensitive = w.mode === 'insensitive';
  const ref = insensitive ? q.client.raw('lower(??)', [column]) : column;
  const fold = (v: unknown) => (insensitive && typeof v === 'string' ? v.toLowerCase() : v);
  const where = (or ? q.orWhere : q.where).bind(q);
  const whereRaw = (or ? q.orWhereRaw : q.whereRaw).bind(q);
  const like = (pattern: string) =>
    whereRaw(insensitive ? "lower(??) like ? escape '\\'" : "?? like ? escape '\\'", [column, insensitive ? pattern.toLowerCase() : pattern]);
  switch (w.operator) {
    case 'in':
    case 'not_in': {
      const values = (Array.isArray(w.value) ? w.value : [w.value]).map(fold);
      if (w.operator === 'in') (or ? q.orWhereIn : q.whereIn).call(q, ref as never, values as never);
      else (or ? q.orWhereNotIn : q.whereNotIn).call(q, ref as never, values as never);
      return;
    }
    case 'contains': return void like(likePattern(w.value, '%', '%'));
    case 'starts_with': return void like(likePattern(w.value, '', '%'));
    case 'ends_with': return void like(likePattern(w.value, '%', ''));
    case 'ne':
      if (w.value === null) return void (or ? q.orWhereNotNull(column) : q.whereNotNull(column));
      return void where(ref, '<>', fold(w.value) as string);
    case 'lt': return void where(column, '<', w.value as string);
    case 'lte': return void where(column, '<=', w.value as string);
    case 'gt': return void where(column, '>', w.value as string);
    case 'gte': return void where(column, '>=', w.value as string);
    default:
      if (w.value === null) return void (or ? q.orWhereNull(column) : q.whereNull(column));
      return void where(ref, '=', fold(w.value) as string);
  }
}

/**
 * Adds better-auth's where list to a query: every AND clause must hold, and when OR clauses
 * are present at least one of them must hold too (the grouping the library's SQL adapters use).
 */
export function applyWhere(q: Knex.QueryBuilder, where: CleanedWhere[] | undefined): Knex.QueryBuilder {
  if (!where?.length) return q;
  const ands = where.filter((w) => w.connector !== 'OR');
  const ors = where.filter((w) => w.connector === 'OR');
  for (const w of ands) applyOne(q, w, false);
  if (ors.length) q.where((sub) => void ors.forEach((w, i) => applyOne(sub, w, i > 0)));
  return q;
}
