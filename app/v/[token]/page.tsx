import type { Metadata } from 'next';
import { resolveViewerLink } from '@/db/sharing/viewer-links';
import { ViewerScreen } from '@/components/sharing/ViewerScreen';
import { ViewerGone } from '@/components/sharing/ViewerGone';
import { editorPreviewSvg } from '@/lib/sheet/thumbnail';
import { checksForOpening } from '@/server/api/checks-on-open';

export const dynamic = 'force-dynamic';

export const metadata: Metadata = { title: 'Shared plan' };

/**
 * A viewer link: no account, read-only, exactly what the link names. Revoked, expired and
 * unknown links get a plain page saying so.
 */
export default async function ViewerPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const resolved = await resolveViewerLink(token, { touch: true });
  if (resolved.status !== 'active') {
    return <ViewerGone status={resolved.status} at={resolved.status === 'revoked' ? resolved.revokedAt : resolved.status === 'expired' ? resolved.expiresAt : null} />;
  }
  const { checkDefaults, ...content } = resolved.content;
  return <ViewerScreen token={token} initial={content} preview={editorPreviewSvg(content.doc)} initialChecks={(await checksForOpening(`viewer:${token}`, content.doc, checkDefaults)).checks} />;
}
