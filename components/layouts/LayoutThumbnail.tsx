/**
 * Pieces of a layouts-table row: the small plan (an SVG the server draws from the saved document,
 * addressed by version so the browser keeps it until the next save) and the line linking a
 * variant to its original. Presentation only.
 */
import Link from 'next/link';
import type { LayoutSummaryDto } from '@/db/layouts';

export function LayoutThumbnail({ layout }: { layout: Pick<LayoutSummaryDto, 'id' | 'name' | 'version'> }) {
  return (
    // eslint-disable-next-line @next/next/no-img-element -- a small SVG drawn by the server from the document; nothing to optimise
    <img src={`/api/layouts/${layout.id}/thumbnail?version=${layout.version}`} alt={`Plan of ${layout.name}`}
      width={96} height={48} loading="lazy" className="h-auto w-24 rounded-sm border border-paper-edge" data-testid="layout-thumbnail" />
  );
}

export function VariantLink({ layout }: { layout: Pick<LayoutSummaryDto, 'id' | 'variantOf'> }) {
  if (!layout.variantOf) return null;
  return (
    <span className="mt-0.5 block text-xs text-ink-soft">
      Variant of{' '}
      <Link className="underline-offset-2 hover:text-copper hover:underline" href={`/layouts/${layout.variantOf.id}`}>{layout.variantOf.name}</Link>
      {' · '}
      <Link className="text-copper underline-offset-2 hover:underline" href={`/layouts/${layout.id}/compare?with=${layout.variantOf.id}`}>compare</Link>
    </span>
  );
}
