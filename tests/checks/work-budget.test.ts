// Bounded work, measured rather than timed: the geometry work a check run spends (its work budget,
// lib/geometry/workBudget.ts) and the size of the report it answers grow at most n log n with the
// module count, on the layouts built to hurt; and when a hostile pile runs a rule family out of
// its budget, that family says it was not checked while every other family still reports.
// The n log n bound is the issue's own goal; the caps are common practice, no source.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { WorkBudget, WorkLimitError } from '@/lib/geometry';
import { maximumDoorsAndArches, maximumOpenings, sleepPileUp, stackedOnOneSpot } from '../hardening/fixtures/adversarial-layouts';

const nLogN = (n: number) => n * Math.log2(n);

describe('WorkBudget', () => {
  it('sizes itself base + perItem · n · log2(n + 2) and stops past its limit', () => {
    // 1,000 items at 500 steps each on a base of 2,000,000: 2,000,000 + 500 · 1000 · log2(1002) = 6,984,184 (rounded).
    expect(WorkBudget.forItems(1000, 500, 2_000_000).limit).toBe(Math.round(2_000_000 + 500_000 * Math.log2(1002)));
    const b = new WorkBudget(10);
    b.spend(10);
    expect(b.left).toBe(0);
    expect(() => b.spend(1)).toThrow(WorkLimitError);
  });
});

describe.each([
  ['all modules on one spot', stackedOnOneSpot],
  ['sleeping surfaces piled up', sleepPileUp],
  ['doors and arches with modules among them', maximumDoorsAndArches],
  ['the most openings (64) with modules under and before them', maximumOpenings],
] as const)('%s', (_name, make) => {
  it('spends work within base + k · n log n and answers bytes that grow at most n log n, 625 to 5,000 modules', () => {
    const sizes = [625, 1250, 2500, 5000];
    const measured = sizes.map((n) => {
      let used = 0;
      const report = runChecks(make(n), { onWork: (w) => (used = w.used) });
      return { n, used, bytes: JSON.stringify(report).length };
    });
    for (const { n, used } of measured) {
      // The allowance CHECK_WORK documents: 2,000,000 + 500 · n · log2(n + 2) steps. A run may pass it
      // by its last charge only (then that family stops): no single charge may be n² sized.
      expect(used).toBeLessThanOrEqual(1.01 * (2_000_000 + 500 * n * Math.log2(n + 2)));
    }
    for (let i = 1; i < measured.length; i++) {
      const [a, b] = [measured[i - 1], measured[i]];
      expect(b.bytes / a.bytes).toBeLessThanOrEqual((nLogN(b.n) / nLogN(a.n)) * 1.05);
    }
  }, 60_000);
});

describe('the most openings the schema takes', () => {
  it('measures every outlet pair once and reports at most 40 findings per clearance rule plus one summing up', () => {
    const report = runChecks(maximumOpenings());
    // 8 exhausts × (16 opening windows + 16 roof openings + 2 doors + 8 fillers) = 336 pairs, so the
    // exhaust rule is capped: 39 listed + 1 summing up the other 297 (REPORT_LIMITS, common practice).
    for (const id of ['clearance.window', 'clearance.roof-opening', 'clearance.exhaust', 'clearance.gas-vent', 'clearance.intake']) {
      const n = report.findings.filter((f) => f.id === id).length;
      expect(n, id).toBeGreaterThan(0);
      expect(n, id).toBeLessThanOrEqual(40);
    }
    const summary = report.findings.filter((f) => f.id === 'clearance.exhaust').at(-1)!;
    expect(summary).toMatchObject({ measured: 336 - 39, unit: 'findings' });
  }, 30_000);
});

describe('a rule family that runs out of work', () => {
  it('is reported as not checked, with the reason, while the other families still report', () => {
    const report = runChecks(sleepPileUp());
    const unchecked = report.findings.filter((f) => f.id.endsWith('.unchecked'));
    expect(unchecked.length).toBeGreaterThan(0);
    for (const f of unchecked) {
      expect(f.status).toBe('warn');
      expect(f.message).toMatch(/^The \w+ checks could not be run on this layout \(it is too complex to check within the work allowed for its size \([\d,]+ steps\)\); fix the input and check again\.$/);
    }
    const families = new Set(report.findings.map((f) => f.id.split('.')[0]));
    for (const family of ['fit', 'walkway', 'headroom', 'travel']) expect(families).toContain(family);
  }, 30_000);
});
