'use client';
/**
 * The layout page around the editor: the editor itself (editable for the workshop, read-only for
 * the client) with mark-ups (keyed notes) on its plan, the Mark-ups list, and the sharing entry
 * points in its toolbar — "Revisions" for everyone, "Share" (viewer links) for the workshop. Clicks
 * on the plan become mark-up points through the viewport the mark-up layer reports.
 * Must never change the layout document: that is the editor's job.
 */
import Link from 'next/link';
import dynamic from 'next/dynamic';
import { useCallback, useEffect, useMemo, useRef, useState, type ComponentType, type MouseEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { History, Share2 } from 'lucide-react';
import { EditorLoader } from '@/components/editor/EditorLoader';
import { Dialog } from '@/components/editor/panels/Dialog';
import type { EditorProps } from '@/components/editor/types';
import type { Viewport } from '@/components/editor/geometry/viewport';
import type { Arrangement } from '@/lib/layout/schema';
import { openingTitle } from '@/lib/layout/openings';
import { openingPlanPoint } from '@/lib/layout/openings';
import { apiFetch } from '@/lib/api/client-fetch';
import type { ThreadDto } from '@/db/sharing/comments';
import { MarkupsPanel, type PendingMarkup } from './MarkupsPanel';
import { RevisionBanner, type RevisionOnShow } from './RevisionBanner';

// The Share dialog's contents load when it is first opened.
const SharePanel = dynamic(() => import('./SharePanel').then((m) => m.SharePanel), { ssr: false, loading: () => <p className="text-sm text-ink-soft">Loading…</p> });
import { BuildPlanLink } from '@/components/planning/BuildPlanLink';
import { markupAt, planPointAt, type MarkupView } from './markupGeometry';
import type { MarkupLayerProps } from './MarkupLayer';
import { useStudioTools } from '@/components/uploads/useStudioTools';
import { setDrawer } from '@/components/ui/drawers';
import { useScreenClass } from '@/components/ui/screenClass';

/** New mark-ups from the other side show up within this long (common practice, no source). */
const MARKUPS_POLL_MS = 10_000;

export interface LayoutWorkspaceProps extends Omit<EditorProps, 'extensions'> {
  /** Open this thread at once (from a mail's link). */
  focusMarkup?: string | null;
  /** The frozen revision on show (read-only), or null for the layout as last saved. */
  onShow?: RevisionOnShow | null;
  /** The plan drawn by the server, shown until the editor runs (see EditorLoader). */
  preview?: string | null;
}

export function LayoutWorkspace(props: LayoutWorkspaceProps) {
  const { layoutId, canEdit, focusMarkup, onShow = null, ...editorProps } = props;
  const studioTools = useStudioTools(layoutId, canEdit, props.units); // survey photos and the Sheets & files menu (studio only)
  const threadsQuery = useQuery({
    queryKey: ['markups', layoutId],
    queryFn: () => apiFetch<{ threads: ThreadDto[] }>(`/api/layouts/${layoutId}/comments`),
    refetchInterval: MARKUPS_POLL_MS,
  });
  const threads = useMemo(() => threadsQuery.data?.threads ?? [], [threadsQuery.data]);
  // The Mark-ups list opens on demand (or from a mail's link to one mark-up), like every other drawer.
  const floating = useScreenClass() !== 'desktop';
  const setOpen = useCallback((next: boolean) => setDrawer(next ? 'markups' : null), []);
  useEffect(() => {
    if (focusMarkup) setDrawer('markups');
  }, [focusMarkup]);
  const [placing, setPlacing] = useState(false);
  const [pending, setPending] = useState<PendingMarkup | null>(null);
  const [activeId, setActiveId] = useState<string | null>(focusMarkup ?? null);
  const [sharing, setSharing] = useState(false);
  const view = useRef<{ viewport: Viewport; arrangement: Arrangement } | null>(null);
  const onView = useCallback((v: { viewport: Viewport; arrangement: Arrangement }) => { view.current = v; }, []);

  // Konva stays out of the server render and the first load: the mark-up layer is fetched in the browser.
  const [Markups, setMarkups] = useState<ComponentType<MarkupLayerProps> | null>(null);
  useEffect(() => {
    let live = true;
    import('./MarkupLayer').then((m) => { if (live) setMarkups(() => m.MarkupLayer); });
    return () => { live = false; };
  }, []);

  // The openings a mark-up can be placed at, from the document as the page opened (the server checks the id against the saved one).
  const bay = editorProps.initialDoc.bay;
  const openingChoices = useMemo(
    () => (bay.openings ?? []).flatMap((o) => {
      const at = openingPlanPoint(bay, o);
      return at ? [{ id: o.id, name: openingTitle(bay, o), ...at }] : [];
    }),
    [bay],
  );

  const markups: MarkupView[] = useMemo(
    () => threads.map((t, i) => ({ id: t.id, number: i + 1, arrangement: t.arrangement, x: t.x, y: t.y, settled: !!t.settled })),
    [threads],
  );

  /** Clicks on the plan: place the pending mark-up's point, or open the mark-up under the pointer. */
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
    const hit = markupAt(markups, v.arrangement, v.viewport, sx, sy);
    if (hit) {
      setActiveId(hit.id);
      setOpen(true);
    }
  };

  const openCount = threads.filter((t) => !t.settled).length;
  const toolbarExtra = (
    <>
    {studioTools.toolbar}
    <div className="flex flex-wrap items-center gap-1" role="group" aria-label="Working with the client">
      <Link href={`/layouts/${layoutId}/revisions`} className="btn-quiet px-2 py-1"><History size={14} aria-hidden="true" /> Revisions</Link>
      <BuildPlanLink layoutId={layoutId} />
      {canEdit && (
        <button type="button" className="btn-quiet px-2 py-1" onClick={() => setSharing(true)}><Share2 size={14} aria-hidden="true" /> Share</button>
      )}
    </div>
    </>
  );

  const planOverlay = ({ viewport, arrangement }: { viewport: Viewport; arrangement: Arrangement }) =>
    Markups ? <Markups markups={markups} arrangement={arrangement} viewport={viewport} activeId={activeId} pending={pending} onView={onView} /> : null;

  const markupsPanel = (
        <MarkupsPanel
          layoutId={layoutId}
          threads={threads}
          loading={threadsQuery.isPending}
          error={threadsQuery.isError ? threadsQuery.error.message : null}
          activeId={activeId}
          onActivate={setActiveId}
          placing={placing}
          onStartPlacing={() => {
            setPending(null);
            setPlacing(true);
            // On a tablet or phone the drawer covers the plan: step aside until the point is placed.
            if (floating) setDrawer(null);
          }}
          onCancelPlacing={() => setPlacing(false)}
          openings={openingChoices}
          onPlaceAtOpening={(o) => {
            setPending({ arrangement: view.current?.arrangement ?? 'travel', x: o.x, y: o.y, openingId: o.id, openingName: o.name });
            setPlacing(false);
            setOpen(true);
          }}
          pending={pending}
          onPendingChange={setPending}
          onClose={() => setOpen(false)}
        />
  );

  return (
    <div className={`flex h-full min-h-0 ${placing ? '[&_[data-testid=plan]]:cursor-crosshair' : ''}`} data-placing={placing || undefined}>
      <div className="h-full min-w-0 flex-1" onClickCapture={onPlanClick}>
        <EditorLoader
          {...editorProps}
          layoutId={layoutId}
          canEdit={canEdit}
          extensions={{
            planOverlay,
            toolbarExtra,
            planUnderlay: studioTools.planUnderlay,
            sidePanel: { title: 'Mark-ups', count: openCount, countLabel: `${openCount} open`, content: markupsPanel },
            banner: <RevisionBanner layoutId={layoutId} onShow={onShow} canEdit={canEdit} />,
          }}
        />
      </div>
      <Dialog open={sharing} title="Share this layout" onClose={() => setSharing(false)} testId="share-dialog">
        <SharePanel layoutId={layoutId} />
        <div className="mt-4 text-right"><button type="button" className="btn-quiet" onClick={() => setSharing(false)}>Done</button></div>
      </Dialog>
    </div>
  );
}
