import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { sendQuoteBody } from '@/lib/api/planning-bodies';
import { getCurrentQuote, sendQuote } from '@/db/quotes';
import { loadLayoutFor } from '@/db/access';
import { mailQuoteToClient } from '@/server/payments/deposit-mail';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** The layout's current quote (null when none was sent): its studio's workshop and its client. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ quote: await getCurrentQuote(actor, (await params).id) });
});

/** Send a quote priced from the saved layout version named in the body; mails the client. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  await loadLayoutFor(actor, id, { forEdit: 'send a quote' }); // rights before the body is read
  const body = parseWith(sendQuoteBody, await readJson(req));
  const quote = await sendQuote(actor, id, body);
  const mail = await mailQuoteToClient(req, actor, quote);
  return json({ quote, mail }, { status: 201 });
});
