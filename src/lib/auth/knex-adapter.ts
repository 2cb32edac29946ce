import type { Knex } from 'knex';
import type { BetterAuthOptions } from 'better-auth';
import { createAdapterFactory, type AdapterFactory, type CleanedWhere } from 'better-auth/adapters';
import { applyWhere, toCamelRow, toSnake, toSnakeRow } from './knex-where';

/**
 * better-auth's data in our SQLite through Knex (the library ships adapters for Kysely,
 * Drizzle and Prisma but not Knex). Tables are plural snake_case (`users`, `rate_limits`),
 * columns snake_case; dates are ISO text and booleans 0/1, translated by the factory.
 */
export function knexAdapter(knex: Knex): AdapterFactory<BetterAuthOptions> {
  let lazyOptions: BetterAuthOptions | undefined;
  const build = (q: Knex | Knex.Transaction): AdapterFactory<BetterAuthOptions> =>
    createAdapterFactory({
      config: {
        adapterId: 'knex',
        adapterName: 'Knex (SQLite)',
        usePlural: true,
        supportsDates: false,
        supportsBooleans: false,
        supportsJSON: false,
        supportsArrays: false,
        supportsNumericIds: true,
        // One SQLite connection: work inside a transaction must use the transaction's handle.
        transaction: (cb) => q.transaction((trx) => cb(build(trx)(lazyOptions!))) as never,
      },
      adapter: () => {
        const table = (model: string) => q(toSnake(model));
        const select = (cols: string[] | undefined) => (cols?.length ? cols.map(toSnake) : ['*']);
        const one = async (model: string, where: CleanedWhere[], cols?: string[]) => {
          const row = await applyWhere(table(model).select(select(cols)), where).first();
          return row ? toCamelRow(row) : null;
        };
        return {
          async create({ model, data, select: cols }) {
            const [row] = await table(model).insert(toSnakeRow(data)).returning(select(cols));
            return toCamelRow(row) as typeof data;
          },
          async findOne({ model, where, select: cols }) {
            return (await one(model, where, cols)) as never;
          },
          async findMany({ model, where, limit, select: cols, sortBy, offset }) {
            const query = applyWhere(table(model).select(select(cols)), where);
            if (sortBy) query.orderBy(toSnake(sortBy.field), sortBy.direction);
            if (limit !== undefined) query.limit(limit);
            if (offset) query.offset(offset).limit(limit ?? -1);
            return (await query).map(toCamelRow) as never;
          },
          async count({ model, where }) {
            const row = await applyWhere(table(model).count({ n: '*' }), where).first();
            return Number(row?.n ?? 0);
          },
          async update({ model, where, update }) {
            const rows = await applyWhere(table(model), where).update(toSnakeRow(update as Record<string, unknown>)).returning('*');
            return (rows[0] ? toCamelRow(rows[0]) : null) as never;
          },
          async updateMany({ model, where, update }) {
            return applyWhere(table(model), where).update(toSnakeRow(update));
          },
          async delete({ model, where }) {
            await applyWhere(table(model), where).delete();
          },
          async deleteMany({ model, where }) {
            return applyWhere(table(model), where).delete();
          },
          async consumeOne({ model, where }) {
            // Read and delete inside one transaction: SQLite serialises writers, so two callers
            // can never both receive the row.
            return (await q.transaction(async (trx) => {
              const row = await applyWhere(trx(toSnake(model)).select('rowid as _rowid', '*'), where).first();
              if (!row) return null;
              await trx(toSnake(model)).where('rowid', row._rowid).delete();
              delete row._rowid;
              return toCamelRow(row);
            })) as never;
          },
          async incrementOne({ model, where, increment, set }) {
            const changes: Record<string, unknown> = toSnakeRow(set ?? {});
            for (const [field, delta] of Object.entries(increment)) changes[toSnake(field)] = q.raw('?? + ?', [toSnake(field), delta]);
            const rows = await table(model)
              .whereIn('rowid', applyWhere(table(model).select('rowid'), where).limit(1))
              .update(changes)
              .returning('*');
            return (rows[0] ? toCamelRow(rows[0]) : null) as never;
          },
        };
      },
    });
  const root = build(knex);
  return (options: BetterAuthOptions) => {
    lazyOptions = options;
    return root(options);
  };
}
