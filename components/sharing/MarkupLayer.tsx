'use client';
/**
 * Mark-ups on the plan, drawn as keyed notes: a numbered hexagon beside the point it is about,
 * joined to it by a leader with a dot at the point. Settled ones are hollow and faint. Drawn
 * through the editor's viewport (the point in world millimetres, the symbol a fixed size on
 * screen) so they stay on their spot at any zoom; a dashed symbol marks a mark-up waiting for its
 * text. Reports the viewport and arrangement it was drawn with, so clicks can be turned into plan
 * points (markupGeometry). Loaded in the browser only (Konva), as a group in the editor's overlay
 * layer (which carries the world transform).
 * Never listens for events itself, never fetches, never touches the editor's store.
 */
import { useEffect } from 'react';
import { Circle, Group, Line, Text } from '../editor/canvas/konva';
import type { Arrangement } from '@/lib/layout/schema';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { theme, canvasFonts } from '@/components/editor/theme';
import { hexagonPoints, MARKUP_OFFSET_PX, MARKUP_RADIUS_PX, type MarkupView } from './markupGeometry';

export interface MarkupLayerProps {
  markups: MarkupView[];
  arrangement: Arrangement;
  viewport: Viewport;
  activeId: string | null;
  pending: { arrangement: Arrangement; x: number; y: number } | null;
  onView: (view: { viewport: Viewport; arrangement: Arrangement }) => void;
}

/** One keyed note: leader, point dot, hexagon and number, sized in screen pixels (s = px per mm). */
function KeyedNote({ x, y, s, number, settled, active, pending = false }: { x: number; y: number; s: number; number?: number; settled: boolean; active: boolean; pending?: boolean }) {
  const r = (MARKUP_RADIUS_PX * (active ? 1.2 : 1)) / s;
  const hx = MARKUP_OFFSET_PX.x / s;
  const hy = MARKUP_OFFSET_PX.y / s;
  // The leader runs from the point to the hexagon's edge, not its centre.
  const len = Math.hypot(hx, hy);
  const ex = hx - (hx / len) * r;
  const ey = hy - (hy / len) * r;
  const stroke = pending ? theme.copper : active ? theme.ink : settled ? theme.inkSoft : theme.copperDark;
  const dash = pending ? [4 / s, 3 / s] : undefined;
  return (
    <Group x={x} y={y} opacity={settled && !active ? 0.6 : 1} name={pending ? 'markup-pending' : 'markup'}>
      <Line points={[0, 0, ex, ey]} stroke={stroke} strokeWidth={1.2 / s} dash={dash} />
      <Circle radius={2.2 / s} fill={stroke} />
      <Line
        x={hx} y={hy} points={hexagonPoints(r)} closed
        fill={pending ? 'rgba(164,82,42,0.15)' : settled ? theme.paper : theme.copper}
        stroke={stroke} strokeWidth={(active ? 2.2 : 1.4) / s} dash={dash}
      />
      {number !== undefined && (
        <Text
          text={String(number)} x={hx - r} y={hy - r} width={2 * r} height={2 * r} align="center" verticalAlign="middle"
          fontFamily={canvasFonts.mono} fontSize={11 / s} fill={settled ? theme.inkSoft : theme.paper}
        />
      )}
    </Group>
  );
}

export function MarkupLayer(p: MarkupLayerProps) {
  const { onView, viewport, arrangement } = p;
  useEffect(() => onView({ viewport, arrangement }), [onView, viewport, arrangement]);
  const s = viewport.scale;
  const here = p.markups.filter((m) => m.arrangement === arrangement);
  return (
    <Group listening={false} name="markups">
      {here.map((m) => (
        <KeyedNote key={m.id} x={m.x} y={m.y} s={s} number={m.number} settled={m.settled} active={m.id === p.activeId} />
      ))}
      {p.pending && p.pending.arrangement === arrangement && (
        <KeyedNote x={p.pending.x} y={p.pending.y} s={s} settled={false} active={false} pending />
      )}
    </Group>
  );
}
