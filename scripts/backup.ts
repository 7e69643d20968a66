// `npm run backup [-- FILE]`: an online copy of the database (the server may keep running).
import { backupDatabase } from '../server/lib/backup';
import { parseEnv } from '../server/env';

const env = parseEnv();
const file = process.argv[2] ?? `data/backups/ritorno-${new Date().toISOString().replace(/[:.]/g, '-')}.db`;
backupDatabase(env.DATABASE_PATH, file)
  .then(({ pages }) => console.log(`Backed up ${env.DATABASE_PATH} to ${file} (${pages} pages, integrity ok).`))
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
