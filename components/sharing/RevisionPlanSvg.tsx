/**
 * One side of a revision comparison: a small to-scale plan (SVG in millimetres) of the bay — bare
 * metal outline, the lined interior, wheel arches, the cab arrow — with the modules of one
 * arrangement. On the later side, what changed is marked the drafting way: a revision cloud
 * round each added, moved, resized or edited module (round where a removed one stood), a delta
 * triangle carrying the revision letter beside each cloud, and the earlier place of a moved or
 * resized module (and a removed one) in phantom lines. The bay's openings are drawn too — windows
 * as a pane on the wall line, roof openings dashed overhead, body points as a small ring — and are
 * marked like modules when added, removed, moved or resized. Between two variants (no `letter`) the
 * clouds mark what differs, without triangles. The earlier side is drawn as it was
 * issued, unmarked. Presentation only: no fetching, no editing.
 */
import type { Arrangement, Bay, LayoutDoc, Opening } from '@/lib/layout/schema';
import { moduleName } from '@/lib/layout/revision-words';
import { openingTitle } from '@/lib/layout/openings';
import { BODY_POINT_HALF as POINT_HALF, openingPlanRect, PANE_DEPTH_MIN } from '@/lib/layout/openings';
import type { RevisionDiff } from '@/lib/layout/revision-diff';
import { boundingRect, deltaTriangle, revisionCloud, type Rect } from '@/lib/geometry';
import { archBoxes, buildUpThickness, inArrangement, linedInterior, modulesIn, moduleRect as rectOf } from '@/lib/layout/bay';
import { palette } from '@/lib/look';

export type PlanSide = 'from' | 'to';

const INK = palette.ink;
const FAINT = palette.inkFaint;
const CLOUD = palette.copper;

const pointsAttr = (pts: [number, number][]) => pts.map(([x, y]) => `${x.toFixed(1)},${y.toFixed(1)}`).join(' ');

export interface RevisionMark {
  id: string;
  name: string;
  what: 'added' | 'removed' | 'changed';
  area: Rect;
  /** Where a moved, resized or removed module (or opening) stood, drawn in phantom lines. */
  was: Rect | null;
}

/** The clouds one arrangement needs on the later side; openings are in every arrangement. */
export function revisionMarks(diff: RevisionDiff, arrangement: Arrangement, bay?: Pick<Bay, 'length' | 'width' | 'doors'>, paneDepth = PANE_DEPTH_MIN): RevisionMark[] {
  const marks: RevisionMark[] = [];
  for (const m of diff.added) if (inArrangement(m, arrangement)) marks.push({ id: m.id, name: moduleName(m), what: 'added', area: rectOf(m), was: null });
  for (const m of diff.removed) if (inArrangement(m, arrangement)) marks.push({ id: m.id, name: moduleName(m), what: 'removed', area: rectOf(m), was: rectOf(m) });
  for (const c of diff.changed) {
    const here = inArrangement(c.after, arrangement);
    const there = inArrangement(c.before, arrangement);
    if (!here && !there) continue;
    const placed = c.moved || c.resized;
    const area = here && there && placed ? boundingRect([rectOf(c.before), rectOf(c.after)])! : rectOf(here ? c.after : c.before);
    marks.push({ id: c.id, name: moduleName(c.after), what: 'changed', area, was: placed && there ? rectOf(c.before) : !here ? rectOf(c.before) : null });
  }
  if (!bay || !diff.openings) return marks;
  const at = (o: Opening) => openingPlanRect(bay, o, paneDepth);
  const key = (id: string) => `opening:${id}`;
  for (const o of diff.openings.added) {
    const r = at(o);
    if (r) marks.push({ id: key(o.id), name: openingTitle(bay, o), what: 'added', area: r, was: null });
  }
  for (const o of diff.openings.removed) {
    const r = at(o);
    if (r) marks.push({ id: key(o.id), name: openingTitle(bay, o), what: 'removed', area: r, was: r });
  }
  for (const c of diff.openings.changed) {
    const now = at(c.after);
    const then = at(c.before);
    if (!now && !then) continue;
    const placed = Boolean(c.moved || c.resized);
    const area = now && then && placed ? boundingRect([now, then])! : (now ?? then)!;
    marks.push({ id: key(c.id), name: openingTitle(bay, c.after), what: 'changed', area, was: placed && then ? then : null });
  }
  return marks;
}

