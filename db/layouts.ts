/**
 * Layouts: the studio's plans. Every function takes the Actor and checks rights inside, by the
 * one rule in `db/access.ts` (the workshop reads and writes its studio's layouts; a client reads
 * only the layouts shared with them; anyone else gets "not found"). Returns DTOs, never rows.
 */
import 'server-only';
import { and, desc, eq, isNotNull, isNull, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { getDb, type Db } from './client';
import { prepared } from './prepared';
import { layouts, memberships, payments, quotes, users } from './schema';
import { BadRequestError, ConflictError, ForbiddenError, VersionConflictError } from './errors';
import type { Actor } from './actor';
import { loadLayoutFor, mayEditLayout, mayReadLayout, requireWorkshop, rightsOver, visibleLayouts, type EditableLayoutAccess } from './access';
import { isId } from './ids';
import type { LayoutDoc } from '../lib/layout/schema';
import { sizeClassOf } from '../lib/layout/templates';
import { sharingSummaries, type LayoutSharingSummary } from './sharing/layout-summary';
import { Lru } from '../lib/cache/lru';
import { jsonText, withJsonField, type JsonText } from '../lib/cache/json-text';
import { readStoredDoc } from './stored-doc';
import { recordSave, saveOverVersion } from './saved-version-record';

export interface LayoutSummaryDto {
  id: string;
  name: string;
  client: { id: string; name: string } | null;
  sizeClass: string;
  bay: { length: number; width: number; height: number };
  moduleCount: number;
  version: number;
  updatedAt: string;
  updatedBy: string | null;
  /** When the layout was archived (ISO time); null while it is in use. */
  archivedAt: string | null;
  /** The layout this one is a variant of (its original), if any. */
  variantOf: { id: string; name: string } | null;
  /** In lists only: state with the client and open comment threads (db/sharing). */
  sharing?: LayoutSharingSummary;
}

export interface LayoutDto extends LayoutSummaryDto {
  doc: LayoutDoc;
  createdAt: string;
  canEdit: boolean;
}

const updater = alias(users, 'updater');
const client = alias(users, 'client');
const original = alias(layouts, 'original');

function metaSelect() {
  return {
    id: layouts.id,
    studioId: layouts.studioId,
    name: layouts.name,
    version: layouts.version,
    createdAt: layouts.createdAt,
    updatedAt: layouts.updatedAt,
    clientId: layouts.clientId,
    clientName: client.name,
    updatedByName: updater.name,
    archivedAt: layouts.archivedAt,
    variantOfId: layouts.variantOf,
    variantOfName: original.name,
    variantOfStudioId: original.studioId,
    variantOfClientId: original.clientId,
  };
}

function baseSelect() {
  return { ...metaSelect(), doc: layouts.doc };
}

type MetaRow = {
  id: string;
  studioId: string;
  name: string;
  version: number;
  createdAt: Date;
  updatedAt: Date;
  clientId: string | null;
  clientName: string | null;
  updatedByName: string | null;
  archivedAt: Date | null;
  variantOfId: string | null;
  variantOfName: string | null;
  variantOfStudioId: string | null;
  variantOfClientId: string | null;
};

type Row = MetaRow & { doc: LayoutDoc };

/** What a summary tells of the document itself. */
type DocFacts = Pick<LayoutSummaryDto, 'sizeClass' | 'bay' | 'moduleCount'>;

function docFacts(doc: LayoutDoc): DocFacts {
  return {
    sizeClass: sizeClassOf(doc.bay),
    bay: { length: doc.bay.length, width: doc.bay.width, height: doc.bay.height },
    moduleCount: doc.modules.length,
  };
}

function toSummary(row: Row, actor: Actor): LayoutSummaryDto {
  return summaryOf(row, docFacts(row.doc), actor);
}

/** The original a variant links to, named only to someone who may see it. */
function variantOfFor(row: MetaRow, actor: Actor): LayoutSummaryDto['variantOf'] {
  if (!row.variantOfId || row.variantOfName === null || row.variantOfStudioId === null) return null;
  return mayReadLayout(actor, { studioId: row.variantOfStudioId, clientId: row.variantOfClientId }) ? { id: row.variantOfId, name: row.variantOfName } : null;
}

function summaryOf(row: MetaRow, facts: DocFacts, actor: Actor): LayoutSummaryDto {
  return {
    id: row.id,
    name: row.name,
    client: row.clientId && row.clientName ? { id: row.clientId, name: row.clientName } : null,
    sizeClass: facts.sizeClass,
    bay: facts.bay,
    moduleCount: facts.moduleCount,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: row.updatedByName,
    archivedAt: row.archivedAt ? row.archivedAt.toISOString() : null,
    variantOf: variantOfFor(row, actor),
  };
}

function withoutDoc(row: MetaRow, facts: DocFacts, actor: Actor): Omit<LayoutDto, 'doc'> {
  return { ...summaryOf(row, facts, actor), createdAt: row.createdAt.toISOString(), canEdit: mayEditLayout(actor, row) };
}

function toDto(row: Row, actor: Actor): LayoutDto {
  return { ...withoutDoc(row, docFacts(row.doc), actor), doc: row.doc };
}

/** The layouts in use (default), or with `archived` the archived ones only. */
export async function listLayouts(actor: Actor, options: { archived?: boolean } = {}): Promise<LayoutSummaryDto[]> {
  const db = await getDb();
  const visible = and(visibleLayouts(actor), options.archived ? isNotNull(layouts.archivedAt) : isNull(layouts.archivedAt));
  const rows = await db
    .select(baseSelect())
    .from(layouts)
    .leftJoin(client, eq(client.id, layouts.clientId))
    .leftJoin(updater, eq(updater.id, layouts.updatedBy))
    .leftJoin(original, eq(original.id, layouts.variantOf))
    .where(visible)
    .orderBy(desc(layouts.updatedAt));
  // Summaries read the bay and module count, which every schema version has: no migration needed for a list.
  const summaries = rows.map((r) => toSummary(r, actor));
  const sharing = await sharingSummaries(summaries.map((l) => ({ id: l.id, version: l.version })));
  return summaries.map((l) => ({ ...l, sharing: sharing.get(l.id) }));
}

function layoutByIdQuery(db: Db) {
  return db
    .select(baseSelect())
    .from(layouts)
    .leftJoin(client, eq(client.id, layouts.clientId))
    .leftJoin(updater, eq(updater.id, layouts.updatedBy))
    .leftJoin(original, eq(original.id, layouts.variantOf))
    .where(eq(layouts.id, sql.placeholder('id')))
    .limit(1)
    .prepare('layout_by_id');
}

function layoutMetaByIdQuery(db: Db) {
  return db
    .select(metaSelect())
    .from(layouts)
    .leftJoin(client, eq(client.id, layouts.clientId))
    .leftJoin(updater, eq(updater.id, layouts.updatedBy))
    .leftJoin(original, eq(original.id, layouts.variantOf))
    .where(eq(layouts.id, sql.placeholder('id')))
    .limit(1)
    .prepare('layout_meta_by_id');
}

/**
 * The stored row with the names the DTO shows, if the actor may read it (`rightsOver`, the one
 * rule); NotFoundError otherwise. One joined query: this is the read the editor and the viewer
 * wait for, so it does not go through `loadLayoutFor` first.
 */
async function readable(actor: Actor, id: string): Promise<Row> {
  if (!isId(id)) rightsOver(actor, null);
  const db = await getDb();
  const [row] = await prepared(db, 'layout_by_id', layoutByIdQuery).execute({ id });
  rightsOver(actor, row);
  return { ...row, doc: readStoredDoc(row.doc) };
}

export async function getLayout(actor: Actor, id: string): Promise<LayoutDto> {
  return toDto(await readable(actor, id), actor);
}

/** A stored document as JSON text, with the figures a summary draws from it. */
interface CachedDoc extends DocFacts {
  json: JsonText;
}

/**
 * Documents as JSON text, kept by layout id, version and save time. Only `saveLayout` writes a
 * document, and it always moves both on, so an entry never goes stale — on any number of
 * processes, each with its own cache. Bounded by characters held (default 32 M, about 64 MB).
 */
const docCache = new Lru<string, CachedDoc>(Number(process.env.BAYWRIGHT_DOC_CACHE_CHARS ?? 32_000_000), (d) => d.json.length);

function docKey(row: MetaRow): string {
  return `${row.id}:${row.version}:${row.updatedAt.getTime()}`;
}

function cacheDoc(row: Row): CachedDoc {
  const cached = { ...docFacts(row.doc), json: jsonText(row.doc) };
  docCache.set(docKey(row), cached);
  return cached;
}

/**
 * The same answer as `getLayout`, as JSON text, for the read route. Every call asks the
 * database who may see the layout and which version is current (a small row, no document);
 * the document's text comes from the cache when that version was read before, so a layout
 * read again and again (the editor reopening, a client's live link) is not parsed and
 * serialised again each time.
 */
export async function getLayoutJson(actor: Actor, id: string): Promise<{ version: number; json: string }> {
  if (!isId(id)) rightsOver(actor, null);
  const db = await getDb();
  const [meta] = await prepared(db, 'layout_meta_by_id', layoutMetaByIdQuery).execute({ id });
  rightsOver(actor, meta);
  let row: MetaRow = meta;
  let doc = docCache.get(docKey(meta));
  if (!doc) {
    // Not read at this version before. A save may land in between; then the newer copy (its
    // rights checked again) is the answer.
    const full = await readable(actor, id);
    doc = cacheDoc(full);
    row = full;
  }
  return { version: row.version, json: withJsonField(withoutDoc(row, doc, actor), 'doc', doc.json) };
}

/** For tests. */
export function clearDocCache(): void {
  docCache.clear();
}

async function assertClientOfStudio(studioId: string, clientId: string | null | undefined): Promise<void> {
  if (!clientId) return;
  if (!isId(clientId)) throw new BadRequestError('That client is not a client of this studio.');
  const db = await getDb();
  const [m] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.studioId, studioId), eq(memberships.userId, clientId)))
    .limit(1);
  if (!m || m.role !== 'client') throw new BadRequestError('That client is not a client of this studio.');
}

