// The plan writes module labels after every module's body (ModulesLayer → ModuleLabels), so a
// module drawn later never covers an earlier one's name: a body drawn without its label writes no
// text, and the label alone writes the name and nothing of the body.
import { describe, expect, it } from 'vitest';
import { drawModule, drawModuleLabel } from '@/components/editor/canvas/moduleSymbols';
import { recordingContext } from './recorder';

const bench = { kind: 'bench-seat' as const, label: 'Rear bench', length: 1100, width: 550, facing: 'right' as const };

describe('module labels on the plan', () => {
  it('a body drawn without its label writes no text', () => {
    const { ctx, ops } = recordingContext();
    drawModule(ctx, bench, { scale: 0.4, label: false });
    const calls = ops();
    expect(calls).toContain('strokeRect');
    expect(calls).not.toContain('fillText');
  });

  it('the label alone writes the name (and its size) and draws no outline', () => {
    const { ctx, ops } = recordingContext();
    drawModuleLabel(ctx, bench, { scale: 0.4, units: 'mm' });
    const calls = ops();
    expect(calls.filter((c) => c === 'fillText').length).toBeGreaterThanOrEqual(1);
    expect(calls).not.toContain('strokeRect');
  });

  it('drawn whole (as while dragged), the body and its label come together', () => {
    const { ctx, ops } = recordingContext();
    drawModule(ctx, bench, { scale: 0.4, units: 'mm' });
    const calls = ops();
    expect(calls.indexOf('strokeRect')).toBeLessThan(calls.indexOf('fillText'));
  });
});
