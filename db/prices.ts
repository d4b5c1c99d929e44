/**
 * The studio's price list: what each part costs, workshop hours per part, the labour rate and
 * VAT. Owners and designers read it (they price quotes); only the owner changes it; clients
 * never see it (what they see is the frozen quote). A studio that has not set one yet reads as
 * an empty list marked `exists: false` — never as prices of zero.
 * Returns DTOs, never rows.
 */
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from './client';
import { priceLists, users } from './schema';
import { ForbiddenError } from './errors';
import type { Actor } from './actor';
import { requireWorkshop } from './access';
import type { PriceList } from '../lib/planning/parts-list';
import type { PriceListBody } from '../lib/api/planning-bodies';

export interface PriceListDto extends PriceList {
  exists: boolean;
  updatedAt: string | null;
  updatedBy: string | null;
}

/** What an empty list starts from: pounds and the UK standard VAT rate of 20 % (HMRC; from memory). */
export const EMPTY_PRICE_LIST: PriceList = { currency: 'GBP', labourRateMinor: 0, vatPct: 20, items: {} };

/** The stored list of a studio, for pricing inside the data layer (no rights check: callers have done it). */
export async function priceListOfStudio(studioId: string): Promise<PriceList | null> {
  const db = await getDb();
  const [row] = await db.select().from(priceLists).where(eq(priceLists.studioId, studioId)).limit(1);
  if (!row) return null;
  return { currency: row.currency, labourRateMinor: row.labourRateMinor, vatPct: row.vatPct, items: row.items };
}

export async function getPriceList(actor: Actor): Promise<PriceListDto> {
  requireWorkshop(actor, 'see the price list');
  const db = await getDb();
  const [row] = await db
    .select({ list: priceLists, updatedBy: users.name })
    .from(priceLists)
    .leftJoin(users, eq(users.id, priceLists.updatedBy))
    .where(eq(priceLists.studioId, actor.studioId))
    .limit(1);
  if (!row) return { ...EMPTY_PRICE_LIST, items: {}, exists: false, updatedAt: null, updatedBy: null };
  const l = row.list;
  return {
    currency: l.currency,
    labourRateMinor: l.labourRateMinor,
    vatPct: l.vatPct,
    items: l.items,
    exists: true,
    updatedAt: l.updatedAt.toISOString(),
    updatedBy: row.updatedBy ?? null,
  };
}

export function requirePriceListOwner(actor: Actor): void {
  if (actor.role !== 'owner') throw new ForbiddenError('Only the studio owner can change the price list.');
}

/** Replaces the whole list (the settings form always sends all of it). Owner only. */
export async function savePriceList(actor: Actor, input: PriceListBody): Promise<PriceListDto> {
  requirePriceListOwner(actor);
  const db = await getDb();
  const values = {
    currency: input.currency,
    labourRateMinor: input.labourRateMinor,
    vatPct: input.vatPct,
    items: input.items,
    updatedBy: actor.userId,
    updatedAt: new Date(),
  };
  await db
    .insert(priceLists)
    .values({ studioId: actor.studioId, ...values })
    .onConflictDoUpdate({ target: priceLists.studioId, set: values });
  return getPriceList(actor);
}
