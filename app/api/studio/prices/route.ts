import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { priceListBody } from '@/lib/api/planning-bodies';
import { getPriceList, requirePriceListOwner, savePriceList } from '@/db/prices';

export const dynamic = 'force-dynamic';

/** The studio's price list: owners and designers read it; clients get 403. */
export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json(await getPriceList(actor));
});

/** Replace the whole price list. Owner only. */
export const PUT = handle(async (req) => {
  const actor = await requireActor(req);
  // Rights before parsing, so a designer or client learns nothing from the validation rules.
  requirePriceListOwner(actor);
  const body = parseWith(priceListBody, await readJson(req));
  return json(await savePriceList(actor, body));
});
