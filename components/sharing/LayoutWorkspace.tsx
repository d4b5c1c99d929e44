'use client';
/**
 * The layout page around the editor: the editor itself (editable for the workshop, read-only for
 * the client) with comment pins on its plan, the comments column, and the sharing entry points in
 * its toolbar — "Revisions" for everyone, "Share" (viewer links) for the workshop. Clicks on the
 * plan become pin positions through the viewport the pins layer reports.
 * Must never change the layout document: that is the editor's job.
 */
import Link from 'next/link';
import dynamic from 'next/dynamic';
import { useCallback, useEffect, useMemo, useRef, useState, type ComponentType, type MouseEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { History, MessageSquare, Share2 } from 'lucide-react';
import { EditorLoader } from '@/components/editor/EditorLoader';
import { Dialog } from '@/components/editor/panels/Dialog';
import type { EditorProps } from '@/components/editor/types';
import type { Viewport } from '@/components/editor/geometry/viewport';
import type { Arrangement } from '@/lib/layout/schema';
import { apiFetch } from '@/lib/api/client-fetch';
import type { ThreadDto } from '@/db/sharing/comments';
import { CommentsPanel, type PendingPin } from './CommentsPanel';

// The Share dialog's contents load when it is first opened.
const SharePanel = dynamic(() => import('./SharePanel').then((m) => m.SharePanel), { ssr: false, loading: () => <p className="text-sm text-ink-soft">Loading…</p> });
import { BuildPlanLink } from '@/components/planning/BuildPlanLink';
import { pinAt, planPointAt, type PinView } from './pinGeometry';
import type { CommentPinsLayerProps } from './CommentPinsLayer';
import { useStudioTools } from '@/components/uploads/useStudioTools';

/** New comments from the other side show up within this long (common practice, no source). */
const COMMENTS_POLL_MS = 10_000;

export interface LayoutWorkspaceProps extends Omit<EditorProps, 'extensions'> {
  /** Open this thread at once (from a mail's link). */
  focusComment?: string | null;
}

export function LayoutWorkspace(props: LayoutWorkspaceProps) {
  const { layoutId, canEdit, focusComment } = props;
  const studioTools = useStudioTools(layoutId, canEdit, props.units); // tracing photos and the File menu (studio only)
  const threadsQuery = useQuery({
    queryKey: ['comments', layoutId],
    queryFn: () => apiFetch<{ threads: ThreadDto[] }>(`/api/layouts/${layoutId}/comments`),
    refetchInterval: COMMENTS_POLL_MS,
  });
  const threads = useMemo(() => threadsQuery.data?.threads ?? [], [threadsQuery.data]);
  const [open, setOpen] = useState(true);
  const [placing, setPlacing] = useState(false);
  const [pending, setPending] = useState<PendingPin | null>(null);
  const [activeId, setActiveId] = useState<string | null>(focusComment ?? null);
  const [sharing, setSharing] = useState(false);
  const view = useRef<{ viewport: Viewport; arrangement: Arrangement } | null>(null);
  const onView = useCallback((v: { viewport: Viewport; arrangement: Arrangement }) => { view.current = v; }, []);

  // Konva stays out of the server render and the first load: the pins layer is fetched in the browser.
  const [PinsLayer, setPinsLayer] = useState<ComponentType<CommentPinsLayerProps> | null>(null);
  useEffect(() => {
    let live = true;
    import('./CommentPinsLayer').then((m) => { if (live) setPinsLayer(() => m.CommentPinsLayer); });
    return () => { live = false; };
  }, []);

  const pins: PinView[] = useMemo(
    () => threads.map((t, i) => ({ id: t.id, number: i + 1, arrangement: t.arrangement, x: t.x, y: t.y, resolved: !!t.resolved })),
    [threads],
  );

  /** Clicks on the plan: place the pending pin, or open the pin under the pointer. */
  const onPlanClick = (e: MouseEvent<HTMLDivElement>) => {
    const plan = (e.target as HTMLElement).closest('[data-testid="plan"]');
    const v = view.current;
    if (!plan || !v) return;
    const box = plan.getBoundingClientRect();
    const sx = e.clientX - box.left;
    const sy = e.clientY - box.top;
    if (placing) {
      setPending({ arrangement: v.arrangement, ...planPointAt(v.viewport, sx, sy) });
      setPlacing(false);
      setOpen(true);
      return;
    }
    const hit = pinAt(pins, v.arrangement, v.viewport, sx, sy);
    if (hit) {
      setActiveId(hit.id);
      setOpen(true);
    }
  };

  const openCount = threads.filter((t) => !t.resolved).length;
  const toolbarExtra = (
    <>
    {studioTools.toolbar}
    <div className="flex items-center gap-1" role="group" aria-label="Working with the client">
      <button type="button" className={`btn-quiet px-2 py-1 ${open ? 'border-ink' : ''}`} aria-pressed={open} onClick={() => setOpen((o) => !o)}>
        <MessageSquare size={14} aria-hidden="true" /> Comments <span className="font-mono text-xs">{openCount}</span>
      </button>
      <Link href={`/layouts/${layoutId}/revisions`} className="btn-quiet px-2 py-1"><History size={14} aria-hidden="true" /> Revisions</Link>
      <BuildPlanLink layoutId={layoutId} />
      {canEdit && (
        <button type="button" className="btn-quiet px-2 py-1" onClick={() => setSharing(true)}><Share2 size={14} aria-hidden="true" /> Share</button>
      )}
    </div>
    </>
  );

  const planOverlay = ({ viewport, arrangement }: { viewport: Viewport; arrangement: Arrangement }) =>
    PinsLayer ? <PinsLayer pins={pins} arrangement={arrangement} viewport={viewport} activeId={activeId} pending={pending} onView={onView} /> : null;

  return (
    <div className={`flex h-full min-h-0 ${placing ? '[&_[data-testid=plan]]:cursor-crosshair' : ''}`} data-placing={placing || undefined}>
      <div className="h-full min-w-0 flex-1" onClickCapture={onPlanClick}>
        <EditorLoader {...props} extensions={{ planOverlay, toolbarExtra, planUnderlay: studioTools.planUnderlay }} />
      </div>
      {open && (
        <CommentsPanel
          layoutId={layoutId}
          threads={threads}
          loading={threadsQuery.isPending}
          error={threadsQuery.isError ? threadsQuery.error.message : null}
          activeId={activeId}
          onActivate={setActiveId}
          placing={placing}
          onStartPlacing={() => { setPending(null); setPlacing(true); }}
          onCancelPlacing={() => setPlacing(false)}
          pending={pending}
          onPendingChange={setPending}
          onClose={() => setOpen(false)}
        />
      )}
      <Dialog open={sharing} title="Share this layout" onClose={() => setSharing(false)} testId="share-dialog">
        <SharePanel layoutId={layoutId} />
        <div className="mt-4 text-right"><button type="button" className="btn-quiet" onClick={() => setSharing(false)}>Done</button></div>
      </Dialog>
    </div>
  );
}
