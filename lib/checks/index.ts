/**
 * The check engine: `runChecks(doc)` turns a layout document into a CheckReport (DESIGN.md) —
 * fit, walkway, headroom, sleep, egress and travel rules from this folder, then the build-planning
 * findings of `systemChecks(doc)`. `ok` is true when no finding fails.
 *
 * A pure function of its input: no clock, no randomness, no I/O; it must never import UI,
 * framework or database code. It expects a document that passed `parseLayoutDoc` (use
 * `checkLayoutInput` for untrusted input); a rule family that throws on a strange document is
 * reported as a warning naming it, never as a crash.
 */
import { parseLayoutDoc, type FieldIssue } from '../layout/parse';
import type { LayoutDoc, LayoutSettings } from '../layout/schema';
import { CheckContext } from './context';
import { egressSleep } from './egress';
import { fitInside, fitOverlap, fitWheelArch } from './fit';
import { headroomOverhead, headroomStanding } from './headroom';
import { resolveSettings } from './settings';
import { sleepChecks } from './sleep';
import { systemChecks } from './systems';
import { travelSeats } from './travel';
import type { CheckReport, Finding } from './types';
import { WALKWAY_ARRANGEMENTS, walkwayReach, walkwayWidth } from './walkway';

export { resolveSettings, DEFAULT_SETTINGS, RULE_CONSTANTS, type CheckSettings } from './settings';
export { SOURCES } from './sources';
export { MATTRESSES, largestFittingMattress, type Mattress } from './mattress';
export type { CheckReport, Finding, FindingStatus } from './types';

export interface RunChecksOptions {
  /** The studio's defaults, layered under `doc.settings`. */
  studioDefaults?: LayoutSettings;
}

function guarded(family: string, run: () => Finding[]): Finding[] {
  try {
    return run();
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    return [{ id: `${family}.unchecked`, status: 'warn', measured: 0, required: 0, unit: 'rules', message: `The ${family} checks could not be run on this layout (${why}); fix the input and check again.`, source: 'Check engine' }];
  }
}

export function runChecks(doc: LayoutDoc, options: RunChecksOptions = {}): CheckReport {
  const settings = resolveSettings(doc, options.studioDefaults);
  const ctx = new CheckContext(doc, settings);
  const findings: Finding[] = [
    ...guarded('fit', () => [...fitInside(doc, ctx.t), ...fitWheelArch(doc, ctx.t), ...fitOverlap(doc)]),
    ...guarded('walkway', () => WALKWAY_ARRANGEMENTS.flatMap((a) => [walkwayReach(ctx, a), walkwayWidth(ctx, a)])),
    ...guarded('headroom', () => [headroomStanding(ctx), ...WALKWAY_ARRANGEMENTS.flatMap((a) => headroomOverhead(ctx, a))]),
    ...guarded('sleep', () => sleepChecks(ctx)),
    ...guarded('egress', () => egressSleep(ctx)),
    ...guarded('travel', () => [travelSeats(ctx)]),
    ...guarded('systems', () => systemChecks(doc)),
  ];
  return { ok: !findings.some((f) => f.status === 'fail'), findings };
}

export type CheckInputResult = { ok: true; report: CheckReport } | { ok: false; issues: FieldIssue[] };

/** Validates untrusted input (migrating old documents), then runs the checks. Never throws on bad input. */
export function checkLayoutInput(input: unknown, options: RunChecksOptions = {}): CheckInputResult {
  const parsed = parseLayoutDoc(input);
  if (!parsed.ok) return { ok: false, issues: parsed.issues };
  try {
    return { ok: true, report: runChecks(parsed.value, options) };
  } catch (e) {
    return { ok: false, issues: [{ path: 'settings', message: e instanceof Error ? e.message : String(e) }] };
  }
}
