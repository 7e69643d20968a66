import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { CheckIn } from '../../shared/schemas/check-in';
import type { Passage } from '../../shared/schemas/piece';
import type { PlanSettings } from '../../shared/schemas/plan-settings';
import { user } from './auth-schema';
import { musicians } from './caseload-schema';

const timestamp = (name: string) => integer(name, { mode: 'timestamp_ms' });

/**
 * One version of a musician's plan. Editing an active plan writes a new version and supersedes the
 * old one, so what was prescribed when is never lost. `settings` is validated by PlanSettingsSchema.
 */
export const plans = sqliteTable(
  'plans',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    status: text('status', { enum: ['draft', 'active', 'superseded'] }).notNull(),
    settings: text('settings', { mode: 'json' }).$type<PlanSettings>().notNull(),
    createdById: text('created_by_id')
      .notNull()
      .references(() => user.id),
    createdAt: timestamp('created_at').notNull(),
    activatedAt: timestamp('activated_at'),
  },
  (table) => [
    uniqueIndex('plans_version_idx').on(table.musicianId, table.version),
    // At most one active version per musician.
    uniqueIndex('plans_one_active_idx').on(table.musicianId).where(sql`${table.status} = 'active'`),
    check('plans_status_check', sql`${table.status} in ('draft', 'active', 'superseded')`),
  ],
);

/** A piece of the musician's repertoire; clearance is derived from the plan, never stored. */
export const pieces = sqliteTable(
  'pieces',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    title: text('title').notNull(),
    composer: text('composer').notNull().default(''),
    tier: text('tier', { enum: ['easy', 'moderate', 'demanding'] }).notNull(),
    passages: text('passages', { mode: 'json' }).$type<Passage[]>().notNull().default([]),
    onProgramme: integer('on_programme', { mode: 'boolean' }).notNull().default(false),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [
    index('pieces_musician_idx').on(table.musicianId),
    check('pieces_tier_check', sql`${table.tier} in ('easy', 'moderate', 'demanding')`),
  ],
);

/**
 * What the musician reported: a session's gates, effort and minutes, or a next-morning check.
 * `clientKey` makes a retried upload idempotent.
 */
export const checkIns = sqliteTable(
  'check_ins',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    date: text('date').notNull(),
    kind: text('kind', { enum: ['session', 'next_morning', 'pain_report'] }).notNull(),
    payload: text('payload', { mode: 'json' }).$type<CheckIn>().notNull(),
    clientKey: text('client_key').notNull(),
    recordedAt: timestamp('recorded_at').notNull(),
  },
  (table) => [
    index('check_ins_musician_date_idx').on(table.musicianId, table.date),
    uniqueIndex('check_ins_client_key_idx').on(table.musicianId, table.clientKey),
  ],
);

/** A clinician's decision on the progression (advance, hold, resume, step back, clear a red flag). */
export const planOverrides = sqliteTable(
  'plan_overrides',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    action: text('action', { enum: ['advance', 'hold', 'resume', 'step_back', 'clear_red_flag'] }).notNull(),
    date: text('date').notNull(),
    reason: text('reason').notNull(),
    byUserId: text('by_user_id')
      .notNull()
      .references(() => user.id),
    at: timestamp('at').notNull(),
  },
  (table) => [index('plan_overrides_musician_idx').on(table.musicianId)],
);
