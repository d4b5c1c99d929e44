/**
 * Tables for reference uploads attached to layouts: photos of the van and drawings (PDF) a
 * designer works from. The bytes live on disk under BAYWRIGHT_DATA_ROOT with a random name; the
 * row holds the cleaned display name, the content type found by sniffing, and — for images —
 * where the image sits under the plan as a tracing layer (studio-only: never part of the
 * LayoutDoc, so never shown through a viewer link).
 * Re-exported by db/schema.ts so one drizzle schema covers them. Must never import anything but
 * drizzle and plain types.
 */
import { pgTable, text, timestamp, integer, jsonb, uuid, index, uniqueIndex, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { TracingPlacement } from '../lib/tracing/calibration';
// Base tables come from db/schema.ts, which re-exports this file: referenced lazily in callbacks only.
import { layouts, studios, users } from './schema';

export const uploads = pgTable(
  'uploads',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    /** Copied from the layout so a rights check needs no join; a layout never changes studio. */
    studioId: uuid('studio_id').notNull().references((): AnyPgColumn => studios.id, { onDelete: 'cascade' }),
    /** Random file name on disk (128 bits, hex); never derived from anything the uploader sent. */
    storedName: text('stored_name').notNull(),
    /** The uploader's file name, cleaned of paths and control characters; for display and download only. */
    fileName: text('file_name').notNull(),
    /** Found from the file's first bytes, not from what the browser claimed. */
    contentType: text('content_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    /** Where the image sits under the plan; null when it is not placed. Images only. */
    tracing: jsonb('tracing').$type<TracingPlacement>(),
    uploadedBy: uuid('uploaded_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('uploads_layout').on(t.layoutId, t.createdAt), uniqueIndex('uploads_stored_name').on(t.storedName)],
);