export function RevisionPlanSvg({ doc, diff, side, arrangement, title, letter }: { doc: LayoutDoc; diff: RevisionDiff; side: PlanSide; arrangement: Arrangement; title: string; letter: string }) {
  const { length, width } = doc.bay;
  const pad = Math.max(length, width) * 0.09;
  const font = Math.max(40, width / 28);
  const lined = linedInterior(doc);
  const modules = modulesIn(doc, arrangement);
  const paneDepth = Math.max(PANE_DEPTH_MIN, buildUpThickness(doc).wallT);
  const marks = side === 'to' ? revisionMarks(diff, arrangement, doc.bay, paneDepth) : [];
  const openings = doc.bay.openings ?? [];
  const tri = font * 2;

  return (
    <figure className="panel overflow-hidden" data-side={side}>
      <figcaption className="border-b border-paper-edge px-3 py-2 text-sm font-medium">{title}</figcaption>
      <svg
        viewBox={`${-pad} ${-pad} ${length + 2 * pad} ${width + 2 * pad}`}
        className="block h-auto w-full bg-paper"
        role="img"
        aria-label={`${title}: plan of the ${arrangement} arrangement, ${modules.length} modules, ${openings.length} openings, bay ${length} by ${width} mm${marks.length ? `, ${marks.length} revision clouds` : ''}`}
      >
        {/* bare metal */}
        <rect x={0} y={0} width={length} height={width} fill="none" stroke={INK} strokeWidth={font / 4} />
        {/* lined interior */}
        {lined.y0 > 0 && <rect x={lined.x0} y={lined.y0} width={lined.x1 - lined.x0} height={Math.max(0, lined.y1 - lined.y0)} fill="none" stroke={FAINT} strokeWidth={font / 12} strokeDasharray={`${font / 2} ${font / 3}`} />}
        {archBoxes(doc).map(({ rect: r }, i) => (
          <rect key={i} x={r.x0} y={r.y0} width={r.x1 - r.x0} height={r.y1 - r.y0} fill={palette.paperDeep} stroke={FAINT} strokeWidth={font / 12} />
        ))}
        {/* the cab is at x = 0 */}
        <path d={`M ${-pad * 0.2} ${width / 2 - font} L ${-pad * 0.7} ${width / 2} L ${-pad * 0.2} ${width / 2 + font} Z`} fill={INK} />
        {/* where changed modules were, in phantom lines (long dash, two short) */}
        {marks.filter((k) => k.was).map((k) => (
          <rect key={`was-${k.id}`} data-phantom={k.id} x={k.was!.x0} y={k.was!.y0} width={k.was!.x1 - k.was!.x0} height={k.was!.y1 - k.was!.y0} fill="none" stroke={INK} strokeWidth={font / 14}
            strokeDasharray={`${font * 0.9} ${font / 5} ${font / 5} ${font / 5} ${font / 5} ${font / 5}`} opacity={0.6} />
        ))}
        {modules.map((m) => (
          <g key={m.id} data-module-id={m.id}>
            <rect x={m.x} y={m.y} width={m.length} height={m.width} fill={palette.paper} stroke={INK} strokeWidth={font / 12} />
            <text x={m.x + m.length / 2} y={m.y + m.width / 2} fontSize={font} textAnchor="middle" dominantBaseline="middle" fill={INK} fontFamily="var(--font-text), sans-serif">
              {moduleName(m)}
            </text>
          </g>
        ))}
        {openings.map((o) => {
          const r = openingPlanRect(doc.bay, o, paneDepth);
          if (!r) return null;
          if (o.type === 'body-point') {
            return <circle key={o.id} data-opening-id={o.id} cx={(r.x0 + r.x1) / 2} cy={(r.y0 + r.y1) / 2} r={POINT_HALF * 0.6} fill={palette.white} stroke={INK} strokeWidth={font / 14} />;
          }
          return (
            // A window: a pane on the wall line (two thin lines, the glass); a roof opening: dashed, it is overhead.
            <rect key={o.id} data-opening-id={o.id} x={r.x0} y={r.y0} width={r.x1 - r.x0} height={r.y1 - r.y0}
              fill={o.type === 'window' ? palette.white : 'none'} stroke={INK} strokeWidth={o.type === 'window' ? font / 8 : font / 12}
              strokeDasharray={o.type === 'roof-opening' ? `${font / 2} ${font / 4}` : undefined} />
          );
        })}
        {marks.map((k) => {
          const cloud = revisionCloud(k.area, { margin: font * 0.6, arc: font * 2.4, bulge: 0.28 });
          const right = Math.max(...cloud.map((p) => p[0]));
          const top = Math.min(...cloud.map((p) => p[1]));
          const [cx, cy] = [right + tri * 0.15, top + tri * 0.2];
          return (
            <g key={`cloud-${k.id}`} data-cloud={k.id} data-mark={k.what}>
              <polygon points={pointsAttr(cloud)} fill="none" stroke={CLOUD} strokeWidth={font / 7} strokeLinejoin="round" />
              {letter && (
                <>
                  <polygon points={pointsAttr(deltaTriangle(cx, cy, tri))} fill={palette.white} stroke={CLOUD} strokeWidth={font / 8} strokeLinejoin="round" />
                  <text x={cx} y={cy + tri * 0.08} fontSize={tri * (letter.length > 1 ? 0.38 : 0.5)} textAnchor="middle" dominantBaseline="middle" fill={CLOUD} fontFamily="var(--font-mono), monospace">{letter}</text>
                </>
              )}
              {k.what === 'removed' && (
                <text x={k.area.x0 + (k.area.x1 - k.area.x0) / 2} y={k.area.y0 + (k.area.y1 - k.area.y0) / 2} fontSize={font * 0.8} textAnchor="middle" dominantBaseline="middle" fill={FAINT} fontFamily="var(--font-text), sans-serif">
                  {k.name} (removed)
                </text>
              )}
            </g>
          );
        })}
        <text x={length / 2} y={width + pad * 0.7} fontSize={font} textAnchor="middle" fill={FAINT} fontFamily="var(--font-mono), monospace">{length} mm</text>
      </svg>
    </figure>
  );
}
