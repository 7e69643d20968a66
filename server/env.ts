import { z } from 'zod';
import { TimeZoneSchema } from '../shared/schemas/local-date';

export const DEFAULT_SUMMARY_TIME_ZONE = 'Europe/London';

/** The environment, parsed once. Every setting has a development default so `npm start` needs none. */
const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  HOST: z.string().default('0.0.0.0'),
  PUBLIC_URL: z.url().optional(),
  DATABASE_PATH: z.string().default('data/ritorno.db'),
  UPLOAD_DIR: z.string().default('data/uploads'),
  // A hosted object store for documents; when S3_BUCKET is empty, files stay in UPLOAD_DIR.
  S3_BUCKET: z.preprocess((value) => (value === '' ? undefined : value), z.string().optional()),
  S3_REGION: z.string().default('us-east-1'),
  S3_ENDPOINT: z.preprocess((value) => (value === '' ? undefined : value), z.url().optional()),
  S3_ACCESS_KEY_ID: z.preprocess((value) => (value === '' ? undefined : value), z.string().optional()),
  S3_SECRET_ACCESS_KEY: z.preprocess((value) => (value === '' ? undefined : value), z.string().optional()),
  S3_FORCE_PATH_STYLE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((value) => value === 'true'),
  // The weekly caseload summary: cron expression and its time zone (Monday 07:00 by default).
  SUMMARY_CRON: z.string().default('0 7 * * 1'),
  SUMMARY_TIME_ZONE: TimeZoneSchema.default(DEFAULT_SUMMARY_TIME_ZONE),
  WEB_DIR: z.string().default('dist'),
  AUTH_SECRET: z.string().min(32).default('development-only-secret-change-me-0123456789'),
  // An empty value (as .env files often carry) means "not set": use the local fake.
  SMTP_URL: z.preprocess((value) => (value === '' ? undefined : value), z.url().optional()),
  MAIL_FROM: z.string().default('Ritorno <no-reply@ritorno.local>'),
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  /** Sign-in attempts allowed per minute from one address. */
  SIGN_IN_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(10),
  SEED_DEMO: z
    .enum(['true', 'false'])
    .default('true')
    .transform((value) => value === 'true'),
});

export type Env = z.infer<typeof EnvSchema> & { PUBLIC_URL: string };

export function parseEnv(source: Record<string, string | undefined> = process.env): Env {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const env = parsed.data;
  if (env.NODE_ENV === 'production' && env.AUTH_SECRET.startsWith('development-only')) {
    throw new Error('Set AUTH_SECRET (32+ random characters) in production.');
  }
  return { ...env, PUBLIC_URL: env.PUBLIC_URL ?? `http://localhost:${env.PORT}` };
}
