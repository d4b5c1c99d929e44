'use client';
/**
 * One nested sheet drawn to scale in SVG: the board outline with its overall dimensions (tick
 * marks, mono face), the grain direction, the edge trim, and every part placed on it — a fine
 * diagonal timber hatch, its number, its piece name and its size where they fit (the legend
 * beside the drawing names every part in full), and a lining panel's cut-outs dashed (its rise runs
 * along the part's length from its start, its span across). Draws the placements it is given; never moves one.
 */
import type { CutOut, NestedSheet, SheetSize } from '@/lib/planning';
import { palette } from '@/lib/look';

const INK = palette.ink;
const SOFT = palette.inkFaint;

function pieceName(label: string): string {
  const i = label.lastIndexOf(' — ');
  return i >= 0 ? label.slice(i + 3) : label;
}

const NO_CUT_OUTS: CutOut[] = [];

export function CutSheetDrawing({ sheet, nested, trimMm, numbers, title, cutOutsOf = () => NO_CUT_OUTS }: { sheet: SheetSize; nested: NestedSheet; trimMm: number; numbers: Map<string, number>; title: string; cutOutsOf?: (partId: string) => CutOut[] }) {
  const margin = 160;
  const vb = `${-margin} ${-margin} ${sheet.length + margin * 1.4} ${sheet.width + margin * 2.1}`;
  const tick = (x: number, y: number) => <line x1={x - 18} y1={y + 18} x2={x + 18} y2={y - 18} stroke={INK} strokeWidth={5} />;
  const hatchId = `hatch-${title.replace(/[^a-z0-9]/gi, '')}-${nested.index}`;
  return (
    <svg viewBox={vb} className="h-auto w-full" role="img" aria-label={`${title}: sheet ${nested.index + 1}, ${nested.placements.length} parts, ${nested.usedPct.toFixed(1)} % used`} data-testid="cut-sheet">
      <defs>
        <pattern id={hatchId} width="40" height="40" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="40" stroke={SOFT} strokeWidth="3" />
        </pattern>
      </defs>
      {/* Overall dimensions, architectural ticks. */}
      <g className="font-mono" fontSize={56} fill={INK}>
        <line x1={0} y1={-70} x2={sheet.length} y2={-70} stroke={INK} strokeWidth={3} />
        {tick(0, -70)}{tick(sheet.length, -70)}
        <text x={sheet.length / 2} y={-95} textAnchor="middle">{sheet.length}</text>
        <line x1={-70} y1={0} x2={-70} y2={sheet.width} stroke={INK} strokeWidth={3} />
        {tick(-70, 0)}{tick(-70, sheet.width)}
        <text x={-95} y={sheet.width / 2} textAnchor="middle" transform={`rotate(-90 ${-95} ${sheet.width / 2})`}>{sheet.width}</text>
      </g>
      <rect x={0} y={0} width={sheet.length} height={sheet.width} fill={palette.paperLight} stroke={INK} strokeWidth={8} />
      {trimMm > 0 && <rect x={trimMm} y={trimMm} width={sheet.length - 2 * trimMm} height={sheet.width - 2 * trimMm} fill="none" stroke={SOFT} strokeWidth={3} strokeDasharray="20 14" />}
      {nested.placements.map((p) => {
        const n = numbers.get(p.partId) ?? 0;
        const size = Math.min(64, p.width / 3.2, p.length / 5);
        const showText = size >= 22;
        return (
          <g key={p.partId} data-part={p.partId}>
            <rect x={p.x} y={p.y} width={p.length} height={p.width} fill={`url(#${hatchId})`} stroke={INK} strokeWidth={4} />
            {cutOutsOf(p.partId).map((c) => (
              // Unturned, the part's length is its rise (up the wall, across the roof) and its width its span.
              <rect key={c.openingId} data-cut-out={c.openingId}
                x={p.x + (p.rotated ? c.fromStart : c.fromSecond)} y={p.y + (p.rotated ? c.fromSecond : c.fromStart)}
                width={p.rotated ? c.width : c.height} height={p.rotated ? c.height : c.width}
                fill={palette.paperLight} stroke={INK} strokeWidth={3} strokeDasharray="18 12" />
            ))}
            <rect x={p.x + p.length / 2 - size * 1.2} y={p.y + p.width / 2 - size * (showText ? 2.1 : 0.8)} width={size * 2.4} height={size * 1.3} fill={palette.paperLight} opacity={0.9} />
            <text x={p.x + p.length / 2} y={p.y + p.width / 2 - size * (showText ? 1.1 : -0.1)} fontSize={Math.max(size, 18)} textAnchor="middle" fill={INK} fontWeight={600}>{n}</text>
            {showText && (
              <>
                <text x={p.x + p.length / 2} y={p.y + p.width / 2 + size * 0.3} fontSize={size * 0.8} textAnchor="middle" fill={INK}>{pieceName(p.label)}{p.rotated ? ' ⟲' : ''}</text>
                <text x={p.x + p.length / 2} y={p.y + p.width / 2 + size * 1.3} fontSize={size * 0.8} textAnchor="middle" fill={INK} className="font-mono">{p.length} × {p.width}</text>
              </>
            )}
          </g>
        );
      })}
      <g fontSize={48} fill={INK}>
        <line x1={sheet.length - 420} y1={sheet.width + 80} x2={sheet.length - 40} y2={sheet.width + 80} stroke={INK} strokeWidth={4} />
        <path d={`M${sheet.length - 40} ${sheet.width + 80} l-40 -18 v36 z`} fill={INK} />
        <text x={sheet.length - 440} y={sheet.width + 96} textAnchor="end">grain</text>
        <text x={0} y={sheet.width + 96} className="font-mono">{nested.usedPct.toFixed(1)} % used</text>
      </g>
    </svg>
  );
}
