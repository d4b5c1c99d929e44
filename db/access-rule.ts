/**
 * The rule of who sees and who changes a layout, on its own: plain functions of the caller and the
 * layout's studio and client, and the same read rule as a SQL filter for lists. `db/access.ts`
 * applies it (loading, 404 / 403); nothing else decides. Must never read the database itself.
 */
import { and, eq, type SQL } from 'drizzle-orm';
import { layouts } from './schema';
import type { Actor } from './actor';

/** Owners and designers: the studio's workshop, who draw, price, share and issue. */
export function isWorkshop(actor: Actor): boolean {
  return actor.role === 'owner' || actor.role === 'designer';
}

/** What the rule needs to know of a layout. */
export interface LayoutOwnership {
  studioId: string;
  clientId: string | null;
}

/** The rule, read side. */
export function mayReadLayout(actor: Actor, layout: LayoutOwnership): boolean {
  if (layout.studioId !== actor.studioId) return false;
  return isWorkshop(actor) || (actor.role === 'client' && layout.clientId === actor.userId);
}

/** The rule, write side: whoever may read it and is of the workshop. */
export function mayEditLayout(actor: Actor, layout: LayoutOwnership): boolean {
  return mayReadLayout(actor, layout) && isWorkshop(actor);
}

/** The read rule as a filter on `layouts`, for lists. */
export function visibleLayouts(actor: Actor): SQL {
  return isWorkshop(actor)
    ? eq(layouts.studioId, actor.studioId)
    : and(eq(layouts.studioId, actor.studioId), eq(layouts.clientId, actor.userId))!;
}
