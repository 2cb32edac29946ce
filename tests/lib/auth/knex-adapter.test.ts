import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { admin } from 'better-auth/plugins/admin';
import type { BetterAuthOptions } from 'better-auth';
import { tempDatabase } from '../../support/temp-db';
import { knexAdapter } from '../../../src/lib/auth/knex-adapter';

// The adapter contract is better-auth's own DBAdapter interface (the doc comments in
// @better-auth/core/db/adapter): these checks exercise each method against a real SQLite file.
const OPTIONS: BetterAuthOptions = {
  plugins: [admin({ defaultRole: 'reader' })],
  rateLimit: { enabled: true, storage: 'database' },
};

let t: Awaited<ReturnType<typeof tempDatabase>>;
let adapter: ReturnType<ReturnType<typeof knexAdapter>>;
beforeEach(async () => {
  t = await tempDatabase();
  adapter = knexAdapter(t.knex)({ ...OPTIONS, database: knexAdapter(t.knex) });
});
afterEach(async () => t.cleanup());

const when = new Date('2026-11-30T08:15:00.000Z');
function person(email: string, name = 'Hedda Quist', extra: Record<string, unknown> = {}) {
  return adapter.create<Record<string, unknown>>({
    model: 'user',
    data: { email, name, emailVerified: false, createdAt: when, updatedAt: when, ...extra },
  });
}
async function raw(knex: Knex, table: string) {
  return knex(table).select('*');
}

