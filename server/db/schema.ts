/** Every table, for Drizzle and drizzle-kit: accounts (better-auth), caseload, plans. */
export * from './auth-schema';
export * from './caseload-schema';
export * from './plan-schema';
