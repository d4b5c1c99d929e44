/**
 * Who may see and who may change a layout — the one rule, and the one way to load a layout for
 * someone. A layout is seen by the owners and designers of its studio (the workshop) and by the
 * one client of that studio it is shared with; the workshop may change it, its client may not
 * (403); anyone else — another studio, another client of the same studio — gets "not found" (404,
 * never 403), so a stranger cannot even learn that an id exists. Archiving changes nobody's rights.
 *
 * Every data function that reads a layout, or what hangs off it (revisions, mark-ups, files,
 * quotes, viewer links, sheets), goes through `loadLayoutFor`, or applies `rightsOver` to a row it
 * has already joined to its layout. Lists filter with `visibleLayouts`, the same rule in SQL.
 * Must never return a row to a caller outside db/.
 */
import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { getDb, type Db } from './client';
import { prepared } from './prepared';
import { layouts } from './schema';
import { ForbiddenError, NotFoundError } from './errors';
import { isId } from './ids';
import type { Actor } from './actor';
import type { LayoutDoc } from '../lib/layout/schema';
import { readStoredDoc } from './stored-doc';
import { isWorkshop, mayEditLayout, mayReadLayout, type LayoutOwnership } from './access-rule';

export { isWorkshop, mayEditLayout, mayReadLayout, visibleLayouts, type LayoutOwnership } from './access-rule';

/** For studio-wide workshop work that is not about one layout (clients, invitations, prices): 403 for a client. */
export function requireWorkshop(actor: Actor, what: string): void {
  if (!isWorkshop(actor)) throw new ForbiddenError(`Only the workshop can ${what}.`);
}

export interface Rights {
  /** Owner or designer of the layout's studio: may change it. */
  canEdit: boolean;
  /** The client the layout is shared with. */
  isClient: boolean;
}

export interface RightsOptions {
  /** Refuse (403) unless the actor may change the layout; a string names what they tried ("issue revisions"). */
  forEdit?: boolean | string;
  /** The 404 message, when the row is something hanging off the layout ("No such file."). */
  notFound?: string;
}

const NO_LAYOUT = 'No such layout.';

/**
 * The rule applied to a row already read (a layout, or a row joined to its layout): 404 when the
 * actor may not see it, 403 when `forEdit` and they may not change it; their rights otherwise.
 */
export function rightsOver<R extends LayoutOwnership>(actor: Actor, row: R | undefined | null, options: RightsOptions = {}): asserts row is R {
  if (!row || !mayReadLayout(actor, row)) throw new NotFoundError(options.notFound ?? NO_LAYOUT);
  if (options.forEdit && !mayEditLayout(actor, row)) {
    throw new ForbiddenError(`Only the workshop can ${typeof options.forEdit === 'string' ? options.forEdit : 'change this layout'}.`);
  }
}

function rightsOf(actor: Actor, layout: LayoutOwnership): Rights {
  const canEdit = mayEditLayout(actor, layout);
  return { canEdit, isClient: !canEdit && actor.role === 'client' && layout.clientId === actor.userId };
}

/** A layout as its access check found it: who it belongs to and the caller's rights. */
export interface LayoutAccess extends Rights {
  id: string;
  studioId: string;
  clientId: string | null;
  name: string;
  createdBy: string | null;
  version: number;
  archivedAt: Date | null;
}

declare const editable: unique symbol;
/** Only `loadLayoutFor(…, { forEdit })` makes one: proof, in the types, that the rights were checked for a write. */
export type EditableLayoutAccess = LayoutAccess & { readonly [editable]: true };
export type LayoutAccessWithDoc = LayoutAccess & { doc: LayoutDoc };

export interface LoadOptions {
  /** Read (and migrate, then validate) the stored document too. */
  withDoc?: boolean;
  forEdit?: boolean | string;
}

type Loaded<O extends LoadOptions> = LayoutAccess
  & (O['withDoc'] extends true ? { doc: LayoutDoc } : unknown)
  & (O['forEdit'] extends true | string ? { readonly [editable]: true } : unknown);

const accessColumns = {
  id: layouts.id,
  studioId: layouts.studioId,
  clientId: layouts.clientId,
  name: layouts.name,
  createdBy: layouts.createdBy,
  version: layouts.version,
  archivedAt: layouts.archivedAt,
};

function accessQuery(db: Db) {
  return db.select(accessColumns).from(layouts).where(eq(layouts.id, sql.placeholder('id'))).limit(1).prepare('layout_access');
}

function accessWithDocQuery(db: Db) {
  return db.select({ ...accessColumns, doc: layouts.doc }).from(layouts).where(eq(layouts.id, sql.placeholder('id'))).limit(1).prepare('layout_access_doc');
}

/**
 * The layout `id` for `actor`, or NotFoundError (a malformed id, an unknown one, or one they may
 * not see) or, with `forEdit`, ForbiddenError for the layout's own client. One small query; the
 * document only `withDoc` (a save replaces it, so reading it for a write's rights is wasted work).
 */
export async function loadLayoutFor<O extends LoadOptions = Record<never, never>>(actor: Actor, id: string, options?: O): Promise<Loaded<O>> {
  if (!isId(id)) throw new NotFoundError(NO_LAYOUT);
  const db = await getDb();
  const opts: LoadOptions = options ?? {};
  if (opts.withDoc) {
    const [row] = await prepared(db, 'layout_access_doc', accessWithDocQuery).execute({ id });
    rightsOver(actor, row, opts);
    return { ...row, ...rightsOf(actor, row), doc: readStoredDoc(row.doc) } as unknown as Loaded<O>;
  }
  const [row] = await prepared(db, 'layout_access', accessQuery).execute({ id });
  rightsOver(actor, row, opts);
  return { ...row, ...rightsOf(actor, row) } as unknown as Loaded<O>;
}