export async function createLayout(
  actor: Actor,
  input: { name: string; doc: LayoutDoc; clientId?: string | null; variantOf?: string | null },
): Promise<LayoutDto> {
  requireWorkshop(actor, 'create layouts');
  await assertClientOfStudio(actor.studioId, input.clientId);
  const db = await getDb();
  const doc = { ...input.doc, name: input.name };
  const id = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(layouts)
      .values({
        studioId: actor.studioId, clientId: input.clientId ?? null, name: input.name, doc,
        createdBy: actor.userId, updatedBy: actor.userId, variantOf: input.variantOf ?? null,
      })
      .returning({ id: layouts.id, version: layouts.version });
    await recordSave(tx, { layoutId: row.id, version: row.version, name: input.name, doc, savedBy: actor.userId });
    return row.id;
  });
  return getLayout(actor, id);
}

export interface SaveInput {
  doc: LayoutDoc;
  name?: string;
  clientId?: string | null;
}

/** A layout the actor may write: `loadLayoutFor(actor, id, { forEdit: true })`, before the body is read. */
export type EditableLayout = EditableLayoutAccess;

export interface SavedLayoutDto {
  id: string;
  name: string;
  version: number;
  updatedAt: string;
}

/**
 * Saves a new document over version `baseVersion`. The compare-and-set happens in one UPDATE,
 * so of two saves based on the same version exactly one wins; the other gets the current copy.
 */
