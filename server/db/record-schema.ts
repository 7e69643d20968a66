import { sql } from 'drizzle-orm';
import { check, index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { SETUP_KINDS } from '../../shared/schemas/setup';
import { user } from './auth-schema';
import { musicians } from './caseload-schema';

const timestamp = (name: string) => integer(name, { mode: 'timestamp_ms' });

/** Private clinical notes: the clinician's only, never shown to the musician or a teacher. */
export const clinicalNotes = sqliteTable(
  'clinical_notes',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    authorId: text('author_id')
      .notNull()
      .references(() => user.id),
    body: text('body').notNull(),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [index('clinical_notes_musician_idx').on(table.musicianId)],
);

export { SETUP_KINDS };

/** A modification of the playing setup the clinician prescribes; shown to the musician as a reminder. */
export const setupItems = sqliteTable(
  'setup_items',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: SETUP_KINDS }).notNull(),
    label: text('label').notNull(),
    instructions: text('instructions').notNull().default(''),
    active: integer('active', { mode: 'boolean' }).notNull().default(true),
    createdById: text('created_by_id')
      .notNull()
      .references(() => user.id),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [index('setup_items_musician_idx').on(table.musicianId)],
);

/** A letter, handout or photo of the setup; the file itself is in storage under `storageKey`. */
export const documents = sqliteTable(
  'documents',
  {
    id: text('id').primaryKey(),
    musicianId: text('musician_id')
      .notNull()
      .references(() => musicians.id, { onDelete: 'cascade' }),
    uploadedById: text('uploaded_by_id')
      .notNull()
      .references(() => user.id),
    title: text('title').notNull(),
    fileName: text('file_name').notNull(),
    mimeType: text('mime_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    storageKey: text('storage_key').notNull().unique(),
    visibility: text('visibility', { enum: ['private', 'shared'] }).notNull().default('private'),
    createdAt: timestamp('created_at').notNull(),
  },
  (table) => [
    index('documents_musician_idx').on(table.musicianId),
    check('documents_visibility_check', sql`${table.visibility} in ('private', 'shared')`),
  ],
);
