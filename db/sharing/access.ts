/**
 * Who may do what with a layout's sharing features. A layout is visible to its studio's owners
 * and designers and to the one client it is shared with; anyone else gets "not found" (404), so a
 * stranger cannot even learn that an id exists. Must never return a row to a caller outside db/.
 */
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '../client';
import { layouts, studios } from '../schema';
import { ForbiddenError, NotFoundError } from '../errors';
import { canEditLayouts, mayReadLayout, type Actor } from '../actor';
import type { LayoutDoc } from '../../lib/layout/schema';
import { readStoredDoc } from '../stored-doc';

export const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface LayoutAccess {
  id: string;
  studioId: string;
  clientId: string | null;
  name: string;
  createdBy: string | null;
  version: number;
  doc: LayoutDoc;
  /** Owner or designer of the layout's studio. */
  canEdit: boolean;
  /** The client the layout is shared with. */
  isClient: boolean;
}

/** The layout if the actor may see it; NotFoundError otherwise. */
export async function layoutFor(actor: Actor, layoutId: string): Promise<LayoutAccess> {
  if (!UUID.test(layoutId)) throw new NotFoundError('No such layout.');
  const db = await getDb();
  const [row] = await db
    .select({
      id: layouts.id, studioId: layouts.studioId, clientId: layouts.clientId, name: layouts.name,
      createdBy: layouts.createdBy, version: layouts.version, doc: layouts.doc,
    })
    .from(layouts)
    .where(eq(layouts.id, layoutId))
    .limit(1);
  if (!row || !mayReadLayout(actor, row)) throw new NotFoundError('No such layout.');
  const canEdit = canEditLayouts(actor);
  const isClient = !canEdit;
  return { ...row, doc: readStoredDoc(row.doc), canEdit, isClient };
}

/** As layoutFor, but only owners and designers pass; the layout's client gets 403. */
export async function editableLayoutFor(actor: Actor, layoutId: string, what: string): Promise<LayoutAccess> {
  const layout = await layoutFor(actor, layoutId);
  if (!layout.canEdit) throw new ForbiddenError(`Only the workshop can ${what}.`);
  return layout;
}

export function requireEditor(actor: Actor, what: string): void {
  if (!canEditLayouts(actor)) throw new ForbiddenError(`Only the workshop can ${what}.`);
}

export async function studioName(studioId: string): Promise<string> {
  const db = await getDb();
  const [s] = await db.select({ name: studios.name }).from(studios).where(eq(studios.id, studioId)).limit(1);
  return s?.name ?? 'Your workshop';
}
