'use client';
/**
 * A small to-scale plan of the bay for the Weight panel, drawn as the editor draws it (x
 * rearwards to the right, y across from the left wall downwards, front marked "cab"): the bay
 * outline, wheel arches, module footprints, both axle lines with the load on each, payload
 * items, and the laden centre of mass with its distance from the front of the load floor.
 * SVG only; draws the MassReport it is given and computes nothing but the drawing extent.
 */
import type { LayoutDoc } from '@/lib/layout';
import type { MassReport } from '@/lib/planning';
import { formatNumber } from '@/lib/format';
import { archBoxes, modulesIn } from '@/lib/layout/bay';
import { palette } from '@/lib/look';

const INK = palette.ink;
const SOFT = palette.inkFaint;
const COPPER = palette.copper;

export function CentreOfMassPlan({ doc, report }: { doc: LayoutDoc; report: MassReport }) {
  const v = doc.systems?.vehicle ?? {};
  const L = doc.bay.length;
  const W = doc.bay.width;
  const frontAxle = v.frontAxleX;
  const rearAxle = frontAxle !== undefined && v.wheelbaseMm !== undefined ? frontAxle + v.wheelbaseMm : undefined;
  const xs = [0, L, frontAxle ?? 0, rearAxle ?? 0, ...report.items.filter((i) => i.group === 'payload').map((i) => i.x)];
  const minX = Math.min(...xs) - 250;
  const maxX = Math.max(...xs) + 250;
  const top = -420;
  const bottom = W + 360;
  const font = Math.max(60, (maxX - minX) / 55);
  const com = report.centreOfMass;
  const kg = (n: number) => `${formatNumber(n)} kg`;
  return (
    <svg
      viewBox={`${minX} ${top} ${maxX - minX} ${bottom - top}`}
      className="h-auto w-full rounded-sm border border-paper-edge bg-paper"
      role="img"
      aria-label={com ? `Plan of the bay: centre of mass ${Math.round(com.x)} mm behind the front of the load floor, ${Math.round(com.y)} mm from the left wall` : 'Plan of the bay: centre of mass not known yet'}
      data-testid="com-plan"
    >
      <defs>
        <pattern id="com-arch" width="60" height="60" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="60" stroke={SOFT} strokeWidth="8" />
        </pattern>
      </defs>
      <rect x={0} y={0} width={L} height={W} fill="none" stroke={INK} strokeWidth={font / 4} />
      {archBoxes(doc).map(({ rect: r }, i) => (
        <rect key={i} x={r.x0} y={r.y0} width={r.x1 - r.x0} height={r.y1 - r.y0} fill="url(#com-arch)" stroke={SOFT} strokeWidth={font / 10} />
      ))}
      {modulesIn(doc, 'travel').map((m) => (
        <rect key={m.id} x={m.x} y={m.y} width={m.length} height={m.width} fill="rgba(30,42,47,0.06)" stroke={SOFT} strokeWidth={font / 12} />
      ))}
      <text x={-font * 0.5} y={W / 2} fontSize={font} textAnchor="end" dominantBaseline="middle" fill={INK}>cab ←</text>
      {[{ x: frontAxle, name: 'front axle', load: report.axles?.frontKg }, { x: rearAxle, name: 'rear axle', load: report.axles?.rearKg }].map((a) =>
        a.x === undefined ? null : (
          <g key={a.name}>
            <line x1={a.x} x2={a.x} y1={top + font * 2.2} y2={bottom - font * 0.5} stroke={INK} strokeWidth={font / 8} strokeDasharray={`${font / 2} ${font / 3}`} />
            <text x={a.x} y={top + font * 1.1} fontSize={font} textAnchor="middle" fill={INK}>{a.name}</text>
            {a.load !== undefined && <text x={a.x} y={top + font * 2} fontSize={font * 0.9} textAnchor="middle" className="font-mono" fill={INK}>{kg(a.load)}</text>}
          </g>
        ),
      )}
      {report.items.filter((i) => i.group === 'payload').map((i) => (
        <g key={i.id}>
          <rect x={i.x - font * 0.4} y={i.y - font * 0.4} width={font * 0.8} height={font * 0.8} fill="none" stroke={INK} strokeWidth={font / 10} />
          <text x={i.x} y={i.y + font * 1.4} fontSize={font * 0.8} textAnchor="middle" fill={INK}>{i.label}</text>
        </g>
      ))}
      {com && (
        <g data-testid="com-marker">
          <circle cx={com.x} cy={com.y} r={font * 0.9} fill="none" stroke={COPPER} strokeWidth={font / 6} />
          <path d={`M${com.x - font * 0.9} ${com.y} H${com.x + font * 0.9} M${com.x} ${com.y - font * 0.9} V${com.y + font * 0.9}`} stroke={COPPER} strokeWidth={font / 8} />
          <path d={`M${com.x} ${com.y} L${com.x + font * 0.9} ${com.y} A${font * 0.9} ${font * 0.9} 0 0 0 ${com.x} ${com.y - font * 0.9} Z`} fill={COPPER} />
          {/* Dimension from the front of the load floor, with tick marks. */}
          <line x1={0} x2={com.x} y1={W + font * 1.6} y2={W + font * 1.6} stroke={COPPER} strokeWidth={font / 10} />
          <line x1={-font * 0.3} x2={font * 0.3} y1={W + font * 1.9} y2={W + font * 1.3} stroke={COPPER} strokeWidth={font / 8} />
          <line x1={com.x - font * 0.3} x2={com.x + font * 0.3} y1={W + font * 1.9} y2={W + font * 1.3} stroke={COPPER} strokeWidth={font / 8} />
          <text x={com.x / 2} y={W + font * 3} fontSize={font} textAnchor="middle" className="font-mono" fill={COPPER}>{Math.round(com.x)} mm</text>
        </g>
      )}
      {!com && <text x={L / 2} y={W / 2} fontSize={font} textAnchor="middle" fill={SOFT}>centre of mass: enter the axle geometry</text>}
    </svg>
  );
}