export async function saveLayout(
  actor: Actor,
  layout: EditableLayout,
  baseVersion: number,
  input: SaveInput,
  options: { restoredFrom?: number } = {},
): Promise<SavedLayoutDto> {
  if (!mayEditLayout(actor, layout)) throw new ForbiddenError('Only the workshop can change this layout.');
  if (input.clientId !== undefined) await assertClientOfStudio(actor.studioId, input.clientId);
  const name = input.name ?? input.doc.name ?? layout.name;
  const doc = { ...input.doc, name };
  const db = await getDb();
  // The save and the saved version it leaves land together, or neither does (one statement).
  const saved = await saveOverVersion(db, {
    layoutId: layout.id,
    studioId: actor.studioId,
    baseVersion,
    name,
    doc,
    clientId: input.clientId,
    savedBy: actor.userId,
    restoredFrom: options.restoredFrom,
  });
  if (!saved) {
    const current = await getLayout(actor, layout.id);
    throw new VersionConflictError({ version: current.version, doc: current.doc, updatedAt: current.updatedAt, updatedBy: current.updatedBy });
  }
  return { id: saved.id, name: saved.name, version: saved.version, updatedAt: saved.updatedAt.toISOString() };
}

/**
 * Renames a layout: a save of its current document under the new name (the name is part of the
 * document and its title block), so it moves the version on and is kept among the saved versions.
 * `baseVersion` is the version the caller saw; without one, the current version.
 */
export async function renameLayout(actor: Actor, id: string, name: string, baseVersion: number | null): Promise<SavedLayoutDto> {
  const layout = await loadLayoutFor(actor, id, { withDoc: true, forEdit: 'rename layouts' });
  return saveLayout(actor, layout, baseVersion ?? layout.version, { doc: layout.doc, name });
}

const VARIANT_SUFFIX = / variant \d{1,6}$/;

