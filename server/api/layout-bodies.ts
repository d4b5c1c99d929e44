/**
 * Request bodies of the layout routes. A new layout starts from exactly one of: a posted
 * document (import, "keep mine as a copy"), a bay template, a starter layout or a custom bay.
 */
import { z } from 'zod';
import { baySchema, layoutNameSchema, type LayoutDoc } from '@/lib/layout/schema';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { bayTemplate, emptyLayout, starterLayout } from '@/lib/layout/templates';
import { invalid } from './respond';
import { idField } from '@/db/ids';

const name = layoutNameSchema;
const clientId = idField('choose a client from the list').nullable().optional();

export const createLayoutBody = z
  .strictObject({
    name,
    clientId,
    doc: z.unknown().optional(),
    bayTemplateId: z.string().max(40).optional(),
    starterId: z.string().max(40).optional(),
    bay: z.optional(baySchema),
  })
  .refine((b) => [b.doc, b.bayTemplateId, b.starterId, b.bay].filter((v) => v !== undefined).length === 1, {
    message: 'start from exactly one of: doc, bayTemplateId, starterId or bay',
    path: ['doc'],
  });
export type CreateLayoutBody = z.infer<typeof createLayoutBody>;

export function docForNewLayout(body: CreateLayoutBody): LayoutDoc {
  if (body.doc !== undefined) {
    const parsed = parseLayoutDoc(body.doc);
    if (!parsed.ok) throw invalid(parsed.issues.map((i) => ({ path: i.path ? `doc.${i.path}` : 'doc', message: i.message })));
    return { ...parsed.value, name: body.name };
  }
  if (body.starterId !== undefined) {
    const starter = starterLayout(body.starterId);
    if (!starter) throw invalid([{ path: 'starterId', message: 'no such starter layout' }]);
    return { ...starter, name: body.name };
  }
  if (body.bayTemplateId !== undefined) {
    const template = bayTemplate(body.bayTemplateId);
    if (!template) throw invalid([{ path: 'bayTemplateId', message: 'no such bay template' }]);
    return emptyLayout(body.name, template.bay);
  }
  return emptyLayout(body.name, body.bay!);
}

export const saveLayoutBody = z.strictObject({
  doc: z.unknown(),
  name: z.optional(name),
  clientId,
});

/** `If-Match: 7` or `If-Match: "7"`: the version the edit was based on. */
export function baseVersionFrom(req: Request): number | null {
  const raw = req.headers.get('if-match');
  if (raw === null) return null;
  const m = /^\s*(?:W\/)?"?(\d{1,9})"?\s*$/.exec(raw);
  return m ? Number(m[1]) : NaN;
}

/**
 * Duplicating a layout as a variant: `{}` names it "… variant N"; `{ name }` names it so; `{ doc }`
 * makes the variant from that document (a proposal for this layout) instead of a copy, validated as
 * every incoming document is (`variantDoc`).
 */
export const variantBody = z.strictObject({ name: z.optional(name), doc: z.unknown().optional() });

/** A variant's body may carry a whole document: 2 MB holds a very large layout; more is refused with 413. */
export const MAX_VARIANT_BODY_BYTES = 2 * 1024 * 1024;

/** The posted document of a variant, parsed and migrated, or undefined for a copy; field issues → 400. */
export function variantDoc(body: z.infer<typeof variantBody>): LayoutDoc | undefined {
  if (body.doc === undefined) return undefined;
  const parsed = parseLayoutDoc(body.doc);
  if (!parsed.ok) throw invalid(parsed.issues.map((i) => ({ path: i.path ? `doc.${i.path}` : 'doc', message: i.message })));
  return parsed.value;
}

/** Renaming a layout (PATCH /api/layouts/:id). */
export const renameLayoutBody = z.strictObject({ name });

/** A saved version's number in a path: a whole number from 1. */
export const savedVersionParam = z.coerce.number({ error: 'a saved version is a whole number' }).int('a saved version is a whole number').min(1).max(999_999_999);

/** Which arrangement and which saved version a plan thumbnail draws. */
export const thumbnailQuery = z.strictObject({
  version: z.optional(savedVersionParam),
  arrangement: z.optional(z.enum(['travel', 'lounge', 'sleep'])),
});

/** The other layout of a variant comparison (`?with=<layout id>`). */
export const compareVariantsQuery = z.strictObject({ with: idField('choose the layout to compare with') });
