// `npm run restore -- FILE`: put a backup in place of the database. Stop the server first.
import { restoreDatabase } from '../server/lib/backup';
import { parseEnv } from '../server/env';

const env = parseEnv();
const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run restore -- path/to/backup.db   (stop the server first)');
  process.exit(2);
}
try {
  const { keptAs } = restoreDatabase(file, env.DATABASE_PATH);
  console.log(`Restored ${file} to ${env.DATABASE_PATH}.${keptAs ? ` The previous database is kept as ${keptAs}.` : ''}`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
