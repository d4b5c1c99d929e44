/**
 * The key clearances on a plan, exactly as the checks measured them (never measured again here):
 * the clear bed length of each sleeping place drawn as a dimension across the place's modules,
 * and the clear walkway width of the arrangement written under the plan with what it needs.
 * Pure: a report in, sheet items out; must never run a check or render.
 */
import type { Arrangement, LayoutDoc } from '../layout/schema';
import { formatLength, type LengthUnit } from '../layout/units';
import type { CheckReport } from '../checks/types';
import { boundingRect } from '../geometry';
import { footprintRect, modulesIn } from '../layout/bay';
import { dimension } from './drafting';
import type { SheetItem } from './primitives';

/** Sleeping places a plan marks (a van sleeps a handful; a hostile report may list thousands). */
export const CLEARANCE_LIMIT = 12;

export function clearanceItems(
  doc: LayoutDoc,
  arrangement: Arrangement,
  report: CheckReport | null,
  at: { bx: number; by: number; toPaper: (mm: number) => number; units: LengthUnit },
): { items: SheetItem[]; line: string } {
  if (!report) return { items: [], line: '' };
  const here = report.findings.filter((f) => (f.arrangement ?? arrangement) === arrangement && f.unit === 'mm' && typeof f.measured === 'number' && f.measured > 0);
  const items: SheetItem[] = [];
  const byId = new Map(modulesIn(doc, arrangement).map((m) => [m.id, m]));
  const beds = here.filter((f) => f.id === 'sleep.length' && f.moduleIds?.length).slice(0, CLEARANCE_LIMIT);
  beds.forEach((f, i) => {
    const box = boundingRect((f.moduleIds ?? []).map((id) => byId.get(id)).filter((m) => m !== undefined).map(footprintRect));
    if (!box) return;
    const measured = f.measured!;
    // Along the side the measured length lies on: the longer one that holds it.
    const alongX = box.x1 - box.x0 >= box.y1 - box.y0;
    const text = `bed ${formatLength(measured, at.units)}`;
    const tag = `clearance:bed-length:${arrangement}:${i + 1}`;
    if (alongX) {
      const y = at.by + at.toPaper((box.y0 + box.y1) / 2);
      const x0 = at.bx + at.toPaper(box.x0);
      items.push(...dimension({ from: [x0, y], to: [x0 + at.toPaper(measured), y], offset: 0, text, tag }));
    } else {
      const x = at.bx + at.toPaper((box.x0 + box.x1) / 2);
      const y0 = at.by + at.toPaper(box.y0);
      items.push(...dimension({ from: [x, y0], to: [x, y0 + at.toPaper(measured)], offset: 0, text, tag }));
    }
  });
  const walkway = here.find((f) => f.id === 'walkway.width');
  const line = walkway
    ? `Clear walkway ${formatLength(walkway.measured!, at.units)}${walkway.required ? ` (comfortable ${formatLength(walkway.required, at.units)})` : ''}, as checked`
    : '';
  return { items, line };
}
