/**
 * The check summary on the sheet: counts by status, then every finding — failures first — with
 * its status in words and a mark (never colour alone), the arrangement, what was measured and
 * needed, and where the rule comes from. When the checks could not run, the sheet says so
 * plainly instead of showing an empty list. Pure.
 */
import type { CheckReport, Finding, FindingStatus } from '../checks/types';
import { STATUS_ORDER as ORDER, STATUS_WORDS, foldWaiting, needsLine, ruleName, statusCounts } from '../checks/words';
import type { ColumnFlow } from './flow';
import { TYPE } from './drafting';
import type { Ink, SheetItem } from './primitives';
import { lineHeight, wrap } from './typography';


/**
 * At most this many findings are written out in full (failures first); the rest are counted, so
 * a layout with thousands of findings still makes a sheet a person can read.
 */
export const MAX_FINDINGS_LISTED = 120;
const MARK: Record<FindingStatus, string> = { fail: 'x', warn: '!', pass: '+' };
const INK: Record<FindingStatus, Ink> = { fail: 'brick', warn: 'ochre', pass: 'moss' };

export function sortFindings(findings: Finding[]): Finding[] {
  return [...findings].sort((a, b) => ORDER.indexOf(a.status) - ORDER.indexOf(b.status) || a.id.localeCompare(b.id));
}

export function countByStatus(findings: Finding[]): Record<FindingStatus, number> {
  const counts = { fail: 0, warn: 0, pass: 0 };
  for (const f of findings) counts[f.status] += 1;
  return counts;
}

export function flowChecks(flow: ColumnFlow, report: CheckReport | null, unavailable?: string): void {
  const size = TYPE.label;
  const lh = lineHeight(size);
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Checks', size: TYPE.heading, font: 'sans-bold' }], lh * 4);
  if (!report) {
    const lines = wrap(`The checks could not be run for this sheet${unavailable ? `: ${unavailable}` : ''}. Open the layout in the editor to see them, and do not build from this sheet until they have been read.`, size, flow.columnWidth);
    flow.place(lines.length * lh + 2, (x, y) => lines.map((t, i) => ({ type: 'text', x, y: y + (i + 1) * lh, text: t, size, ink: 'brick' })));
    return;
  }
  const { judged, needs, waiting } = foldWaiting(report.findings);
  const counts = countByStatus(judged);
  const summary = `${statusCounts(counts, waiting)}${report.ok ? ' — every requirement checked is met or needs attention only.' : ' — put right every requirement that is not met before building.'}`;
  const summaryLines = wrap(summary, size, flow.columnWidth, 'sans-bold');
  flow.place(summaryLines.length * lh + 2, (x, y) => summaryLines.map((t, i) => ({ type: 'text', x, y: y + (i + 1) * lh, text: t, size, font: 'sans-bold' })));
  if (report.findings.length === 0) {
    flow.place(lh, (x, y) => [{ type: 'text', x, y: y + lh, text: 'The checks found nothing to report.', size, ink: 'soft' }]);
    return;
  }
  const sorted = sortFindings(judged);
  const listed = sorted.slice(0, MAX_FINDINGS_LISTED);
  for (const f of listed) {
    const head = [`${MARK[f.status]} ${STATUS_WORDS[f.status].word}`, ruleName(f.id), f.arrangement].filter(Boolean).join(' · ');
    const body = wrap(f.message, size, flow.columnWidth - 3);
    const source = f.source ? wrap(`Source: ${f.source}`, TYPE.small, flow.columnWidth - 3) : [];
    const height = lh * (1 + body.length) + lineHeight(TYPE.small) * source.length + 1.6;
    flow.place(height, (x, y) => {
      const items: SheetItem[] = [{ type: 'text', x, y: y + lh, text: head, size, font: 'sans-bold', ink: INK[f.status] }];
      body.forEach((t, i) => items.push({ type: 'text', x: x + 3, y: y + lh * (i + 2), text: t, size }));
      source.forEach((t, i) => items.push({ type: 'text', x: x + 3, y: y + lh * (body.length + 1) + lineHeight(TYPE.small) * (i + 1), text: t, size: TYPE.small, ink: 'soft' }));
      return items;
    });
  }
  if (sorted.length > listed.length) {
    const rest = countByStatus(sorted.slice(listed.length));
    const lines = wrap(`…and ${sorted.length - listed.length} more findings not listed here (${statusCounts(rest)}). Open the Checks in the editor for all of them.`, size, flow.columnWidth);
    flow.place(lines.length * lh + 2, (x, y) => lines.map((t, i) => ({ type: 'text', x, y: y + (i + 1) * lh, text: t, size, font: 'sans-bold' })));
  }
  if (needs.length > 0) {
    const lines = wrap(`${needsLine(needs)}. Enter them in the build plan.`, size, flow.columnWidth);
    flow.place(lines.length * lh + 2, (x, y) => lines.map((t, i) => ({ type: 'text', x, y: y + (i + 1) * lh, text: t, size, font: i === 0 ? 'sans-bold' : 'sans', ink: 'soft' })));
  }
}
