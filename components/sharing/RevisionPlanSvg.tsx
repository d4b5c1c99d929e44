/**
 * One side of a revision comparison: a small to-scale plan (SVG in millimetres) of the bay — bare
 * metal outline, the lined interior, wheel arches, the cab arrow — with the modules of one
 * arrangement, and the changed ones marked: added (moss, solid double outline), removed (brick,
 * dashed), moved or resized (ochre, a ghost of where it was). Each mark carries a letter too, so
 * colour is never the only cue. Presentation only: no fetching, no editing.
 */
import type { Arrangement, LayoutDoc, Module } from '@/lib/layout/schema';
import { KINDS } from '@/lib/layout/kinds';
import type { RevisionDiff } from '@/lib/layout/revision-diff';

export type PlanSide = 'from' | 'to';

const INK = '#1E2A2F';
const FAINT = '#8A969B';
const MARK = { added: '#55703F', removed: '#9E3B2F', changed: '#A87C1E' } as const;

function wallThickness(doc: LayoutDoc): number {
  return doc.buildUp.walls.reduce((t, l) => t + l.thickness, 0);
}

export function RevisionPlanSvg({ doc, diff, side, arrangement, title }: { doc: LayoutDoc; diff: RevisionDiff; side: PlanSide; arrangement: Arrangement; title: string }) {
  const { length, width } = doc.bay;
  const pad = Math.max(length, width) * 0.06;
  const font = Math.max(40, width / 28);
  const wall = wallThickness(doc);
  const added = new Set(diff.added.map((m) => m.id));
  const removed = new Set(diff.removed.map((m) => m.id));
  const changed = new Map(diff.changed.filter((c) => c.moved || c.resized).map((c) => [c.id, c]));
  const modules = doc.modules.filter((m) => m.arrangements.includes(arrangement));

  const markOf = (m: Module): keyof typeof MARK | null =>
    side === 'to' && added.has(m.id) ? 'added' : side === 'from' && removed.has(m.id) ? 'removed' : changed.has(m.id) ? 'changed' : null;
  const letterOf = { added: '+', removed: '−', changed: '~' } as const;

  return (
    <figure className="panel overflow-hidden">
      <figcaption className="border-b border-paper-edge px-3 py-2 text-sm font-medium">{title}</figcaption>
      <svg
        viewBox={`${-pad} ${-pad} ${length + 2 * pad} ${width + 2 * pad}`}
        className="block h-auto w-full bg-paper"
        role="img"
        aria-label={`${title}: plan of the ${arrangement} arrangement, ${modules.length} modules, bay ${length} by ${width} mm`}
      >
        {/* bare metal */}
        <rect x={0} y={0} width={length} height={width} fill="none" stroke={INK} strokeWidth={font / 4} />
        {/* lined interior */}
        {wall > 0 && <rect x={0} y={wall} width={length} height={Math.max(0, width - 2 * wall)} fill="none" stroke={FAINT} strokeWidth={font / 12} strokeDasharray={`${font / 2} ${font / 3}`} />}
        {doc.bay.wheelArches.map((a, i) => (
          <rect key={i} x={a.x} y={a.side === 'left' ? 0 : width - a.width} width={a.length} height={a.width} fill="#ECE7DA" stroke={FAINT} strokeWidth={font / 12} />
        ))}
        {/* the cab is at x = 0 */}
        <path d={`M ${-pad * 0.2} ${width / 2 - font} L ${-pad * 0.8} ${width / 2} L ${-pad * 0.2} ${width / 2 + font} Z`} fill={INK} />
        {modules.map((m) => {
          const mark = markOf(m);
          const c = changed.get(m.id);
          const ghost = c && side === 'to' ? c.before : null;
          return (
            <g key={m.id} data-module-id={m.id} data-mark={mark ?? undefined}>
              {ghost && <rect x={ghost.x} y={ghost.y} width={ghost.length} height={ghost.width} fill="none" stroke={MARK.changed} strokeWidth={font / 10} strokeDasharray={`${font / 3} ${font / 4}`} opacity={0.7} />}
              <rect
                x={m.x} y={m.y} width={m.length} height={m.width}
                fill={mark ? `${MARK[mark]}22` : '#F5F2EA'}
                stroke={mark ? MARK[mark] : INK}
                strokeWidth={mark ? font / 5 : font / 12}
                strokeDasharray={mark === 'removed' ? `${font / 2} ${font / 4}` : undefined}
              />
              {mark === 'added' && <rect x={m.x + font / 3} y={m.y + font / 3} width={Math.max(0, m.length - (2 * font) / 3)} height={Math.max(0, m.width - (2 * font) / 3)} fill="none" stroke={MARK.added} strokeWidth={font / 12} />}
              <text x={m.x + m.length / 2} y={m.y + m.width / 2} fontSize={font} textAnchor="middle" dominantBaseline="middle" fill={INK} fontFamily="var(--font-text), sans-serif">
                {mark ? `${letterOf[mark]} ` : ''}{m.label ?? KINDS[m.kind].title}
              </text>
            </g>
          );
        })}
        <text x={length / 2} y={width + pad * 0.7} fontSize={font} textAnchor="middle" fill={FAINT} fontFamily="var(--font-mono), monospace">{length} mm</text>
      </svg>
    </figure>
  );
}
