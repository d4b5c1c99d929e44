/**
 * The database tables (drizzle). Rows never leave `db/`: data-access files map them to DTOs.
 * Migrations are generated from this file by drizzle-kit into `drizzle/`.
 */
import { sql } from 'drizzle-orm';
import { pgTable, text, timestamp, integer, jsonb, uniqueIndex, index, primaryKey, pgEnum, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { LayoutDoc } from '../lib/layout/schema';

export const roleEnum = pgEnum('studio_role', ['owner', 'designer', 'client']);
export const unitEnum = pgEnum('length_unit', ['mm', 'cm', 'in']);

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash'),
    /** Bumped on sign-out: session tokens carrying an older number are refused. */
    sessionVersion: integer('session_version').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_email_unique').on(sql`lower(${t.email})`)],
);

export const studios = pgTable('studios', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  /** Preferred display unit for lengths; documents always hold millimetres. */
  units: unitEnum('units').notNull().default('mm'),
  /** Studio-wide check defaults layered under each layout's own settings (walkway width, mattress region…). */
  checkDefaults: jsonb('check_defaults').$type<Record<string, unknown>>().notNull().default({}),
  /** The number of the studio's last quote: quotes are numbered Q-0001, Q-0002… per studio. */
  lastQuoteNumber: integer('last_quote_number').notNull().default(0),
  /** The workshop's details printed on its quotes: address, telephone, mail, company and VAT numbers (lines of text). */
  quoteDetails: text('quote_details').notNull().default(''),
  /** The studio's terms printed on every quote it sends (plain text, paragraphs). */
  quoteTerms: text('quote_terms').notNull().default(''),
  /** How many days a quote stays valid from the day it is sent. */
  quoteValidDays: integer('quote_valid_days').notNull().default(30),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  'memberships',
  {
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    role: roleEnum('role').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.studioId] }), index('memberships_studio').on(t.studioId)],
);

export const layouts = pgTable(
  'layouts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    /** The client the layout is shared with, if any: a user with the `client` role in the same studio. */
    clientId: uuid('client_id').references(() => users.id, { onDelete: 'set null' }),
    name: text('name').notNull(),
    doc: jsonb('doc').$type<LayoutDoc>().notNull(),
    /** Optimistic-concurrency version: a save must name the version it was based on. */
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    /**
     * Set when the layout was archived: it leaves the studio's default list but keeps everything
     * (revisions, quotes, payments, approvals). A layout with a payment can only be archived, never deleted.
     */
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    /** The layout this one was duplicated from as a variant (same bay and client); null for an original. */
    variantOf: uuid('variant_of').references((): AnyPgColumn => layouts.id, { onDelete: 'set null' }),
  },
  (t) => [index('layouts_studio').on(t.studioId), index('layouts_client').on(t.clientId), index('layouts_variant_of').on(t.variantOf)],
);

/**
 * Saved versions: the document as each save left it, so a layout can go back to an earlier one
 * (restored as its newest save; nothing is overwritten). Bounded per layout: the last
 * `SAVED_VERSIONS_KEPT` saves (db/saved-versions.ts) plus every save an issued revision was frozen from.
 */
export const savedVersions = pgTable(
  'saved_versions',
  {
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    name: text('name').notNull(),
    doc: jsonb('doc').$type<LayoutDoc>().notNull(),
    savedBy: uuid('saved_by').references(() => users.id, { onDelete: 'set null' }),
    savedAt: timestamp('saved_at', { withTimezone: true }).notNull().defaultNow(),
    /** The version this save put back, when it was a restore. */
    restoredFrom: integer('restored_from'),
  },
  (t) => [primaryKey({ columns: [t.layoutId, t.version] })],
);

/**
 * Counters for throttles that must hold across app instances (sign-in attempts, mail sent): one
 * row per key, changed only by one atomic upsert (db/throttle.ts), so racing requests cannot
 * all read the same count.
 */
export const throttleCounters = pgTable(
  'throttle_counters',
  {
    key: text('key').primaryKey(),
    /** Attempts (or mails) counted since `windowStart`. */
    count: integer('count').notNull().default(0),
    windowStart: timestamp('window_start', { withTimezone: true }).notNull().defaultNow(),
    /** No further attempt before this moment (growing delays); null while within the free allowance. */
    notBefore: timestamp('not_before', { withTimezone: true }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('throttle_counters_updated').on(t.updatedAt)],
);

/**
 * Password reset links: single use, 30 minutes. Only the SHA-256 of the token is stored; using
 * one ends every session of the account.
 */
export const passwordResets = pgTable(
  'password_resets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('password_resets_token_hash').on(t.tokenHash), index('password_resets_user').on(t.userId)],
);

export * from './schema-sharing';
export * from './schema-files';
export * from './schema-planning';