/** "Kitchen-forward variant 2", "… variant 3": the first number no layout of the studio carries yet. */
async function nextVariantName(studioId: string, base: string): Promise<string> {
  const db = await getDb();
  const stem = base.replace(VARIANT_SUFFIX, '');
  // Room for " variant 999999" within the 120-character name.
  const short = stem.length > 104 ? stem.slice(0, 104).trimEnd() : stem;
  const prefix = `${short} variant `;
  const like = prefix.replace(/[\\%_]/g, (c) => `\\${c}`) + '%';
  const taken = await db
    .select({ name: layouts.name })
    .from(layouts)
    .where(and(eq(layouts.studioId, studioId), sql`${layouts.name} like ${like}`))
    .limit(2000);
  const used = new Set(taken.map((t) => t.name.slice(prefix.length)));
  let n = 2;
  while (used.has(String(n))) n++;
  return `${prefix}${n}`;
}

/**
 * Duplicates a layout as a variant: its current document under "… variant N", for the same client,
 * linked to its original (a variant of a variant links to the same original). Revisions, mark-ups,
 * files and quotes stay with the layout they belong to. With `doc` (already validated: a proposal
 * for this layout) the variant holds that document instead of a copy.
 */
export async function duplicateAsVariant(actor: Actor, id: string, name?: string, doc?: LayoutDoc): Promise<LayoutDto> {
  const source = await loadLayoutFor(actor, id, { withDoc: true, forEdit: 'duplicate layouts' });
  const db = await getDb();
  const [meta] = await db.select({ variantOf: layouts.variantOf }).from(layouts).where(eq(layouts.id, source.id)).limit(1);
  const variantName = name ?? (await nextVariantName(actor.studioId, source.name));
  return createLayout(actor, { name: variantName, doc: doc ? { ...doc, name: variantName } : source.doc, clientId: source.clientId, variantOf: meta?.variantOf ?? source.id });
}

/**
 * The layouts of one family — the original and its variants — that the actor may see, for the
 * compare page's choice. At most 200.
 */
export async function variantFamily(actor: Actor, id: string): Promise<{ id: string; name: string; archived: boolean }[]> {
  await loadLayoutFor(actor, id);
  const db = await getDb();
  const [meta] = await db.select({ variantOf: layouts.variantOf }).from(layouts).where(eq(layouts.id, id)).limit(1);
  const root = meta?.variantOf ?? id;
  const rows = await db
    .select({ id: layouts.id, name: layouts.name, archivedAt: layouts.archivedAt })
    .from(layouts)
    .where(and(visibleLayouts(actor), or(eq(layouts.id, root), eq(layouts.variantOf, root))))
    .orderBy(layouts.createdAt)
    .limit(200);
  return rows.map((r) => ({ id: r.id, name: r.name, archived: r.archivedAt !== null }));
}

/** Said when a layout that holds money records is to be deleted. */
export const KEEPS_PAYMENTS_MESSAGE =
  'This layout has a quote with a deposit payment, so it cannot be deleted: payment records are kept. Archive it instead; it leaves the list but stays readable.';

/**
 * Whether any quote of the layout has a payment (open, paid) or was paid. Such a layout is never
 * deleted; `payments.quote_id` refuses it in the database too, so a payment opened between this
 * check and the delete still stops it.
 */
async function holdsPayments(db: Db, layoutId: string): Promise<boolean> {
  const [hit] = await db
    .select({ id: quotes.id })
    .from(quotes)
    .leftJoin(payments, eq(payments.quoteId, quotes.id))
    .where(and(eq(quotes.layoutId, layoutId), or(isNotNull(payments.id), eq(quotes.status, 'paid'))))
    .limit(1);
  return Boolean(hit);
}

function isForeignKeyViolation(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (e.code === '23503') return true;
  }
  return false;
}

export async function deleteLayout(actor: Actor, id: string): Promise<void> {
  await loadLayoutFor(actor, id, { forEdit: 'delete layouts' });
  const db = await getDb();
  if (await holdsPayments(db, id)) throw new ConflictError(KEEPS_PAYMENTS_MESSAGE);
  try {
    await db.delete(layouts).where(and(eq(layouts.id, id), eq(layouts.studioId, actor.studioId)));
  } catch (err) {
    if (isForeignKeyViolation(err)) throw new ConflictError(KEEPS_PAYMENTS_MESSAGE);
    throw err;
  }
}

/**
 * Archives (or, with `archived: false`, restores) a layout. Nothing else changes: not the
 * document, its version, revisions, quotes, payments or approvals, so links and caches stay valid.
 */
export async function setLayoutArchived(actor: Actor, id: string, archived: boolean): Promise<LayoutSummaryDto> {
  await loadLayoutFor(actor, id, { forEdit: archived ? 'archive layouts' : 'restore layouts' });
  const db = await getDb();
  await db
    .update(layouts)
    .set({ archivedAt: archived ? sql`coalesce(${layouts.archivedAt}, now())` : null })
    .where(and(eq(layouts.id, id), eq(layouts.studioId, actor.studioId)));
  return toSummary(await readable(actor, id), actor);
}
