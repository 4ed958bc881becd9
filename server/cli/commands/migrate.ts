/** `cli migrate [--revert]`: run pending migrations (or revert the last one) against the project database. */
import { loadConfig } from '../../config.ts';
import { openDatabase } from '../../db/database.ts';

export async function migrateCommand(argv: string[]): Promise<number> {
  const revert = argv.includes('--revert');
  const database = await openDatabase(loadConfig(), (m) => process.stderr.write(`${m}\n`), { migrate: false });
  try {
    if (revert) await database.db.undoLastMigration({ transaction: 'each' });
    else {
      const ran = await database.db.runMigrations({ transaction: 'each' });
      process.stdout.write(`${ran.length} migration(s) applied\n`);
    }
  } finally {
    await database.close();
  }
  return 0;
}
