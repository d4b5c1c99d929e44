/**
 * The build-planning section of the plan sheet: mass and axle loads, payload, the power balance
 * by season and water days, one line per topic from `buildPlanSummary` (lib/planning), each with
 * a word for its state (never colour alone) and every number with its unit. Planning figures,
 * not measurements: the section says so. Pure text and its flow onto the sheet.
 */
import type { LayoutDoc } from '../layout';
import { buildPlanSummary } from '../planning/summary';
import { NOT_YET_CHECKED, STATUS_WORDS } from '../checks/words';
import type { ColumnFlow } from './flow';
import { TYPE } from './drafting';
import type { Ink, SheetItem } from './primitives';
import { lineHeight, wrap } from './typography';

const STATE: Record<'ok' | 'attention' | 'unknown', { word: string; ink: Ink }> = {
  ok: { word: `+ ${STATUS_WORDS.pass.word}`, ink: 'moss' },
  attention: { word: `! ${STATUS_WORDS.warn.word}`, ink: 'brick' },
  unknown: { word: `? ${NOT_YET_CHECKED}`, ink: 'soft' },
};

export function flowBuildPlan(flow: ColumnFlow, doc: LayoutDoc): void {
  const size = TYPE.label;
  const lh = lineHeight(size);
  const summary = buildPlanSummary(doc);
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Build plan', size: TYPE.heading, font: 'sans-bold' }], lh * 3);
  for (const line of summary.lines) {
    const state = STATE[line.status];
    const body = wrap(line.text, size, flow.columnWidth - 3);
    flow.place(lh * (1 + body.length) + 1.2, (x, y) => {
      const items: SheetItem[] = [{ type: 'text', x, y: y + lh, text: `${line.topic} · ${state.word}`, size, font: 'sans-bold', ink: state.ink }];
      body.forEach((t, i) => items.push({ type: 'text', x: x + 3, y: y + lh * (i + 2), text: t, size }));
      return items;
    });
  }
  const note = wrap('Planning figures from the layout and the entered vehicle data (lever rule; EN 1646-2 user payload; energy balance with the default solar losses of NREL report NREL/TP-6A20-62641; NZS 5465 self-containment water, with days between fills as a comfort estimate). Sources and their strength in the build plan. Weigh the finished van.', TYPE.small, flow.columnWidth);
  flow.place(lineHeight(TYPE.small) * note.length + 1, (x, y) => note.map((t, i) => ({ type: 'text', x, y: y + lineHeight(TYPE.small) * (i + 1), text: t, size: TYPE.small, ink: 'soft' })));
}
