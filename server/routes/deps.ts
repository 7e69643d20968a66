import type { Auth } from '../auth';
import type { Db } from '../db/client';
import type { Env } from '../env';
import type { Mailer } from '../lib/mailer';
import type { Storage } from '../lib/storage';
import type { DevMail } from '../../shared/schemas/dev-mail';

/** Everything a route needs, passed in so tests can swap the clock, the mailer and the database. */
export interface AppDeps {
  db: Db;
  auth: Auth;
  mailer: Mailer;
  env: Pick<Env, 'PUBLIC_URL' | 'NODE_ENV'> & Partial<Pick<Env, 'SIGN_IN_LIMIT_PER_MINUTE' | 'SUMMARY_TIME_ZONE'>>;
  now: () => Date;
  /** Where document files go: local disk, a hosted object store, or memory in tests. */
  storage: Storage;
  /** Present only while the local fake SMTP server is in use. */
  devMailbox?: () => DevMail[];
  /** Folder of the exported web app; served at / when given. */
  webDir?: string;
}
