/** Every table, for Drizzle and drizzle-kit: accounts (better-auth), caseload, plans, records, delivery. */
export * from './auth-schema';
export * from './caseload-schema';
export * from './plan-schema';
export * from './record-schema';
export * from './delivery-schema';
