/**
 * The check engine: `runChecks(doc)` turns a layout document into a CheckReport (DESIGN.md) —
 * fit, walkway, headroom, sleep, egress, travel and clearance rules from this folder, then the build-planning
 * findings of `systemChecks(doc)`. `ok` is true when no finding fails.
 *
 * A pure function of its input: no clock, no randomness, no I/O; it must never import UI,
 * framework or database code. It expects a document that passed `parseLayoutDoc` (use
 * `checkLayoutInput` for untrusted input); a rule family that throws on a strange document is
 * reported as a warning naming it, never as a crash.
 */
import { parseLayoutDoc, type FieldIssue } from '../layout/parse';
import type { LayoutDoc, LayoutSettings } from '../layout/schema';
import { interiorOf } from '../layout/bay';
import { clearanceChecks } from './clearance';
import { CheckContext } from './context';
import { egressSleep } from './egress';
import { fitInside, fitOverlap, fitWheelArch } from './fit';
import { fitOutside } from './outside';
import { fitSolar } from './solar';
import { headroomOverhead, headroomStanding } from './headroom';
import { resolveSettings } from './settings';
import { sleepChecks } from './sleep';
import { sleepPlaces } from './places';
import { systemChecks } from './systems';
import { travelSeats } from './travel';
import type { CheckReport, Finding } from './types';
import { WALKWAY_ARRANGEMENTS, walkwayReach, walkwayWidth } from './walkway';

export { resolveSettings, DEFAULT_SETTINGS, RULE_CONSTANTS, type CheckSettings } from './settings';
export { SOURCES } from './sources';
export { CLEARANCE } from './clearance';
export { SOLAR_FIT } from './solar';
export { MATTRESSES, largestFittingMattress, type Mattress } from './mattress';
export type { CheckReport, Finding, FindingStatus } from './types';

export interface RunChecksOptions {
  /** The studio's defaults, layered under `doc.settings`. */
  studioDefaults?: LayoutSettings;
  /** Told the geometry work the run spent against its budget (tests and benchmarks read it). */
  onWork?: (work: { used: number; limit: number }) => void;
}

/**
 * Bounds on the report (common practice, no source): a rule that would say something about every
 * one of thousands of modules lists the first FINDINGS_PER_RULE, worst first, and one more finding
 * sums up the rest; no finding names more than IDS_PER_FINDING modules. So the report grows with
 * the number of rules, not with the module count squared.
 */
export const REPORT_LIMITS = { findingsPerRule: 40, idsPerFinding: 200 } as const;

const RANK = { fail: 2, warn: 1, pass: 0 } as const;

/** Caps each rule's findings and each finding's module list (REPORT_LIMITS). */
export function boundReport(findings: Finding[]): Finding[] {
  const byRule = new Map<string, Finding[]>();
  for (const f of findings) {
    const list = byRule.get(f.id);
    if (list) list.push(f);
    else byRule.set(f.id, [f]);
  }
  const out: Finding[] = [];
  const capIds = (f: Finding): Finding => (f.moduleIds && f.moduleIds.length > REPORT_LIMITS.idsPerFinding ? { ...f, moduleIds: f.moduleIds.slice(0, REPORT_LIMITS.idsPerFinding) } : f);
  for (const [id, list] of byRule) {
    if (list.length <= REPORT_LIMITS.findingsPerRule) {
      out.push(...list.map(capIds));
      continue;
    }
    // Worst first, keeping the rule's own order among equals (a stable sort).
    const ranked = list.map((f, i) => ({ f, i })).sort((a, b) => RANK[b.f.status] - RANK[a.f.status] || a.i - b.i);
    const kept = ranked.slice(0, REPORT_LIMITS.findingsPerRule - 1).sort((a, b) => a.i - b.i).map((x) => capIds(x.f));
    const rest = ranked.slice(REPORT_LIMITS.findingsPerRule - 1).map((x) => x.f);
    const status = rest.reduce<Finding['status']>((s, f) => (RANK[f.status] > RANK[s] ? f.status : s), 'pass');
    const ids: string[] = [];
    for (const f of rest) for (const m of f.moduleIds ?? []) if (ids.length < REPORT_LIMITS.idsPerFinding) ids.push(m);
    const counts = (['fail', 'warn', 'pass'] as const).map((s) => [s, rest.filter((f) => f.status === s).length] as const).filter(([, n]) => n > 0);
    const words = { fail: 'not met', warn: 'to look at', pass: 'met' } as const;
    out.push(...kept, {
      id,
      status,
      ...(ids.length ? { moduleIds: ids } : {}),
      measured: rest.length,
      required: 0,
      unit: 'findings',
      message: `${rest.length} more results of this rule are not listed (${counts.map(([s, n]) => `${n} ${words[s]}`).join(', ')}); fix the ones above and check again to see them.${ids.length ? ' The modules they concern are marked on the plan.' : ''}`,
      source: list[0].source,
    });
  }
  return out;
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
  // The interior rules (fit, walkway, headroom, sleep, egress, travel) see the modules inside the
  // body only; outside-mounted ones have their own fit rule and count in the build-planning figures.
  const ctx = new CheckContext(interiorOf(doc), settings);
  const findings: Finding[] = boundReport([
    ...guarded('fit', () => [...fitInside(ctx.doc, ctx.t), ...fitWheelArch(ctx.doc, ctx.t), ...fitOverlap(ctx.doc), ...fitOutside(doc, settings), ...fitSolar(doc)]),
    ...guarded('walkway', () => WALKWAY_ARRANGEMENTS.flatMap((a) => [walkwayReach(ctx, a), walkwayWidth(ctx, a)])),
    ...guarded('headroom', () => [headroomStanding(ctx), ...WALKWAY_ARRANGEMENTS.flatMap((a) => headroomOverhead(ctx, a))]),
    ...guarded('sleep', () => [...sleepChecks(ctx), ...sleepPlaces(ctx)]),
    ...guarded('egress', () => egressSleep(ctx)),
    ...guarded('travel', () => [travelSeats(ctx)]),
    ...guarded('clearance', () => clearanceChecks(ctx)),
    ...guarded('systems', () => systemChecks(doc)),
  ]);
  options.onWork?.({ used: ctx.budget.used, limit: ctx.budget.limit });
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
