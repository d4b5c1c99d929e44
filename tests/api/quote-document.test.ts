// The quote as a document: the studio's quote terms in settings (owner only, validated), frozen
// onto each quote when it is sent with a validity date, and the quote's PDF — read back with the
// PDF test reader — carrying the workshop's details, the revision, the date it holds until, the
// totals, the terms and the plan sheet's safety cautions.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as studioRoute from '@/app/api/studio/route';
import * as quoteRoute from '@/app/api/layouts/[id]/quote/route';
import * as quotePdf from '@/app/api/layouts/[id]/quote/pdf/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import * as revisionsRoute from '@/app/api/layouts/[id]/revisions/route';
import * as prices from '@/app/api/studio/prices/route';
import { studios } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, sessionCookie, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { readPdf } from '../sheet/read-pdf';
import { demoPriceList } from '../../scripts/lib/demo-prices';

let db: Db;
let w: World;

const DETAILS = 'Unit 4, Quay Road, Saltmarsh\nTelephone 01234 567890\nVAT no. GB 123 4567 89';
const TERMS = 'The deposit secures a workshop slot.\nThe balance is due on handover.';

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  expect((await call(prices.PUT, { method: 'PUT', as: w.owner, json: demoPriceList() })).status).toBe(200);
});

const patch = (as: SessionUser | null, json: unknown) => call(studioRoute.PATCH, { method: 'PATCH', as, json });
const storedTerms = async () => (await db.select({ d: studios.quoteDetails, t: studios.quoteTerms, v: studios.quoteValidDays }).from(studios).where(eq(studios.id, w.owner.studioId)))[0];

async function pdfOf(as: SessionUser | null, id: string) {
  const headers: Record<string, string> = { host: 'localhost:3000' };
  if (as) headers.cookie = await sessionCookie(as);
  const res = await quotePdf.GET(new Request(`http://localhost:3000/api/layouts/${id}/quote/pdf`, { headers }), { params: Promise.resolve({ id }) });
  return { status: res.status, headers: res.headers, bytes: new Uint8Array(await res.arrayBuffer()) };
}

describe('quote terms in settings', () => {
  it('starts empty, holding quotes for 30 days', async () => {
    const res = await call(studioRoute.GET, { as: w.designer });
    expect(res.body.quote).toEqual({ details: '', terms: '', validDays: 30 });
  });

  it('lets the owner set the details, the terms and the days a quote holds', async () => {
    const res = await patch(w.owner, { quote: { details: DETAILS, terms: TERMS, validDays: 14 } });
    expect(res.status).toBe(200);
    expect(res.body.quote).toEqual({ details: DETAILS, terms: TERMS, validDays: 14 });
    expect(await storedTerms()).toEqual({ d: DETAILS, t: TERMS, v: 14 });
  });

  it('refuses designers and clients (403), strangers change only their own studio, and anonymous callers get 401', async () => {
    for (const who of [w.designer, w.client]) expect((await patch(who, { quote: { terms: 'Mine now' } })).status).toBe(403);
    expect((await patch(null, { quote: { terms: 'Mine now' } })).status).toBe(401);
    expect((await patch(w.foreignOwner, { quote: { terms: 'Harbour terms' } })).status).toBe(200);
    expect((await storedTerms()).t).toBe(TERMS);
  });

  it.each([
    ['no days', { validDays: 0 }],
    ['more than a year', { validDays: 366 }],
    ['part days', { validDays: 1.5 }],
    ['days as text', { validDays: '14' }],
    ['terms too long', { terms: 'x'.repeat(8001) }],
    ['details too long', { details: 'x'.repeat(1001) }],
    ['a control character', { terms: 'Deposit\u0007' }],
    ['an unknown field', { footer: 'x' }],
  ])('refuses %s with 400 and a message, changing nothing', async (_name, quote) => {
    const res = await patch(w.owner, { quote });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/^[A-Z][^\n]{9,}$/); // a sentence a person can act on, not a code
    expect(await storedTerms()).toEqual({ d: DETAILS, t: TERMS, v: 14 });
  });
});

describe('the quote as a document', () => {
  const id = () => w.clientLayoutId;
  let sent: { reference: string; sentAt: string; validUntil: string };

  it('answers 404 for the PDF before a quote is sent, and hides it from strangers', async () => {
    expect((await pdfOf(w.client, id())).status).toBe(404);
    expect((await pdfOf(null, id())).status).toBe(401);
  });

  it('freezes the terms, the details and a validity date onto the quote when it is sent', async () => {
    const layout = await call(layoutRoute.GET, { params: { id: id() }, as: w.designer });
    const issued = await call(revisionsRoute.POST, { method: 'POST', params: { id: id() }, as: w.designer, json: { note: 'For pricing' } });
    expect(issued.status).toBe(201);
    const res = await call(quoteRoute.POST, {
      method: 'POST', params: { id: id() }, as: w.designer,
      json: { layoutVersion: layout.body.version, revision: 'A', depositPct: 25, confirmUnapproved: true },
    });
    expect(res.status).toBe(201);
    const q = res.body.quote;
    expect(q).toMatchObject({ terms: TERMS, workshopDetails: DETAILS, revision: { letter: 'A', approved: false } });
    // 14 days of 86,400,000 ms from the moment it was sent.
    expect(Date.parse(q.validUntil) - Date.parse(q.sentAt)).toBe(14 * 86_400_000);
    sent = q;
    // Later changes to the settings do not reach a quote already sent.
    expect((await patch(w.owner, { quote: { terms: 'New terms for later quotes' } })).status).toBe(200);
    const again = await call(quoteRoute.GET, { params: { id: id() }, as: w.client });
    expect(again.body.quote.terms).toBe(TERMS);
  });

  it('prints the workshop, the revision, the validity date, the totals, the terms and the cautions in its PDF', async () => {
    const res = await pdfOf(w.client, id());
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(new RegExp(`quote ${sent.reference}\\.pdf`));
    const read = await readPdf(res.bytes);
    // A4 portrait: 210 × 297 mm is 595.3 × 841.9 pt (1 pt = 25.4 / 72 mm).
    expect(read.pages[0].width).toBeCloseTo(595.3, 0);
    expect(read.pages[0].height).toBeCloseTo(841.9, 0);
    const text = read.pages.map((p) => p.text).join(' ');
    for (const words of ['Saltmarsh Van Works', `Quote ${sent.reference}`, 'Unit 4, Quay Road, Saltmarsh', 'VAT no. GB 123 4567 89', 'Priced from revision A',
      'Revision A had not been approved when this quote was sent', 'Valid until', 'The deposit secures a workshop slot.', 'The balance is due on handover.',
      'Safety cautions', 'Gas', 'Weight limits', 'Deposit (25 %)', 'Total', 'Priya Nair']) {
      expect(text, words).toContain(words);
    }
    expect(text).not.toContain('New terms for later quotes');
    expect(read.pages[read.pages.length - 1].text).toMatch(new RegExp(`Page ${read.pages.length} of ${read.pages.length}`));
    for (const who of [w.designer, w.owner]) expect((await pdfOf(who, id())).status).toBe(200);
    for (const who of [w.otherClient, w.foreignOwner]) expect((await pdfOf(who, id())).status).toBe(404);
  });
});
