import { handle, json, requireActor } from '@/server/api/respond';
import { openDepositCheckout } from '@/server/payments/deposit';
import { asPaymentHttpError } from '@/server/payments/errors';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** The layout's client opens the hosted checkout for the quote's deposit; answers its address. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  try {
    return json(await openDepositCheckout(req, actor, id), { status: 201 });
  } catch (err) {
    throw asPaymentHttpError(err);
  }
});
