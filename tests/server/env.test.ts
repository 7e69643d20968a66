import { parseEnv } from '@/server/env';

describe('environment', () => {
  it('runs with no settings at all, using the fake mail server and a local database', () => {
    const env = parseEnv({});
    expect(env).toMatchObject({ PORT: 8080, DATABASE_PATH: 'data/ritorno.db', PUBLIC_URL: 'http://localhost:8080', SEED_DEMO: true });
    expect(env.SMTP_URL).toBeUndefined();
  });

  it('names the setting that is wrong', () => {
    expect(() => parseEnv({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => parseEnv({ SMTP_URL: 'not a url' })).toThrow(/SMTP_URL/);
    expect(() => parseEnv({ SUMMARY_TIME_ZONE: 'Europe/Atlantis' })).toThrow(/SUMMARY_TIME_ZONE/);
  });

  it('refuses the development secret in production', () => {
    expect(() => parseEnv({ NODE_ENV: 'production' })).toThrow(/AUTH_SECRET/);
  });
});
