import { afterEach, describe, expect, it } from 'vitest';
import fs from 'node:fs';
import { tempDatabase } from '../../support/temp-db';
import { databasePath, DEFAULT_DB_PATH } from '../../../src/lib/db/config';
import path from 'node:path';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await cleanup?.();
  cleanup = undefined;
});

describe('openDatabase', () => {
  it('creates the missing folder and turns on WAL mode, a busy timeout and foreign keys', async () => {
    const t = await tempDatabase({ migrate: false });
    cleanup = t.cleanup;
    const [{ journal_mode }] = await t.knex.raw('pragma journal_mode');
    const [{ timeout }] = await t.knex.raw('pragma busy_timeout');
    const [{ foreign_keys }] = await t.knex.raw('pragma foreign_keys');
    expect(fs.existsSync(t.file)).toBe(true);
    expect(journal_mode).toBe('wal');
    expect(timeout).toBe(5000);
    expect(foreign_keys).toBe(1);
  });
});

describe('databasePath', () => {
  it('uses LOOPWRIGHT_DB when set and the data folder otherwise', () => {
    expect(databasePath({ LOOPWRIGHT_DB: '/tmp/x/y.sqlite' })).toBe('/tmp/x/y.sqlite');
    expect(databasePath({})).toBe(path.resolve(DEFAULT_DB_PATH));
    expect(databasePath({ LOOPWRIGHT_DB: '  ' })).toBe(path.resolve(DEFAULT_DB_PATH));
  });
});
