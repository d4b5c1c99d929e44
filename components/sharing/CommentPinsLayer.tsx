'use client';
/**
 * Comment pins on the plan: one numbered marker per thread of the arrangement on show (resolved
 * ones hollow and faint), drawn in world millimetres through the editor's viewport so they stay
 * on their spot at any zoom, plus the dashed marker of a pin waiting for its text. Reports the
 * viewport and arrangement it was drawn with, so clicks can be turned into plan points
 * (pinGeometry). Loaded in the browser only (Konva), inside the editor's stage.
 * Never listens for events itself, never fetches, never touches the editor's store.
 */
import { useEffect } from 'react';
import { Circle, Group, Layer, Text } from '../editor/canvas/konva';
import type { Arrangement } from '@/lib/layout/schema';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { worldLayerProps } from '@/components/editor/canvas/worldTransform';
import { theme, canvasFonts } from '@/components/editor/theme';
import { PIN_RADIUS_PX, type PinView } from './pinGeometry';

export interface CommentPinsLayerProps {
  pins: PinView[];
  arrangement: Arrangement;
  viewport: Viewport;
  activeId: string | null;
  pending: { arrangement: Arrangement; x: number; y: number } | null;
  onView: (view: { viewport: Viewport; arrangement: Arrangement }) => void;
}

export function CommentPinsLayer(p: CommentPinsLayerProps) {
  const { onView, viewport, arrangement } = p;
  useEffect(() => onView({ viewport, arrangement }), [onView, viewport, arrangement]);
  const s = viewport.scale;
  const r = PIN_RADIUS_PX / s;
  const here = p.pins.filter((pin) => pin.arrangement === arrangement);
  return (
    <Layer {...worldLayerProps(viewport)} listening={false} name="comment-pins">
      {here.map((pin) => {
        const active = pin.id === p.activeId;
        return (
          <Group key={pin.id} x={pin.x} y={pin.y} opacity={pin.resolved && !active ? 0.55 : 1} name="comment-pin">
            <Circle radius={r * (active ? 1.25 : 1)} fill={pin.resolved ? theme.paper : theme.copper} stroke={active ? theme.ink : theme.copperDark} strokeWidth={(active ? 2.5 : 1.5) / s} />
            <Text
              text={String(pin.number)} x={-r} y={-r} width={2 * r} height={2 * r} align="center" verticalAlign="middle"
              fontFamily={canvasFonts.mono} fontSize={11 / s} fill={pin.resolved ? theme.copperDark : theme.paper}
            />
          </Group>
        );
      })}
      {p.pending && p.pending.arrangement === arrangement && (
        <Circle x={p.pending.x} y={p.pending.y} radius={r} stroke={theme.copper} strokeWidth={2 / s} dash={[4 / s, 3 / s]} fill="rgba(164,82,42,0.15)" />
      )}
    </Layer>
  );
}
