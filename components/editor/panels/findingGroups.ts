/**
 * Grouping check findings for the Checks panel: by arrangement (the whole layout first), then by
 * status (fail, warn, pass), with counts for the panel's tab. Pure; never invents findings.
 */
import type { Arrangement } from '@/lib/layout';
import type { Finding, FindingStatus } from '@/lib/checks/types';
import { STATUS_ORDER } from '@/lib/checks/words';

export interface FindingGroup {
  arrangement: Arrangement | 'all';
  byStatus: { status: FindingStatus; findings: Finding[] }[];
}

export function groupFindings(findings: Finding[]): FindingGroup[] {
  const order: (Arrangement | 'all')[] = ['all', 'travel', 'lounge', 'sleep'];
  return order
    .map((arrangement) => {
      const inGroup = findings.filter((f) => (f.arrangement ?? 'all') === arrangement);
      return {
        arrangement,
        byStatus: STATUS_ORDER.map((status) => ({ status, findings: inGroup.filter((f) => f.status === status) })).filter((g) => g.findings.length > 0),
      };
    })
    .filter((g) => g.byStatus.length > 0);
}

export function countByStatus(findings: Finding[]): Record<FindingStatus, number> {
  const c: Record<FindingStatus, number> = { fail: 0, warn: 0, pass: 0 };
  for (const f of findings) c[f.status] += 1;
  return c;
}

/** Modules named by failing findings in the arrangement on show (or by layout-wide ones). */
export function failingModuleIds(findings: Finding[], arrangement: Arrangement): string[] {
  const ids = new Set<string>();
  for (const f of findings) {
    if (f.status !== 'fail' || !f.moduleIds) continue;
    if (f.arrangement && f.arrangement !== arrangement) continue;
    for (const id of f.moduleIds) ids.add(id);
  }
  return [...ids];
}
