/**
 * Request bodies and query options of the build-planning routes: the studio price list, sending
 * a quote, and the cut-list options the parts list is computed with. Plain zod, shared by the
 * route handlers (which parse with them) and the settings and build-plan forms (which build
 * what they send from the same shapes). Must never import the database or server-only code.
 */
import { z } from 'zod';
import { priceKeyInfo } from '@/lib/planning/price-keys';

const noControl = (s: string) => !/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(s);

export const MAX_PRICE_MINOR = 100_000_000; // 1,000,000.00 in major units: a sanity cap

export const priceEntrySchema = z.strictObject({
  label: z.string().trim().max(80).refine(noControl, 'control characters are not allowed').optional(),
  unit: z.enum(['each', 'm', 'sheet', 'Ah', 'W']),
  priceMinor: z.number().int('whole minor units (pence, cents)').min(0, 'cannot be negative').max(MAX_PRICE_MINOR, 'too large'),
  labourHours: z.number().finite().min(0, 'cannot be negative').max(1000).optional(),
});

export const priceListBody = z
  .strictObject({
    currency: z.string().regex(/^[A-Z]{3}$/, 'a three-letter ISO 4217 code, e.g. GBP'),
    labourRateMinor: z.number().int('whole minor units').min(0).max(MAX_PRICE_MINOR),
    vatPct: z.number().finite().min(0, 'at least 0 %').max(100, 'at most 100 %'),
    items: z.record(z.string().max(40), priceEntrySchema),
  })
  .superRefine((b, ctx) => {
    const keys = Object.keys(b.items);
    if (keys.length > 300) ctx.addIssue({ code: 'custom', path: ['items'], message: 'at most 300 priced items' });
    for (const key of keys) {
      const info = priceKeyInfo(key);
      if (!info) ctx.addIssue({ code: 'custom', path: ['items', key], message: `no parts list asks for "${key}"` });
      else if (b.items[key].unit !== info.unit) ctx.addIssue({ code: 'custom', path: ['items', key, 'unit'], message: `${info.description} is priced per ${info.unit}` });
    }
  });
export type PriceListBody = z.infer<typeof priceListBody>;

export const cutOptionsSchema = z.strictObject({
  kerfMm: z.number().finite().min(0, 'at least 0 mm').max(10, 'at most 10 mm').optional(),
  trimMm: z.number().finite().min(0, 'at least 0 mm').max(50, 'at most 50 mm').optional(),
  respectGrain: z.boolean().optional(),
});
export type CutOptionsBody = z.infer<typeof cutOptionsSchema>;

/**
 * Which copy a document is made from: an issued revision's letter (A, B … AA), or `preliminary`
 * for the layout as last saved. Left out: the latest approved revision, else the latest issued.
 */
export const revisionChoiceSchema = z.union(
  [z.string().regex(/^[A-Z]{1,3}$/), z.literal('preliminary')],
  'a revision letter such as B, or preliminary',
);

/** Line breaks and tabs are fine in terms; other control characters are not. */
const plainText = (max: number, what: string) =>
  z.string().max(max, `${what}: at most ${max} characters`).refine(noControl, `${what}: control characters are not allowed`).transform((t) => t.trim());

/** The studio's quote terms (Settings → Quotes): its details, its terms, and how many days a quote holds. */
export const quoteTermsBody = z.strictObject({
  details: plainText(1000, 'workshop details').optional(),
  terms: plainText(8000, 'terms').optional(),
  validDays: z.number().int('whole days').min(1, 'at least 1 day').max(365, 'at most 365 days').optional(),
});
export type QuoteTermsBody = z.infer<typeof quoteTermsBody>;

/** Cut options from a query string: `?kerf=3&trim=10&grain=0`. */
export const cutOptionsQuery = z
  .strictObject({
    kerf: z.string().regex(/^\d{1,2}(\.\d{1,2})?$/, 'kerf in mm, e.g. 3').optional(),
    trim: z.string().regex(/^\d{1,2}(\.\d{1,2})?$/, 'trim in mm, e.g. 10').optional(),
    grain: z.enum(['0', '1']).optional(),
    format: z.enum(['json', 'csv']).optional(),
    revision: revisionChoiceSchema.optional(),
  })
  .transform((q) => ({
    format: q.format ?? 'json',
    ...(q.revision !== undefined ? { revision: q.revision } : {}),
    cut: {
      ...(q.kerf !== undefined ? { kerfMm: Number(q.kerf) } : {}),
      ...(q.trim !== undefined ? { trimMm: Number(q.trim) } : {}),
      ...(q.grain !== undefined ? { respectGrain: q.grain === '1' } : {}),
    },
  }))
  .pipe(z.object({ format: z.enum(['json', 'csv']), revision: revisionChoiceSchema.optional(), cut: cutOptionsSchema }));

export const sendQuoteBody = z.strictObject({
  /**
   * The layout version of the copy the designer priced (a revision's frozen version, or the
   * saved preliminary's); the quote is refused if that copy is no longer the one chosen.
   */
  layoutVersion: z.number().int().min(1),
  /** The revision to price (default: the latest approved, else the latest issued). */
  revision: revisionChoiceSchema.optional(),
  /** Send although that revision is not approved (or is the preliminary): said on the quote. */
  confirmUnapproved: z.boolean().optional(),
  depositPct: z
    .number()
    .finite()
    .gt(0, 'a deposit above 0 %')
    .max(100, 'at most 100 %')
    .refine((n) => Math.abs(Math.round(n * 100) - n * 100) < 1e-6, 'at most two decimals'),
  note: z.string().trim().max(1000).refine(noControl, 'control characters are not allowed').optional(),
  cut: cutOptionsSchema.optional(),
});
export type SendQuoteBody = z.infer<typeof sendQuoteBody>;
