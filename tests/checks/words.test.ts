// The words findings are shown in: one status vocabulary, plain rule names for every id the rules
// emit, and the fold of findings waiting for inputs into one "not yet checked" line.
import { describe, expect, it } from 'vitest';
import { foldWaiting, needsLine, ruleName, statusCounts, statusWord, RULE_NAMES } from '@/lib/checks/words';
import { runChecks } from '@/lib/checks';
import { starterLayout } from '@/lib/layout';
import type { Finding } from '@/lib/checks/types';

describe('status words', () => {
  it('says meets / needs attention / does not meet, never the data ids', () => {
    expect([statusWord('pass'), statusWord('warn'), statusWord('fail')]).toEqual(['Meets', 'Needs attention', 'Does not meet']);
    expect(statusCounts({ fail: 2, warn: 1, pass: 14 })).toBe('2 do not meet, 1 needs attention, 14 meet');
    expect(statusCounts({ fail: 1, warn: 0, pass: 1 }, 3)).toBe('1 does not meet, 1 meets, 3 not yet checked');
    expect(statusCounts({ fail: 0, warn: 0, pass: 0 })).toBe('nothing to report');
  });
});

describe('rule names', () => {
  it('names every rule the engine emits for the starter layouts in plain words', () => {
    for (const id of ['starter-l-lounge', 'starter-rear-bed']) {
      for (const f of runChecks(starterLayout(id)!).findings) {
        expect(RULE_NAMES[f.id], f.id).toBeDefined();
        expect(ruleName(f.id)).not.toMatch(/\./);
      }
    }
  });

  it('falls back to the rule family, never to the id', () => {
    expect(ruleName('power.some-new-rule')).toBe('Power');
    expect(ruleName('unknown')).toBe('Check');
  });
});

describe('findings waiting for inputs', () => {
  const f = (id: string, needs?: Finding['needs']): Finding => ({ id, status: 'warn', message: id, needs });
  it('folds them into one line, each input once, in the order first asked for', () => {
    const folded = foldWaiting([
      f('walkway.width'),
      f('mass.input', [{ label: 'Mass in running order', where: 'weight' }, { label: 'Wheelbase', where: 'weight' }]),
      f('mass.payload', [{ label: 'Wheelbase', where: 'weight' }]),
      f('power.input', [{ label: 'LPG alarm', where: 'gas' }]),
    ]);
    expect(folded.judged.map((x) => x.id)).toEqual(['walkway.width']);
    expect(folded.waiting).toBe(3);
    expect(needsLine(folded.needs)).toBe('Not yet checked — needs: mass in running order, wheelbase, LPG alarm');
  });
});
