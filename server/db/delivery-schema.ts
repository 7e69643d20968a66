import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';
import { musicians } from './caseload-schema';

const timestamp = (name: string) => integer(name, { mode: 'timestamp_ms' });

/** The private calendar subscription of a musician; regenerating replaces the hash, killing the old link. */
export const calendarFeeds = sqliteTable('calendar_feeds', {
  musicianId: text('musician_id')
    .primaryKey()
    .references(() => musicians.id, { onDelete: 'cascade' }),
  tokenHash: text('token_hash').notNull().unique(),
  createdAt: timestamp('created_at').notNull(),
});

/**
 * The last published form of each calendar event (RFC 5545 UID), so a changed session keeps its UID
 * and gets a higher SEQUENCE instead of a duplicate.
 */
export const calendarEventVersions = sqliteTable(
  'calendar_event_versions',
  {
    uid: text('uid').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    contentHash: text('content_hash').notNull(),
    /** Kept so that a session that disappears can still be published as CANCELLED. */
    startsAt: text('starts_at').notNull(),
    endsAt: text('ends_at').notNull(),
    summary: text('summary').notNull(),
    sequence: integer('sequence').notNull().default(0),
    cancelled: integer('cancelled', { mode: 'boolean' }).notNull().default(false),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (table) => [index('calendar_event_versions_musician_idx').on(table.musicianId)],
);

/** E-mails already sent for an alert or a clearance change, so each goes out once. */
export const notifications = sqliteTable(
  'notifications',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id').references(() => musicians.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    /** What makes it unique, e.g. "gate:2027-03-01:0" or "clearance:<hash>". */
    dedupeKey: text('dedupe_key').notNull().unique(),
    recipient: text('recipient').notNull(),
    sentAt: timestamp('sent_at').notNull(),
  },
  (table) => [index('notifications_musician_idx').on(table.musicianId)],
);

/** Who did what to whom and when: plan edits, overrides, shares, document access. */
export const auditEvents = sqliteTable(
  'audit_events',
  {
    id: text('id').primaryKey(),
    actorId: text('actor_id').references(() => user.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    musicianId: text('musician_id').references(() => musicians.id, { onDelete: 'cascade' }),
    detail: text('detail', { mode: 'json' }).$type<Record<string, unknown>>().notNull().default({}),
    at: timestamp('at').notNull(),
  },
  (table) => [index('audit_events_musician_idx').on(table.musicianId)],
);