describe('knexAdapter', () => {
  it('creates a row in snake_case columns with ISO dates and 0/1 booleans, and reads it back typed', async () => {
    const created = await person('hedda.quist@brindlewood.example', 'Hedda Quist', { role: 'author', banned: true });
    expect(typeof created.id).toBe('string');
    const [row] = await raw(t.knex, 'users');
    expect(row).toMatchObject({ email: 'hedda.quist@brindlewood.example', email_verified: 0, banned: 1, created_at: when.toISOString(), role: 'author' });
    const found = await adapter.findOne<Record<string, unknown>>({ model: 'user', where: [{ field: 'id', value: created.id as string }] });
    expect(found).toMatchObject({ emailVerified: false, banned: true, role: 'author' });
    expect(found?.createdAt).toBeInstanceOf(Date);
    expect((found?.createdAt as Date).getTime()).toBe(when.getTime());
  });

  it('answers null for a findOne that matches nothing', async () => {
    expect(await adapter.findOne({ model: 'user', where: [{ field: 'email', value: 'nobody@brindlewood.example' }] })).toBeNull();
  });

  it('compares case-insensitively when asked and treats % and _ literally in contains', async () => {
    await person('Ivo.Brandt@brindlewood.example', 'Ivo Brandt');
    await person('ivo_x@brindlewood.example', 'Ivo X');
    const insensitive = await adapter.findOne<{ name: string }>({ model: 'user', where: [{ field: 'email', value: 'ivo.brandt@BRINDLEWOOD.example', mode: 'insensitive' }] });
    expect(insensitive?.name).toBe('Ivo Brandt');
    const sensitive = await adapter.findOne({ model: 'user', where: [{ field: 'email', value: 'ivo.brandt@brindlewood.example' }] });
    expect(sensitive).toBeNull();
    const underscore = await adapter.findMany<{ name: string }>({ model: 'user', where: [{ field: 'email', operator: 'contains', value: 'ivo_' }] });
    expect(underscore.map((u) => u.name)).toEqual(['Ivo X']);
  });

  it('filters with in, OR groups, sorts, limits and offsets', async () => {
    for (const [i, name] of ['Ada Varga', 'Bo Lund', 'Cy Moss', 'Di Rook'].entries()) await person(`p${i}@brindlewood.example`, name);
    const sorted = await adapter.findMany<{ name: string }>({ model: 'user', sortBy: { field: 'name', direction: 'desc' }, limit: 2, offset: 1 });
    expect(sorted.map((u) => u.name)).toEqual(['Cy Moss', 'Bo Lund']);
    const either = await adapter.findMany<{ name: string }>({
      model: 'user',
      where: [{ field: 'name', value: 'Ada Varga', connector: 'OR' }, { field: 'name', value: 'Di Rook', connector: 'OR' }],
      sortBy: { field: 'name', direction: 'asc' },
    });
    expect(either.map((u) => u.name)).toEqual(['Ada Varga', 'Di Rook']);
    const within = await adapter.count({ model: 'user', where: [{ field: 'email', operator: 'in', value: ['p1@brindlewood.example', 'p3@brindlewood.example'] }] });
    expect(within).toBe(2);
    expect(await adapter.count({ model: 'user', where: [{ field: 'name', operator: 'not_in', value: ['Ada Varga'] }] })).toBe(3);
    expect(await adapter.count({ model: 'user' })).toBe(4);
  });

  it('updates one row and returns it, updates many and counts them, deletes', async () => {
    const a = await person('a@brindlewood.example', 'Ada Varga');
    await person('b@brindlewood.example', 'Bo Lund');
    const updated = await adapter.update<{ name: string; role: string }>({ model: 'user', where: [{ field: 'id', value: a.id as string }], update: { role: 'curator' } });
    expect(updated?.role).toBe('curator');
    expect(await adapter.update({ model: 'user', where: [{ field: 'id', value: 'missing' }], update: { role: 'curator' } })).toBeNull();
    expect(await adapter.updateMany({ model: 'user', where: [{ field: 'role', value: 'reader' }], update: { banned: true } })).toBe(1);
    await adapter.delete({ model: 'user', where: [{ field: 'id', value: a.id as string }] });
    expect(await adapter.count({ model: 'user' })).toBe(1);
    expect(await adapter.deleteMany({ model: 'user', where: [{ field: 'banned', value: true }] })).toBe(1);
    expect(await adapter.count({ model: 'user' })).toBe(0);
  });

  it('consumes exactly one matching row even when several match', async () => {
    const expiresAt = new Date('2026-12-09T00:00:00.000Z');
    for (const value of ['one', 'two']) {
      await adapter.create({ model: 'verification', data: { identifier: 'reset-password:same', value, expiresAt, createdAt: when, updatedAt: when } });
    }
    const first = await adapter.consumeOne<{ value: string }>({ model: 'verification', where: [{ field: 'identifier', value: 'reset-password:same' }] });
    expect(['one', 'two']).toContain(first?.value);
    expect(await adapter.count({ model: 'verification' })).toBe(1);
    await adapter.consumeOne({ model: 'verification', where: [{ field: 'identifier', value: 'reset-password:same' }] });
    expect(await adapter.consumeOne({ model: 'verification', where: [{ field: 'identifier', value: 'reset-password:same' }] })).toBeNull();
  });

  it('increments a counter only while its guard holds', async () => {
    await adapter.create({ model: 'rateLimit', data: { key: '127.0.0.1|/sign-in/email', count: 1, lastRequest: 1000 } });
    const guard = [{ field: 'key', value: '127.0.0.1|/sign-in/email' }, { field: 'count', operator: 'lt' as const, value: 2 }];
    const bumped = await adapter.incrementOne<{ count: number; lastRequest: number }>({ model: 'rateLimit', where: guard, increment: { count: 1 }, set: { lastRequest: 2000 } });
    expect(bumped).toMatchObject({ count: 2, lastRequest: 2000 });
    expect(await adapter.incrementOne({ model: 'rateLimit', where: guard, increment: { count: 1 } })).toBeNull();
  });

  it('rolls a transaction back completely when it throws', async () => {
    await expect(
      adapter.transaction(async (trx) => {
        await trx.create({ model: 'user', data: { email: 'tx@brindlewood.example', name: 'Tx Person', emailVerified: false, createdAt: when, updatedAt: when } });
        throw new Error('boom');
      }),
    ).rejects.toThrow('boom');
    expect(await adapter.count({ model: 'user' })).toBe(0);
    await adapter.transaction(async (trx) => {
      await trx.create({ model: 'user', data: { email: 'tx@brindlewood.example', name: 'Tx Person', emailVerified: false, createdAt: when, updatedAt: when } });
    });
    expect(await adapter.count({ model: 'user' })).toBe(1);
  });
});
