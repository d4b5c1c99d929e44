// A small plan of a layout document as SVG, in the document's own millimetres: the bay, its lining,
// arches and doors, and the modules as they stand in travel (pieces that appear only for sleeping
// dashed). For side-by-side comparison; the editor and the sheet draw the full plan.
import type { LayoutDoc } from '@/lib/layout/schema';
import { palette } from '@/lib/look';
import { kindSpec } from '@/lib/layout/kinds';

const MARGIN = 60;

export function PlanThumbnail({ doc, title }: { doc: LayoutDoc; title: string }) {
  const { length: L, width: W } = doc.bay;
  const wallT = doc.buildUp.walls.reduce((s, l) => s + l.thickness, 0);
  const standing = doc.modules.filter((m) => m.arrangements.includes('travel') && m.elevation < 1000);
  const high = doc.modules.filter((m) => m.arrangements.includes('travel') && m.elevation >= 1000);
  const sleepOnly = doc.modules.filter((m) => !m.arrangements.includes('travel'));
  const fill = (m: LayoutDoc['modules'][number]) => (m.surface === 'sleep' ? palette.copperLight : m.kind.includes('water') ? palette.paperDeep : palette.paperLight);
  const label = (m: LayoutDoc['modules'][number]) => m.label ?? kindSpec(m.kind).title;
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
      {standing.filter((m) => m.length >= 350 && m.width >= 200).map((m) => (
        <text key={`t-${m.id}`} x={m.x + m.length / 2} y={m.y + m.width / 2} fontSize={Math.min(90, m.width / 2.5)} textAnchor="middle" dominantBaseline="middle" fill={palette.inkSoft}>
          {label(m).length > 16 ? `${label(m).slice(0, 15)}…` : label(m)}
        </text>
      ))}
    </svg>
  );
}
