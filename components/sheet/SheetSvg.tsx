/**
 * One page of the plan sheet as SVG in real millimetres (width="297mm", viewBox in mm), from the
 * same drawing model as the PDF, so the HTML print view prints true to scale at 100 %. Text uses
 * the product's faces, the same ones embedded in the PDF, without kerning or ligatures so each
 * line measures as the sheet's layout measured it.
 * Renders on the server; holds no state and must never measure or re-lay anything out.
 */
import { INK_HEX, PT_PER_MM, type SheetItem, type SheetPage } from '@/lib/sheet';

const FAMILY = {
  sans: 'var(--font-text), sans-serif',
  'sans-bold': 'var(--font-text), sans-serif',
  mono: 'var(--font-mono), monospace',
} as const;

const ANCHOR = { left: 'start', center: 'middle', right: 'end' } as const;

const hex = (ink?: keyof typeof INK_HEX) => INK_HEX[ink ?? 'ink'];

function Item({ item }: { item: SheetItem }) {
  switch (item.type) {
    case 'line':
      return <line x1={item.x1} y1={item.y1} x2={item.x2} y2={item.y2} stroke={hex(item.ink)} strokeWidth={item.width} strokeDasharray={item.dash?.join(' ')} data-tag={item.tag} />;
    case 'rect':
      return (
        <rect x={item.x} y={item.y} width={item.w} height={item.h} fill={item.fill ? hex(item.fill) : 'none'}
          stroke={item.stroke ? hex(item.stroke) : 'none'} strokeWidth={item.stroke ? (item.width ?? 0.2) : 0} strokeDasharray={item.dash?.join(' ')} />
      );
    case 'polygon':
      return <polygon points={item.points.map((p) => p.join(',')).join(' ')} fill={item.fill ? hex(item.fill) : 'none'} stroke={item.stroke ? hex(item.stroke) : 'none'} strokeWidth={item.stroke ? (item.width ?? 0.2) : 0} />;
    case 'text':
      return (
        <text x={item.x} y={item.y} fontSize={item.size / PT_PER_MM} style={{ fontFamily: FAMILY[item.font ?? 'sans'], fontKerning: 'none', fontVariantLigatures: 'none' }} fontWeight={item.font === 'sans-bold' ? 600 : 400}
          fill={hex(item.ink)} textAnchor={ANCHOR[item.align ?? 'left']} transform={item.rotate === 90 ? `rotate(-90 ${item.x} ${item.y})` : undefined}>
          {item.text}
        </text>
      );
  }
}

export function SheetSvg({ page, label }: { page: SheetPage; label: string }) {
  return (
    <svg xmlns="http://www.w3.org/2000/svg" width={`${page.width}mm`} height={`${page.height}mm`} viewBox={`0 0 ${page.width} ${page.height}`}
      role="img" aria-label={label} className="sheet-page block h-auto max-w-full bg-white shadow-md" strokeLinecap="butt">
      {page.items.map((item, i) => <Item key={i} item={item} />)}
    </svg>
  );
}
