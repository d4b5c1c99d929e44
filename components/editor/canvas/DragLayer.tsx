'use client';
/**
 * The layer that moves during a gesture. React renders it once when a move or resize starts;
 * after that a store subscription updates its few nodes directly (group offset, shape size,
 * snap guides, the live mm readout, the marquee) and redraws this layer only, so a pointer move
 * re-renders no React component and redraws no other layer. Never listens for events.
 *
 * The plan's drawing layer is left as it is while a module is moved or resized: this layer lays a
 * paper wash with a dashed outline over where the module stood (its origin, shown faintly), and
 * draws the module itself where it is going. Hiding the module in the drawing layer instead would
 * redraw the whole plan (every module and label) in the frame the drag starts, the one frame a
 * tablet then drops; the drawing is redrawn once, when the gesture is committed.
 *
 * The layer stays shown between gestures, drawing nothing. Konva hides a hidden layer's canvas
 * (display: none), and showing it again when a drag starts changed the page's layers in that
 * frame: on a tablet's slower processor (Chromium, CPU 4× slower, GPU off) the mouse drag's worst
 * frame was 83–133 ms with the layer toggled and 50–67 ms with it left shown.
 */
import { useEffect, useRef } from 'react';
import { Group, Layer, Rect, Shape, Text } from './konva';
import type Konva from 'konva';
import { useShallow } from 'zustand/react/shallow';
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import type { Module } from '@/lib/layout/schema';
import type { Viewport } from '../geometry/viewport';
import type { SnapGuide } from '../geometry/snapping';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import type { Gesture } from '../store/gestures';
import { ModuleShape } from './ModuleShape';
import { theme } from '../theme';
import { worldLayerProps } from './worldTransform';
import type { CanvasFonts } from './useCanvasFonts';

const NONE: string[] = [];
/** How much of the plan under a moved module's origin the wash covers: enough to read as "was here" (our own choice, no source). */
const ORIGIN_WASH = 0.7;
const NO_MODULES: Module[] = [];

export function DragLayer({ viewport, units, fonts }: { viewport: Viewport; units: LengthUnit; fonts: CanvasFonts }) {
  const api = useEditorApi();
  const { kind, ids } = useEditor(useShallow((s) => ({ kind: s.gesture?.kind ?? null, ids: s.gesture?.ids ?? NONE })));
  const modules = useEditor(useShallow((s) => (kind === 'move' || kind === 'resize' ? s.doc.modules.filter((m) => ids.includes(m.id)) : NO_MODULES)));
  const layer = useRef<Konva.Layer>(null);
  const group = useRef<Konva.Group>(null);
  const guides = useRef<Konva.Shape>(null);
  const readout = useRef<Konva.Text>(null);
  const marquee = useRef<Konva.Rect>(null);
  const outline = useRef<Konva.Rect>(null);
  const scale = viewport.scale;

  useEffect(() => {
    const apply = (g: Gesture | null) => {
      const l = layer.current;
      if (!l || !g) return;
      const px = 1 / scale;
      if (g.kind === 'move') {
        group.current?.position({ x: g.preview.dx, y: g.preview.dy });
        guides.current?.setAttr('guides', g.preview.guides);
        const b = g.box;
        readout.current?.setAttrs({
          text: `${formatLength(b.x + g.preview.dx, units)}, ${formatLength(b.y + g.preview.dy, units)}`,
          x: b.x + g.preview.dx, y: b.y + g.preview.dy - 20 * px, fontSize: 11 * px, padding: 2 * px,
        });
      } else if (g.kind === 'resize') {
        const r = g.preview.rect;
        const shape = group.current?.findOne<Konva.Shape>('Shape');
        shape?.setAttrs({ x: r.x, y: r.y, width: r.length, height: r.width });
        outline.current?.setAttrs({ x: r.x, y: r.y, width: r.length, height: r.width });
        guides.current?.setAttr('guides', g.preview.guides);
        readout.current?.setAttrs({ text: `${formatLength(r.length, units)} × ${formatLength(r.width, units)}`, x: r.x, y: r.y - 20 * px, fontSize: 11 * px, padding: 2 * px });
      } else if (g.kind === 'marquee') {
        const r = g.preview.rect;
        marquee.current?.setAttrs({ x: Math.min(r.x, r.x + r.length), y: Math.min(r.y, r.y + r.width), width: Math.abs(r.length), height: Math.abs(r.width), visible: true });
      }
      l.batchDraw();
    };
    apply(api.getState().gesture);
    return api.subscribe((s, prev) => {
      if (s.gesture !== prev.gesture) apply(s.gesture);
    });
  }, [api, scale, units, kind, modules]);

  const px = 1 / scale;
  const moving = kind === 'move' || kind === 'resize';
  // The snap guides and the readout stay mounted (shown only for a move or resize): making a
  // Konva Text measures with a canvas of its own, work the frame a drag starts can do without.
  return (
    <Layer ref={layer} {...worldLayerProps(viewport)} listening={false} name="drag">
      {moving && (
        <>
          {modules.map((m) => (
            <Rect key={`from-${m.id}`} x={m.x} y={m.y} width={m.length} height={m.width} fill={theme.paper} stroke={theme.inkFaint} strokeWidth={1 * px} dash={[4 * px, 3 * px]} opacity={ORIGIN_WASH} listening={false} />
          ))}
          <Group ref={group}>
            {modules.map((m) => (
              <ModuleShape key={m.id} module={m} fonts={fonts} units={units} />
            ))}
            {kind === 'move' && modules.map((m) => <Rect key={`sel-${m.id}`} x={m.x} y={m.y} width={m.length} height={m.width} stroke={theme.copper} strokeWidth={1.5 * px} listening={false} />)}
          </Group>
          {kind === 'resize' && modules[0] && <Rect ref={outline} x={modules[0].x} y={modules[0].y} width={modules[0].length} height={modules[0].width} stroke={theme.copper} strokeWidth={1.5 * px} listening={false} />}
        </>
      )}
      <Shape
        ref={guides}
        visible={moving}
        guides={[]}
        listening={false}
        sceneFunc={(c: Konva.Context, shape: Konva.Shape) => {
          const list = (shape.getAttr('guides') as SnapGuide[]) ?? [];
          const ctx = c._context;
          ctx.save();
          ctx.strokeStyle = theme.copper;
          ctx.lineWidth = 1 * px;
          ctx.setLineDash([4 * px, 3 * px]);
          ctx.beginPath();
          for (const g of list) {
            if (g.axis === 'x') { ctx.moveTo(g.at, g.from - 20 * px); ctx.lineTo(g.at, g.to + 20 * px); } else { ctx.moveTo(g.from - 20 * px, g.at); ctx.lineTo(g.to + 20 * px, g.at); }
          }
          ctx.stroke();
          ctx.restore();
        }}
      />
      <Text ref={readout} visible={moving} text="" fontFamily={fonts.mono} fontSize={11 * px} fill={theme.copperDark} listening={false} />
      {kind === 'marquee' && (
        <Rect ref={marquee} visible={false} stroke={theme.copper} strokeWidth={1 * px} dash={[4 * px, 3 * px]} fill="rgba(164,82,42,0.06)" listening={false} />
      )}
    </Layer>
  );
}
