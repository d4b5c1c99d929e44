/**
 * Bay templates (one per common size class) and starter layouts, shipped as JSON in
 * `public/templates`. Imported statically so the server and the new-layout form share them.
 * Values are typical for the class — measure your own van.
 */
import { z } from 'zod';
import { baySchema, type Bay, type BayInput, buildUpSchema, type BuildUp } from './schema';
import { CURRENT_SCHEMA_VERSION, layoutDocSchema, type LayoutDoc } from './document';
import l1h1 from '../../public/templates/bay-l1h1.json';
import l2h1 from '../../public/templates/bay-l2h1.json';
import l2h2 from '../../public/templates/bay-l2h2.json';
import l3h2 from '../../public/templates/bay-l3h2.json';
import l3h3 from '../../public/templates/bay-l3h3.json';
import l4h2 from '../../public/templates/bay-l4h2.json';
import l4h3 from '../../public/templates/bay-l4h3.json';
import starterLounge from '../../public/templates/starter-l-lounge.json';
import starterRearBed from '../../public/templates/starter-rear-bed.json';

export const bayTemplateSchema = z.strictObject({
  templateVersion: z.literal(1),
  id: z.string().regex(/^[a-z0-9-]+$/),
  sizeClass: z.string().regex(/^L[1-4]H[1-3]$/, 'size class as the trade names it, e.g. L2H2'),
  name: z.string().min(1),
  note: z.string().min(1),
  bay: baySchema,
});
export type BayTemplate = z.infer<typeof bayTemplateSchema>;

export const BAY_TEMPLATE_FILES: unknown[] = [l1h1, l2h1, l2h2, l3h2, l3h3, l4h2, l4h3];
export const STARTER_LAYOUT_FILES: Record<string, unknown> = {
  'starter-l-lounge': starterLounge,
  'starter-rear-bed': starterRearBed,
};

export const BAY_TEMPLATES: BayTemplate[] = BAY_TEMPLATE_FILES.map((t) => bayTemplateSchema.parse(t));

export function bayTemplate(id: string): BayTemplate | undefined {
  return BAY_TEMPLATES.find((t) => t.id === id);
}

export function starterLayout(id: string): LayoutDoc | undefined {
  const file = STARTER_LAYOUT_FILES[id];
  return file ? layoutDocSchema.parse(file) : undefined;
}

/** A lining a designer would start from: common practice, no source; edit per van. */
export const DEFAULT_BUILD_UP: BuildUp = buildUpSchema.parse({
  floor: [{ material: 'XPS foam board', thickness: 10 }, { material: 'Plywood', thickness: 12 }, { material: 'Vinyl flooring', thickness: 2 }],
  roof: [{ material: 'Closed-cell foam', thickness: 20 }, { material: 'Plywood lining', thickness: 6 }],
  walls: [{ material: 'Closed-cell foam', thickness: 24 }, { material: 'Plywood lining', thickness: 12 }],
});

/** A new, empty layout in the given bay. */
export function emptyLayout(name: string, bay: BayInput): LayoutDoc {
  return layoutDocSchema.parse({
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name,
    bay,
    buildUp: DEFAULT_BUILD_UP,
    occupants: { standingHeight: 1800, sleepers: [1800, 1650] },
    modules: [],
  });
}

/** The size class a bay is closest to, for the layouts table (e.g. "L2H2"), or "custom". */
export function sizeClassOf(bay: Pick<Bay, 'length' | 'height'>): string {
  let best: { cls: string; d: number } | undefined;
  for (const t of BAY_TEMPLATES) {
    const d = Math.abs(t.bay.length - bay.length) + Math.abs(t.bay.height - bay.height);
    if (!best || d < best.d) best = { cls: t.sizeClass, d };
  }
  return best && best.d <= 250 ? best.cls : 'custom';
}
