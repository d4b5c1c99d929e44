// A small plan of a layout document as SVG, in the document's own millimetres: the bay, its lining,
// arches and doors, and the modules as they stand in travel (pieces that appear only for sleeping
// dashed). For side-by-side comparison; the editor and the sheet draw the full plan.
import type { LayoutDoc } from '@/lib/layout/schema';
import { palette } from '@/lib/look';
import { kindSpec } from '@/lib/layout/kinds';
import { surfaceIn } from '@/lib/layout/bay';
import { KIND_SHORT_NAMES } from '@/lib/symbols/kind-short-names';
import { LABEL_LOOK, labelNames, placePlanLabels, type MeasureText } from '@/components/editor/geometry/labels';

const MARGIN = 60;
/** The width the card draws the plan at, about, in CSS px: labels are chosen for that size. */
const DRAWN_PX = 360;
/** Text width from its length: about 0.6 em a character in the product's sans face, on the generous side. */
const roughMeasure: MeasureText = (text, _face, size) => text.length * size * 0.6;

export function PlanThumbnail({ doc, title }: { doc: LayoutDoc; title: string }) {
  const { length: L, width: W } = doc.bay;
  const wallT = doc.buildUp.walls.reduce((s, l) => s + l.thickness, 0);
  const standing = doc.modules.filter((m) => m.arrangements.includes('travel') && m.elevation < 1000);
  const high = doc.modules.filter((m) => m.arrangements.includes('travel') && m.elevation >= 1000);
  const sleepOnly = doc.modules.filter((m) => !m.arrangements.includes('travel'));
  const fill = (m: LayoutDoc['modules'][number]) => (surfaceIn(m, 'sleep') === 'sleep' ? palette.copperLight : m.kind.includes('water') ? palette.paperDeep : palette.paperLight);
  // Names placed as the editor places them (full, short, abbreviation or none; never a cut word),
  // clear of each other, at the size the card draws the plan.
  const px = DRAWN_PX / (L + 2 * MARGIN);
  const placed = placePlanLabels(
    standing.map((m) => ({ id: m.id, x: m.x * px, y: m.y * px, width: m.length * px, height: m.width * px, names: labelNames(m.label, kindSpec(m.kind).title, KIND_SHORT_NAMES[m.kind]), dimension: '' })),
    roughMeasure,
  );
  return (
    <svg viewBox={`${-MARGIN} ${-MARGIN} ${L + 2 * MARGIN} ${W + 2 * MARGIN}`} role="img" aria-label={`Plan of ${title}`} className="h-auto w-full">
      <title>{title}</title>
      <rect x={0} y={0} width={L} height={W} fill={palette.paper} stroke={palette.ink} strokeWidth={14} />
      <rect x={0} y={wallT} width={L} height={W - 2 * wallT} fill="none" stroke={palette.inkFaint} strokeWidth={6} strokeDasharray="30 20" />
      {doc.bay.wheelArches.map((a, i) => (
        <rect key={`arch-${i}`} x={a.x} y={a.side === 'left' ? 0 : W - a.width} width={a.length} height={a.width} fill={palette.paperEdge} stroke={palette.inkSoft} strokeWidth={6} />
      ))}
      {doc.bay.doors.map((d) =>
        d.wall === 'rear'
          ? <line key={d.id} x1={L} y1={d.offset} x2={L} y2={d.offset + d.width} stroke={palette.copper} strokeWidth={40} />
          : <line key={d.id} x1={d.offset} y1={d.wall === 'left' ? 0 : W} x2={d.offset + d.width} y2={d.wall === 'left' ? 0 : W} stroke={palette.copper} strokeWidth={40} />,
      )}
      {[...standing, ...high].map((m) => (
        <g key={m.id}>
          <rect x={m.x} y={m.y} width={m.length} height={m.width} fill={m.elevation >= 1000 ? 'none' : fill(m)} stroke={palette.ink} strokeWidth={m.elevation >= 1000 ? 5 : 8} strokeDasharray={m.elevation >= 1000 ? '40 20 10 20' : undefined} />
        </g>
      ))}
      {sleepOnly.map((m) => (
        <rect key={m.id} x={m.x} y={m.y} width={m.length} height={m.width} fill="none" stroke={palette.copper} strokeWidth={8} strokeDasharray="50 30" />
      ))}
      {standing.map((m) => {
        const name = placed.get(m.id)?.name;
        if (!name) return null;
        return (
          <text key={`t-${m.id}`} x={m.x + name.cx / px} y={m.y + name.cy / px} fontSize={LABEL_LOOK.nameSize / px} textAnchor="middle" dominantBaseline="middle" fill={palette.inkSoft}>
            {name.text}
          </text>
        );
      })}
    </svg>
  );
}
