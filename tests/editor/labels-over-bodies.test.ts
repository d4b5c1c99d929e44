// The plan writes module labels after every module's body (ModulesLayer → ModuleLabels), so a
// module drawn later never covers an earlier one's name: a body drawn without its label writes no
// text, and the label alone writes the name and nothing of the body.
import { describe, expect, it } from 'vitest';
import { drawModule, drawModuleLabel } from '@/components/editor/canvas/moduleSymbols';

/** A 2D context that records the names of the calls made on it. */
function recorder() {
  const calls: string[] = [];
  const ctx = new Proxy({} as Record<string, unknown>, {
    get(target, key: string) {
      if (key in target) return target[key];
      if (key === 'measureText') return (t: string) => ({ width: t.length * 5 });
      if (key === 'createPattern') return () => null;
      return () => { calls.push(key); };
    },
    set(target, key: string, value) { target[key] = value; return true; },
  });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, calls };
}

const bench = { kind: 'bench-seat' as const, label: 'Rear bench', length: 1100, width: 550, facing: 'right' as const };

describe('module labels on the plan', () => {
  it('a body drawn without its label writes no text', () => {
    const { ctx, calls } = recorder();
    drawModule(ctx, bench, { scale: 0.4, label: false });
    expect(calls).toContain('strokeRect');
    expect(calls).not.toContain('fillText');
  });

  it('the label alone writes the name (and its size) and draws no outline', () => {
    const { ctx, calls } = recorder();
    drawModuleLabel(ctx, bench, { scale: 0.4, units: 'mm' });
    expect(calls.filter((c) => c === 'fillText').length).toBeGreaterThanOrEqual(1);
    expect(calls).not.toContain('strokeRect');
  });

  it('drawn whole (as while dragged), the body and its label come together', () => {
    const { ctx, calls } = recorder();
    drawModule(ctx, bench, { scale: 0.4, units: 'mm' });
    expect(calls.indexOf('strokeRect')).toBeLessThan(calls.indexOf('fillText'));
  });
});
