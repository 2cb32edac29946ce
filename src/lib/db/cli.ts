/**
 * Database commands for npm scripts: `migrate`, `seed` (migrate, then load the demo data; idempotent) and `prepare`
 * (migrate, then seed the demo once unless LOOPWRIGHT_MODE=production).
 */
import { databasePath } from './config';
import { openDatabase } from './open';
import { demoSeeded, seedDemo } from './seed';
import { productionProblems } from '../auth/production';

const MIGRATIONS = { directory: './migrations', extension: 'ts', loadExtensions: ['.ts'] };

async function main(command: string | undefined): Promise<void> {
  const file = databasePath();
  const knex = openDatabase(file);
  try {
    if (command === 'migrate' || command === 'prepare' || command === 'seed') {
      const [, ran] = await knex.migrate.latest(MIGRATIONS);
      console.log(`Migrations: ${ran.length ? ran.join(', ') : 'already current'} (${file})`);
    }
    if (command === 'seed') {
      await seedDemo(knex);
      console.log('Demo data loaded (existing rows kept).');
    } else if (command === 'prepare' && process.env.LOOPWRIGHT_MODE !== 'production') {
      if (await demoSeeded(knex)) console.log('Demo data already loaded.');
      else {
        await seedDemo(knex);
        console.log('Demo data loaded.');
      }
    } else if (command === 'prepare') {
      // Production refuses to start without its secrets or while a demo password still works.
      const problems = await productionProblems(knex);
      if (problems.length) throw new Error(`Loopwright refuses to start in production:\n- ${problems.join('\n- ')}`);
    } else if (command !== 'migrate') {
      throw new Error(`Unknown command "${command ?? ''}": use migrate, seed or prepare.`);
    }
  } finally {
    await knex.destroy();
  }
}

main(process.argv[2]).catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
