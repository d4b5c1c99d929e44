/**
 * fit.outside — modules mounted outside the body, one finding each (the interior fit, walkway,
 * headroom and sleep rules never see them; they count in the mass and axle figures by position):
 *   under the floor  inside the bay's plan (it hangs from the floor pan), clear of the wheel arches
 *                    in plan, and no deeper than the ground-clearance envelope: the load floor's
 *                    height above the road (550 mm unless the layout says) less the ground
 *                    clearance kept (200 mm) — both common practice, no source (SOURCES.underFloor);
 *                    its `height` is how far it hangs below the floor
 *   on the roof      inside the bay's plan; the roof's own load limit is the maker's (a caution)
 *   behind the doors behind the rear of the bay, within its width, projecting no more than 1000 mm
 *                    (SOURCES.rearProjection, from memory): warn beyond, fail when it reaches into the body
 * Work: one pass over the modules, each against at most eight arches. Pure: must never import UI,
 * framework or database code.
 */
import { intervalOverlap } from '../geometry';
import { archBoxes, moduleRect, outsideModules } from '../layout/bay';
import type { LayoutDoc, Module } from '../layout/schema';
import { listNames, mm, moduleName } from './naming';
import { RULE_CONSTANTS, type CheckSettings } from './settings';
import { SOURCES } from './sources';
import type { Finding, FindingStatus } from './types';

export function fitOutside(doc: LayoutDoc, settings: CheckSettings): Finding[] {
  const arches = archBoxes(doc);
  return outsideModules(doc).map((m): Finding => {
    const r = moduleRect(m);
    const base = { id: 'fit.outside' as const, moduleIds: [m.id], unit: 'mm' as const };
    const name = moduleName(m);
    const withinPlan = r.x0 >= 0 && r.x1 <= doc.bay.length && r.y0 >= 0 && r.y1 <= doc.bay.width;
    if (m.mount === 'under-floor') {
      const depthAllowed = settings.floorAboveRoad - RULE_CONSTANTS.groundClearance;
      const overArch = arches.filter((a) => intervalOverlap(r.x0, r.x1, a.rect.x0, a.rect.x1) > 0 && intervalOverlap(r.y0, r.y1, a.rect.y0, a.rect.y1) > 0);
      const problems: string[] = [];
      if (!withinPlan) problems.push(`it reaches outside the floor pan (the bay's ${mm(doc.bay.length)} × ${mm(doc.bay.width)} plan)`);
      if (overArch.length) problems.push(`it is under the ${listNames(overArch.map((a) => `${a.side} wheel arch`))}, where the wheel moves`);
      if (m.height > depthAllowed) problems.push(`it hangs ${mm(m.height)} below the floor, ${mm(m.height - depthAllowed)} more than the ${mm(depthAllowed)} allowed`);
      const status: FindingStatus = problems.length ? 'fail' : 'pass';
      return {
        ...base,
        status,
        measured: m.height,
        required: depthAllowed,
        message: `${name} hangs under the floor: ${problems.length ? problems.join('; ') : `${mm(m.height)} deep, within the ${mm(depthAllowed)} allowed, inside the floor pan and clear of the wheel arches`}. Allowed depth = load floor ${mm(settings.floorAboveRoad)} above the road − ${mm(RULE_CONSTANTS.groundClearance)} ground clearance kept. Fix it to the chassis as the vehicle maker allows. ${SOURCES.underFloor.brief}.`,
        source: SOURCES.underFloor.cite,
      };
    }
    if (m.mount === 'roof') {
      return {
        ...base,
        status: withinPlan ? 'pass' : 'warn',
        measured: 0,
        required: 0,
        message: `${name} sits on the roof${withinPlan ? ', within the bay’s plan' : ', but reaches past the bay’s plan: check it clears the cab and overhangs nothing'}. Its mass counts in the axle loads at its place; keep within the roof load the vehicle maker states (with any rack), and count the height it adds. ${SOURCES.roofLoad.brief}.`,
        source: SOURCES.roofLoad.cite,
      };
    }
    return rearFinding(doc, m, name, base);
  });
}

function rearFinding(doc: LayoutDoc, m: Module, name: string, base: { id: 'fit.outside'; moduleIds: string[]; unit: 'mm' }): Finding {
  const r = moduleRect(m);
  const projection = r.x1 - doc.bay.length;
  const max = RULE_CONSTANTS.rearProjectionMax;
  const intoBody = r.x0 < doc.bay.length;
  const tooWide = r.y0 < 0 || r.y1 > doc.bay.width;
  const status: FindingStatus = intoBody ? 'fail' : projection > max || tooWide ? 'warn' : 'pass';
  const what = intoBody
    ? `reaches ${mm(doc.bay.length - r.x0)} into the body: a module behind the rear doors starts at the rear of the bay (${mm(doc.bay.length)})`
    : `projects ${mm(projection)} behind the rear of the bay${projection > max ? `, more than ${mm(max)}: such a projection must be marked as the road rules require, and may be refused` : `, within ${mm(max)}`}${tooWide ? '; it is wider than the bay: check the lights and plate stay visible' : ''}`;
  return {
    ...base,
    status,
    measured: Math.max(0, projection),
    required: max,
    message: `${name} is behind the rear doors and ${what}. Its mass counts on the axles at its place: behind the rear axle it lightens the front. ${SOURCES.rearProjection.brief}.`,
    source: SOURCES.rearProjection.cite,
  };
}
