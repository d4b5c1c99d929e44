/**
 * Rows for the access-control matrix (tests/hardening) covering the build-planning routes: the
 * price list, quotes, the parts list, the deposit checkout and the payment webhook. Each request
 * succeeds for someone entitled to it, with fresh state per call (a new layout and quote where
 * a success would change what the next caller finds). The checkout rows run against a local fake
 * payment API started once in the test process; the webhook rows send a signed event of a type
 * the app does not use, so every caller gets 200 and nothing changes — the signature is the only
 * credential there. Same shape as tests/hardening/access-rows.ts `Row`; spread `PLANNING_ROWS`.
 */
import type { Fixture, Row } from '../hardening/access-rows';
import type { Actor } from '@/db/actor';
import { starterLayout } from '@/lib/layout/templates';
import { demoPriceList } from '../../scripts/lib/demo-prices';

const NOBODY = { anonymous: 401, viewer: 401 } as const;
const READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 200, designer: 200, owner: 200, foreignOwner: 404 };
const WORKSHOP_READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 };
const WEBHOOK_SECRET = 'whsec_matrix_rows';

const designerOf = (fx: Fixture): Actor => ({ userId: fx.world.designer.id, studioId: fx.world.designer.studioId, role: 'designer', email: 'ivo@saltmarsh.test', name: 'Ivo Brandt' });

const clientOf = (fx: Fixture): Actor => ({ userId: fx.world.client.id, studioId: fx.world.client.studioId, role: 'client', email: 'priya@client.test', name: 'Priya Nair' });

async function layoutForClient(fx: Fixture, name: string): Promise<{ id: string; version: number }> {
  const { createLayout } = await import('@/db/layouts');
  const l = await createLayout(designerOf(fx), { name, doc: starterLayout('starter-l-lounge')!, clientId: fx.world.client.id });
  return { id: l.id, version: l.version };
}

let fakeStarted: Promise<void> | null = null;
/** One fake payment API for the whole test process; the app's config is pointed at it. */
function ensureFakePayments(): Promise<void> {
  fakeStarted ??= (async () => {
    const { startFakeStripe } = await import('@/dev/fakes/stripe');
    const { setFakeStripeAddress } = await import('@/server/payments/config');
    const fake = await startFakeStripe({ port: 0 });
    setFakeStripeAddress({ host: '127.0.0.1', port: fake.port });
  })();
  return fakeStarted;
}

let seq = 0;

export const PLANNING_ROWS: Row[] = [
  { route: '/api/studio/prices', method: 'GET', request: () => ({}), expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 200, owner: 200, foreignOwner: 200 } },
  {
    route: '/api/studio/prices', method: 'PUT',
    request: () => ({ json: demoPriceList() }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 200, foreignOwner: 200 },
  },
  { route: '/api/layouts/[id]/quote', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/quote', method: 'POST',
    request: async (fx) => {
      const l = await layoutForClient(fx, `Matrix quote ${seq++}`);
      return { params: { id: l.id }, json: { layoutVersion: l.version, depositPct: 25, confirmUnapproved: true } };
    },
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 201, owner: 201, foreignOwner: 404 },
  },
  {
    // A quote priced from an issued, approved revision (no confirmation needed).
    route: '/api/layouts/[id]/quote', method: 'POST',
    request: async (fx) => {
      const l = await layoutForClient(fx, `Matrix quote of a revision ${seq++}`);
      const { issueRevision, decideRevision } = await import('@/db/sharing/revisions');
      const rev = await issueRevision(designerOf(fx), l.id, { note: 'matrix' });
      await decideRevision(clientOf(fx), l.id, rev.id, { decision: 'approve' });
      return { params: { id: l.id }, json: { layoutVersion: l.version, depositPct: 25, revision: 'A' } };
    },
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 201, owner: 201, foreignOwner: 404 },
  },
  { route: '/api/layouts/[id]/quote/parts', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: WORKSHOP_READ },
  {
    route: '/api/layouts/[id]/quote/pdf', method: 'GET',
    request: async (fx) => {
      const { sendQuote } = await import('@/db/quotes');
      const l = await layoutForClient(fx, `Matrix quote file ${seq++}`);
      await sendQuote(designerOf(fx), l.id, { layoutVersion: l.version, depositPct: 20, confirmUnapproved: true });
      return { params: { id: l.id } };
    },
    expect: READ,
  },
  { route: '/api/layouts/[id]/quote/parts', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId }, path: '/parts?revision=preliminary' }), expect: WORKSHOP_READ },
  {
    route: '/api/layouts/[id]/quote/checkout', method: 'POST',
    request: async (fx) => {
      await ensureFakePayments();
      const { sendQuote } = await import('@/db/quotes');
      const l = await layoutForClient(fx, `Matrix deposit ${seq++}`);
      await sendQuote(designerOf(fx), l.id, { layoutVersion: l.version, depositPct: 20, confirmUnapproved: true });
      return { params: { id: l.id } };
    },
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 201, designer: 403, owner: 403, foreignOwner: 404 },
  },
  {
    route: '/api/payments/webhook', method: 'POST',
    request: async () => {
      process.env.STRIPE_WEBHOOK_SECRET ??= WEBHOOK_SECRET;
      const { signatureHeader } = await import('@/dev/fakes/stripe');
      const body = JSON.stringify({ id: `evt_test_matrix_${seq++}`, object: 'event', type: 'customer.created', data: { object: {} } });
      return { body, headers: { 'content-type': 'application/json', 'stripe-signature': signatureHeader(body, process.env.STRIPE_WEBHOOK_SECRET!) } };
    },
    expect: { anonymous: 200, viewer: 200, foreignClient: 200, otherClient: 200, client: 200, designer: 200, owner: 200, foreignOwner: 200 },
  },
];
