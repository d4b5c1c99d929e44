'use client';
/**
 * The side section along the van's length, to scale: bare floor and roof, floor and roof
 * build-up, wheel arches, each module of the arrangement on show at its elevation and height,
 * the clear-height line, and a standing figure of the chosen stature that can be moved along the
 * bay. A drawing, not a check: pass/fail comes from the check engine. Never edits the document.
 */
import { memo, useEffect, useRef, useState } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { KINDS } from '@/lib/layout/kinds';
import { formatLength } from '@/lib/layout/units';
import { useEditor } from '../store/EditorStoreContext';
import { buildUpThickness, clearHeight, modulesIn, mountedInside, sectionBand, sectionReach } from '@/lib/layout/bay';
import { drawOrder } from '../geometry/hitTest';
import { theme } from '../theme';

const PAD = { left: 40, right: 16, top: 12, bottom: 18 };
/**
 * Screen px per mm, at most: a short bay in a tall panel is drawn no larger than this (1 m to
 * 400 px), at least: never below this however small the panel (the panel then scrolls).
 */
const MAX_SCALE = 0.4;
const MIN_SCALE = 0.03;

export const SectionView = memo(function SectionView() {
  const { doc, arrangement, units, selection } = useEditor(useShallow((s) => ({ doc: s.doc, arrangement: s.arrangement, units: s.units, selection: s.selection })));
  const box = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ w: 800, h: 220 });
  const [figureX, setFigureX] = useState<number | null>(null);
  const [stature, setStature] = useState<number | null>(null);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(([e]) => setSize({ w: Math.max(200, e.contentRect.width), h: Math.max(120, e.contentRect.height) }));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  const { length: L, height: H } = doc.bay;
  const { floorT: fT, roofT: rT } = buildUpThickness(doc);
  const clear = clearHeight(doc);
  // Modules outside the body (under the floor, on the roof, behind the rear) widen the figure.
  const reach = sectionReach(doc, fT);
  // One scale for both directions (true to scale), the largest that fits the panel as measured.
  const spanX = L + reach.behind, spanZ = H + reach.above + reach.below;
  const k = Math.min(MAX_SCALE, Math.max(MIN_SCALE, Math.min((size.w - PAD.left - PAD.right) / spanX, (size.h - PAD.top - PAD.bottom) / spanZ)));
  // Centred across the room left over when the height sets the scale.
  const left = PAD.left + Math.max(0, (size.w - PAD.left - PAD.right - spanX * k) / 2);
  const X = (x: number) => left + x * k;
  const svgW = Math.max(size.w, left + spanX * k + PAD.right), svgH = Math.max(size.h, PAD.top + spanZ * k + PAD.bottom);
  const Y = (z: number) => PAD.top + (H + reach.above - z) * k;
  const modules = drawOrder(modulesIn(doc, arrangement));
  const fx = Math.min(L - 150, Math.max(150, figureX ?? Math.round(L * 0.3)));
  const statureOptions = Array.from(new Set([doc.occupants.standingHeight, ...doc.occupants.sleepers])).sort((a, b) => a - b);
  const who = stature ?? doc.occupants.standingHeight;
  const headroom = clear - who;

  return (
    <div className="flex h-full flex-col text-sm">
      <div className="flex items-center gap-3 overflow-hidden whitespace-nowrap border-b border-paper-edge px-4 py-1 text-xs text-ink-soft">
        <span title="Looking at the left wall, cab on the left">Section ({arrangement})</span>
        <label className="flex items-center gap-1.5">Figure
          <select value={who} onChange={(e) => setStature(Number(e.target.value))} className="rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono">
            {statureOptions.map((s) => <option key={s} value={s}>{formatLength(s, units)}</option>)}
          </select>
        </label>
        <label className="flex items-center gap-1.5">stands at
          <input type="range" min={150} max={Math.max(151, L - 150)} step={10} value={fx} onChange={(e) => setFigureX(Number(e.target.value))} aria-valuetext={formatLength(fx, units)} className="w-28 accent-copper" />
          <span className="font-mono">{formatLength(fx, units)}</span>
        </label>
        <span className="truncate font-mono">headroom {headroom >= 0 ? formatLength(headroom, units) : `−${formatLength(-headroom, units)}`}</span>
      </div>
      <div ref={box} className="relative min-h-0 flex-1 overflow-auto" data-testid="section-box">
        <svg width={svgW} height={svgH} role="img" aria-label={`Side section: clear height ${formatLength(clear, units)}, ${modules.length} modules in ${arrangement}`} className="absolute inset-0">
          <defs>
            <pattern id="sec-band" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="6" stroke={theme.inkFaint} strokeWidth="0.7" /></pattern>
            <pattern id="sec-cross" width="6" height="6" patternUnits="userSpaceOnUse"><path d="M0 0L6 6M6 0L0 6" stroke={theme.ink} strokeWidth="0.5" opacity="0.6" /></pattern>
            <pattern id="sec-timber" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)"><line x1="0" y1="0" x2="0" y2="5" stroke={theme.inkSoft} strokeWidth="0.6" opacity="0.5" /></pattern>
          </defs>
          {/* Build-up bands */}
          <rect x={X(0)} y={Y(fT)} width={L * k} height={fT * k} fill="url(#sec-band)" />
          <rect x={X(0)} y={Y(H)} width={L * k} height={rT * k} fill="url(#sec-band)" />
          {/* Wheel arches (their silhouette on the left wall) */}
          {doc.bay.wheelArches.filter((a, i, all) => all.findIndex((b) => b.x === a.x && b.length === a.length) === i).map((a, i) => (
            <rect key={i} x={X(a.x)} y={Y(a.height)} width={a.length * k} height={a.height * k} fill="url(#sec-cross)" stroke={theme.ink} strokeWidth={1} />
          ))}
          {/* Modules */}
          {modules.map((m) => {
            const { z0 } = sectionBand(m, H, fT);
            const fam = KINDS[m.kind].family;
            const sel = selection.includes(m.id);
            const outside = !mountedInside(m);
            return (
              <g key={m.id} data-mount={outside ? m.mount : undefined}>
                <rect x={X(m.x)} y={Y(z0 + m.height)} width={m.length * k} height={m.height * k} fill={fam === 'timber' ? 'url(#sec-timber)' : theme.paper} fillOpacity={fam === 'timber' ? 1 : 0.85} stroke={sel ? theme.copper : theme.ink} strokeWidth={sel ? 1.75 : 1} strokeDasharray={outside ? '10 3' : m.kind === 'overhead-locker' ? '4 3' : undefined} />
                {m.length * k > 40 && m.height * k > 12 && (
                  <text x={X(m.x + m.length / 2)} y={Y(z0 + m.height / 2)} textAnchor="middle" dominantBaseline="middle" fontSize={10} fill={theme.ink} className="font-sans">{m.label || KINDS[m.kind].title}</text>
                )}
              </g>
            );
          })}
          {/* Bare metal: floor, roof, bulkhead and rear */}
          <path data-testid="section-bay" d={`M${X(0)} ${Y(0)}H${X(L)}M${X(0)} ${Y(H)}H${X(L)}`} stroke={theme.ink} strokeWidth={2.5} />
          <path d={`M${X(0)} ${Y(0)}V${Y(H)}`} stroke={theme.ink} strokeWidth={doc.bay.bulkhead ? 2.5 : 1} strokeDasharray={doc.bay.bulkhead ? undefined : '6 4'} />
          <path d={`M${X(L)} ${Y(0)}V${Y(H)}`} stroke={theme.ink} strokeWidth={1} strokeDasharray="3 3" />
          {/* Clear height */}
          <path d={`M${X(0)} ${Y(H - rT)}H${X(L)}`} stroke={theme.copper} strokeWidth={1} strokeDasharray="6 3" />
          <text x={X(L) - 4} y={Y(H - rT) + 12} textAnchor="end" fontSize={10} fill={theme.copperDark} className="font-mono">clear height {formatLength(clear, units)}</text>
          {/* Standing figure on the finished floor */}
          <Figure x={X(fx)} feet={Y(fT)} stature={who * k} over={headroom < 0} />
          <text x={X(fx) + 10} y={Y(fT + who) - 4} fontSize={10} fill={headroom < 0 ? theme.brick : theme.inkSoft} className="font-mono">{formatLength(who, units)}{headroom < 0 ? ' (head above lining)' : ''}</text>
          {/* Height scale */}
          <path d={`M${left - 14} ${Y(0)}V${Y(H)}M${left - 18} ${Y(0) + 4}l8 -8M${left - 18} ${Y(H) + 4}l8 -8`} stroke={theme.ink} strokeWidth={0.8} />
          <text transform={`translate(${left - 20} ${Y(H / 2)}) rotate(-90)`} textAnchor="middle" fontSize={10} fill={theme.ink} className="font-mono">{formatLength(H, units)}</text>
          <text x={X(0)} y={svgH - 8} fontSize={10} fill={theme.inkSoft} className="font-sans">◀ cab</text>
        </svg>
      </div>
    </div>
  );
});

/** A plain standing figure scaled to `stature` px: head, body, arms, legs (our own drawing). */
function Figure({ x, feet, stature, over }: { x: number; feet: number; stature: number; over: boolean }) {
  const s = stature;
  const head = s * 0.065;
  const top = feet - s;
  const colour = over ? theme.brick : theme.ink;
  return (
    <g stroke={colour} strokeWidth={1.5} fill="none" strokeLinecap="round" aria-hidden>
      <circle cx={x} cy={top + head} r={head} />
      <path d={`M${x} ${top + head * 2}V${feet - s * 0.47}`} />
      <path d={`M${x - s * 0.12} ${top + s * 0.27}L${x} ${top + s * 0.19}L${x + s * 0.12} ${top + s * 0.27}`} />
      <path d={`M${x - s * 0.08} ${feet}L${x} ${feet - s * 0.47}L${x + s * 0.08} ${feet}`} />
    </g>
  );
}
