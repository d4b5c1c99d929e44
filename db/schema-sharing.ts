/**
 * Tables for working with clients: revisions and the client's decision on them, viewer links,
 * comments pinned to the plan, client invitations, and the mail the development mail server
 * received. Re-exported by db/schema.ts so one drizzle schema covers them.
 *
 * Secrets (viewer link and invitation tokens) are never stored: only their SHA-256 hash is.
 * Must never import anything but drizzle and the layout document type.
 */
import { sql } from 'drizzle-orm';
import { pgTable, pgEnum, text, timestamp, integer, jsonb, uuid, index, uniqueIndex, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { LayoutDoc } from '../lib/layout/schema';
// The base tables live in db/schema.ts, which re-exports this file: the import is circular, so
// they are only touched inside `references(() => …)` callbacks, which drizzle calls after both load.
import { layouts, studios, users } from './schema';

/** What a client said about a revision. `approved` is final; `changes_asked` may be followed by approval. */
export const decisionEnum = pgEnum('revision_decision', ['approved', 'changes_asked']);

/** A frozen, lettered copy of a layout's document sent to the client: revision A, B, C… */
export const revisions = pgTable(
  'revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    /** 1 for A, 2 for B, … 27 for AA: the letter is derived from it. */
    seq: integer('seq').notNull(),
    letter: text('letter').notNull(),
    note: text('note').notNull().default(''),
    doc: jsonb('doc').$type<LayoutDoc>().notNull(),
    /** The layout version that was frozen. */
    layoutVersion: integer('layout_version').notNull(),
    issuedBy: uuid('issued_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    issuedAt: timestamp('issued_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('revisions_layout_seq').on(t.layoutId, t.seq)],
);

/**
 * The client's answers, append-only: rows are never updated or deleted by the app. At most one
 * approval per revision (partial unique index), so two racing approvals cannot both land.
 */
export const revisionDecisions = pgTable(
  'revision_decisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id').notNull().references((): AnyPgColumn => revisions.id, { onDelete: 'cascade' }),
    decision: decisionEnum('decision').notNull(),
    message: text('message').notNull().default(''),
    decidedBy: uuid('decided_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    /** Name at the time of the decision, so the record survives the account. */
    decidedByName: text('decided_by_name').notNull(),
    decidedAt: timestamp('decided_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('revision_decisions_revision').on(t.revisionId, t.decidedAt),
    uniqueIndex('revision_decisions_one_approval').on(t.revisionId).where(sql`${t.decision} = 'approved'`),
  ],
);

/** A read-only link for someone without an account: the live layout, or one frozen revision. */
export const viewerLinks = pgTable(
  'viewer_links',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    /** Null: live, follows every save. Set: frozen at that revision. */
    revisionId: uuid('revision_id').references((): AnyPgColumn => revisions.id, { onDelete: 'cascade' }),
    /** SHA-256 of the token, hex. The token itself is shown once and never stored. */
    tokenHash: text('token_hash').notNull(),
    label: text('label').notNull().default(''),
    createdBy: uuid('created_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    lastOpenedAt: timestamp('last_opened_at', { withTimezone: true }),
    openCount: integer('open_count').notNull().default(0),
  },
  (t) => [uniqueIndex('viewer_links_token_hash').on(t.tokenHash), index('viewer_links_layout').on(t.layoutId)],
);

/**
 * A comment pinned to a point of the plan (mm, in one arrangement), or a reply to one
 * (`parentId` set, no pin of its own). Only thread roots are resolved.
 */
export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    parentId: uuid('parent_id').references((): AnyPgColumn => comments.id, { onDelete: 'cascade' }),
    arrangement: text('arrangement'),
    x: integer('x'),
    y: integer('y'),
    body: text('body').notNull(),
    authorId: uuid('author_id').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    authorName: text('author_name').notNull(),
    authorRole: text('author_role').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    resolvedBy: uuid('resolved_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    /** Set when the author changes the text, so the other side sees it was edited. */
    editedAt: timestamp('edited_at', { withTimezone: true }),
  },
  (t) => [index('comments_layout').on(t.layoutId, t.createdAt), index('comments_parent').on(t.parentId)],
);

/** The role an invitation gives: owners invite designers and clients, designers invite clients. */
export const invitedRoleEnum = pgEnum('invited_role', ['designer', 'client']);

/**
 * An invitation to join a studio: the invitee sets their own password (new account) or accepts
 * while signed in as the invited address (existing account). Optionally shares one layout.
 */
export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references((): AnyPgColumn => studios.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: invitedRoleEnum('role').notNull().default('client'),
    layoutId: uuid('layout_id').references((): AnyPgColumn => layouts.id, { onDelete: 'set null' }),
    tokenHash: text('token_hash').notNull(),
    invitedBy: uuid('invited_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedUserId: uuid('accepted_user_id').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    lastSentAt: timestamp('last_sent_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('invitations_token_hash').on(t.tokenHash), index('invitations_studio').on(t.studioId, t.createdAt)],
);

/**
 * Mail received by the development mail server (dev/fakes/smtp), shared by every app process on
 * the database. `studioId` comes from the X-Baywright-Studio header our own mail carries.
 */
export const outboxMail = pgTable(
  'outbox_mail',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id'),
    messageId: text('message_id'),
    mailFrom: text('mail_from').notNull(),
    rcptTo: jsonb('rcpt_to').$type<string[]>().notNull(),
    subject: text('subject').notNull().default(''),
    text: text('text').notNull().default(''),
    raw: text('raw').notNull(),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('outbox_mail_received').on(t.receivedAt), index('outbox_mail_studio').on(t.studioId, t.receivedAt)],
);
