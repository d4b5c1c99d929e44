import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { getStudio, updateStudio } from '@/db/studios';
import { settingsSchema } from '@/lib/layout/schema';
import { LENGTH_UNITS } from '@/lib/layout/units';
import { quoteTermsBody } from '@/lib/api/planning-bodies';

export const dynamic = 'force-dynamic';

const studioBody = z.strictObject({
  name: z.string().trim().min(1).max(80).optional(),
  units: z.enum(LENGTH_UNITS).optional(),
  checkDefaults: z.optional(settingsSchema),
  quote: quoteTermsBody.optional(),
});

export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json(await getStudio(actor));
});

/** Owners change the studio's name, preferred units, check defaults and quote terms. */
export const PATCH = handle(async (req) => {
  const actor = await requireActor(req);
  const body = parseWith(studioBody, await readJson(req, 16 * 1024));
  return json(await updateStudio(actor, body));
});
