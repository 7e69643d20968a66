import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';

const timestamp = (name: string) => integer(name, { mode: 'timestamp_ms' });

/**
 * A musician in one clinician's caseload. The row exists from the invitation on;
 * `userId` is set when the musician accepts and sets a password.
 */
export const musicians = sqliteTable(
  'musicians',
  {
    id: text('id').primaryKey(),
    clinicianId: text('clinician_id')
      .notNull()
      .references(() => user.id, { onDelete: 'restrict' }),
    userId: text('user_id')
      .unique()
      .references(() => user.id, { onDelete: 'set null' }),
    name: text('name').notNull(),
    email: text('email').notNull(),
    instrument: text('instrument').notNull(),
    /** The presenting problem, for the clinician only: body region, side and onset. */
    problemRegion: text('problem_region'),
    problemSide: text('problem_side', { enum: ['left', 'right', 'both', 'midline'] }),
    problemOnset: text('problem_onset'),
    problemSummary: text('problem_summary'),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [index('musicians_clinician_idx').on(table.clinicianId)],
);

/**
 * An e-mailed invitation; only the SHA-256 of its token is stored. For a musician, `musicianId` is the
 * caseload entry the account joins; for a teacher, the musician whose clearance is shared on acceptance.
 */
export const invitations = sqliteTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    role: text('role', { enum: ['musician', 'teacher'] }).notNull(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    invitedById: text('invited_by_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    musicianId: text('musician_id').references(() => musicians.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull().unique(),
    expiresAt: timestamp('expires_at').notNull(),
    acceptedAt: timestamp('accepted_at'),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [
    check('invitations_role_check', sql`${table.role} in ('musician', 'teacher')`),
    check('invitations_musician_check', sql`${table.role} <> 'musician' or ${table.musicianId} is not null`),
  ],
);

/** A musician's consent to show their clearance (never medical detail) to a teacher. */
export const clearanceShares = sqliteTable(
  'clearance_shares',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    teacherId: text('teacher_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [uniqueIndex('clearance_shares_pair_idx').on(table.musicianId, table.teacherId)],
);
