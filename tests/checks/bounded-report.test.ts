// The check report stays bounded by the module count, not its square, on the layouts built to
// hurt (tests/hardening/fixtures/adversarial-layouts.ts): at most 40 findings per rule (the last
// one summing up the rest), at most 200 module ids per finding, and a report far under 2 MB.
// Common practice, no source: these caps are our own, documented in DEVELOPERS.md.
import { describe, expect, it } from 'vitest';
import { boundReport, runChecks } from '@/lib/checks';
import type { Finding } from '@/lib/checks/types';
import { ADVERSARIAL_LAYOUTS } from '../hardening/fixtures/adversarial-layouts';

describe.each(ADVERSARIAL_LAYOUTS.map((l) => [l.name, l.make] as const))('%s', (_name, make) => {
  it('answers at most 40 findings per rule, 200 module ids per finding, under 2 MB in all', () => {
    const report = runChecks(make());
    const perRule = new Map<string, number>();
    for (const f of report.findings) perRule.set(f.id, (perRule.get(f.id) ?? 0) + 1);
    expect(Math.max(...perRule.values())).toBeLessThanOrEqual(40);
    expect(Math.max(0, ...report.findings.map((f) => f.moduleIds?.length ?? 0))).toBeLessThanOrEqual(200);
    expect(JSON.stringify(report).length).toBeLessThan(2 * 1024 * 1024);
  }, 30_000);
});

describe('boundReport', () => {
  const many = (n: number, status: (i: number) => Finding['status']): Finding[] =>
    Array.from({ length: n }, (_, i) => ({ id: 'fit.overlap', status: status(i), moduleIds: Array.from({ length: 300 }, (_, k) => `m${i}-${k}`), message: `clash ${i}`, source: 'Layout geometry' }));

  it('keeps 39 findings of a rule, worst first, and sums up the other 61 in a fortieth', () => {
    const out = boundReport(many(100, (i) => (i === 70 ? 'fail' : 'warn')));
    expect(out).toHaveLength(40);
    expect(out.slice(0, 39).map((f) => f.message)).toContain('clash 70'); // the one failure is kept
    const summary = out[39];
    expect(summary.status).toBe('warn');
    expect(summary.measured).toBe(61);
    expect(summary.message).toMatch(/^61 more results of this rule are not listed \(61 to look at\)/);
    expect(summary.moduleIds).toHaveLength(200);
    expect(out.every((f) => (f.moduleIds?.length ?? 0) <= 200)).toBe(true);
  });

  it('leaves a rule with 40 findings or fewer as it is, ids capped', () => {
    const out = boundReport(many(40, () => 'pass'));
    expect(out.map((f) => f.message)).toEqual(Array.from({ length: 40 }, (_, i) => `clash ${i}`));
    expect(out[0].moduleIds).toHaveLength(200);
  });
});
