/**
 * The whole layout document: the one contract between the editor, the server, the check engine and
 * the stored rows. Its parts are in `schema.ts` (shared with the editor, which validates each edit
 * with them); this file adds the name, the version, the build-plan `systems` and the document-wide
 * rules. Older documents are migrated to this version by `parse.ts` before they meet this schema.
 *
 * Must never import React, Konva, Next or the database (lint-enforced).
 */
import * as z from 'zod/mini';
import { baySchema, buildUpSchema, layoutNameSchema, moduleSchema, occupantsSchema, settingsSchema } from './schema';
import { systemsSchema } from './systems';

/** The version this code writes; `parse.ts` steps older documents up to it. */
export const CURRENT_SCHEMA_VERSION = 4;

export const layoutDocSchema = z
  .strictObject({
    schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
    name: layoutNameSchema,
    bay: baySchema,
    buildUp: buildUpSchema,
    occupants: occupantsSchema,
    modules: z.array(moduleSchema).check(z.maxLength(5000, 'at most 5000 modules')),
    settings: z.optional(settingsSchema),
    systems: z.optional(systemsSchema),
  })
  .check(z.superRefine((doc, ctx) => {
    const seen = new Set<string>();
    doc.modules.forEach((m, i) => {
      if (seen.has(m.id)) ctx.addIssue({ code: 'custom', path: ['modules', i, 'id'], message: `module id "${m.id}" is used twice`, input: m.id });
      seen.add(m.id);
    });
  }));
export type LayoutDoc = z.output<typeof layoutDocSchema>;
/** What a caller may send before defaults are filled in. */
export type LayoutDocInput = z.input<typeof layoutDocSchema>;
