'use client';
/**
 * The layout editor screen: Parts shelf on the left, the plan in the middle with Checks and the
 * side section below it, Details and Bay on the right, the toolbar above. On a tablet or phone
 * the plan takes the screen and those panels become drawers over it (components/ui/Drawer), one
 * at a time. It creates the store once, wires live checks, autosave and the keyboard, and
 * composes panels; it draws nothing and holds no editing logic itself. Read-only (canEdit false,
 * or any phone): same drawing, no shelf, no saving.
 */
import { lazy, Suspense, useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { CircleX, CircleAlert, CircleCheck, Blocks, SlidersHorizontal, ListChecks, Hexagon, X } from 'lucide-react';
import type { EditorProps } from './types';
import { createEditorStore } from './store/editorStore';
import { EditorStoreProvider, useEditor, useEditorApi } from './store/EditorStoreContext';
import { PlanStage } from './canvas/PlanStage';
import { PartsShelf } from './panels/PartsShelf';
import { DetailsPanel } from './panels/DetailsPanel';
import { ChecksPanel } from './panels/ChecksPanel';
import { DRAWING_TABS } from './panels/bottomTabs';
import { foldWaiting, statusCounts } from '@/lib/checks/words';
import { Toolbar } from './panels/Toolbar';
import { Tabs } from '@/components/ui/Tabs';
import { Drawer } from '@/components/ui/Drawer';
import { toggleDrawer, useOpenDrawer, type DrawerId } from '@/components/ui/drawers';
import { useScreenClass } from '@/components/ui/screenClass';
import { whenIdle } from '@/components/ui/whenIdle';
import { warmModuleCheck } from './store/moduleEdits';
import { KINDS } from '@/lib/layout/kinds';
import { ShortcutSheet } from './panels/ShortcutSheet';
import { ConflictDialog } from './panels/ConflictDialog';
import { SelectionAnnouncer } from './panels/SelectionAnnouncer';
import { useLiveChecks } from './api/useLiveChecks';
import { useAutosave } from './api/useAutosave';
import { useLatestSaved } from './api/useLatestSaved';
import { useEditorKeyboard } from './commands/useEditorKeyboard';
import { countByStatus, failingModuleIds } from './panels/findingGroups';

// Behind tabs: loaded when first opened, so the editor's first load stays small.
const BayPanel = lazy(() => import('./panels/BayPanel').then((m) => ({ default: m.BayPanel })));
/** The docked bottom panel grows while a drawing (the side section, the walls, the roof) is on show, so it has room to be read. */
const SECTION_PANEL_HEIGHT = 'h-[42vh] min-h-64';
const SectionView = lazy(() => import('./section/SectionView').then((m) => ({ default: m.SectionView })));
const WallsView = lazy(() => import('./section/WallsView').then((m) => ({ default: m.WallsView })));
// Opened by a right-click, a long press or the menu key: loaded then.
const ContextMenu = lazy(() => import('./panels/ContextMenu').then((m) => ({ default: m.ContextMenu })));
const loading = <p className="p-4 text-sm text-ink-soft">Loading…</p>;

export default function Editor(props: EditorProps) {
  // A phone shows the layout read-only: editing needs a larger screen.
  const phone = useScreenClass() === 'phone';
  const canEdit = props.canEdit && !phone;
  return <EditorWithStore key={canEdit ? 'edit' : 'view'} {...props} canEdit={canEdit} editingNeedsLargerScreen={props.canEdit && phone} />;
}

function EditorWithStore(props: EditorProps & { editingNeedsLargerScreen: boolean }) {
  const [store] = useState(() => createEditorStore({ doc: props.initialDoc, version: props.initialVersion, readOnly: !props.canEdit, units: props.units }));
  return (
    <EditorStoreProvider store={store}>
      <EditorScreen {...props} />
    </EditorStoreProvider>
  );
}

function EditorScreen({ layoutId, canEdit, extensions, editingNeedsLargerScreen, initialChecks }: EditorProps & { editingNeedsLargerScreen: boolean }) {
  const api = useEditorApi();
  const { doc, arrangement } = useEditor(useShallow((s) => ({ doc: s.doc, arrangement: s.arrangement })));
  const checks = useLiveChecks(doc, extensions?.fetchChecks, initialChecks);
  const incoming = extensions?.incoming;
  useEffect(() => {
    if (incoming && !canEdit && incoming.version !== api.getState().version) api.getState().replaceDoc(incoming.doc, incoming.version);
  }, [incoming, canEdit, api]);
  // Build the module check while idle, so the first drop from the shelf does not pay for it.
  useEffect(() => (canEdit ? whenIdle(warmModuleCheck) : undefined), [canEdit]);
  const save = useAutosave(api, layoutId, canEdit);
  // Opened from the browser's cache (the back button) or left open while someone saved: catch up with the saved copy.
  useLatestSaved(api, layoutId, { enabled: canEdit });
  useEditorKeyboard(api);
  const floating = useScreenClass() !== 'desktop';
  const openDrawer = useOpenDrawer();
  const [menu, setMenu] = useState<{ x: number; y: number } | null>(null);
  const [side, setSide] = useState('details');
  const [bottom, setBottom] = useState('checks');
  const planBox = useRef<HTMLDivElement>(null);

  const findings = useMemo(() => checks.report?.findings ?? [], [checks.report]);
  const failing = useMemo(() => failingModuleIds(findings, arrangement), [findings, arrangement]);
  const folded = useMemo(() => foldWaiting(findings), [findings]);
  const counts = countByStatus(folded.judged);
  const openMenu = useCallback((x: number, y: number) => setMenu({ x, y }), []);
  const closeMenu = useCallback(() => setMenu(null), []);
  const focusPlan = useCallback(() => planBox.current?.querySelector<HTMLElement>('[data-testid="plan"]')?.focus(), []);

  const countsBadge = checks.report && (
    <span className="flex items-center gap-1.5 font-mono text-xs" data-testid="checks-counts">
      <span className="inline-flex items-center gap-0.5 text-ink"><CircleX size={12} aria-hidden className="text-brick" />{counts.fail}</span>
      <span className="inline-flex items-center gap-0.5 text-ink"><CircleAlert size={12} aria-hidden className="text-ochre" />{counts.warn}</span>
      <span className="inline-flex items-center gap-0.5 text-ink"><CircleCheck size={12} aria-hidden className="text-moss" />{counts.pass}</span>
    </span>
  );
  const checksTitle = checks.report ? `Checks: ${statusCounts(counts, folded.waiting)}` : 'Checks';
  const sidePanel = extensions?.sidePanel;

  const panelToggles = (
    <div className="flex items-center gap-1" role="group" aria-label="Panels">
      {floating && canEdit && <PanelToggle id="shelf" open={openDrawer} label="Parts shelf"><Blocks size={18} aria-hidden /></PanelToggle>}
      {floating && <PanelToggle id="details" open={openDrawer} label="Details and bay"><SlidersHorizontal size={18} aria-hidden /></PanelToggle>}
      {floating && <PanelToggle id="checks" open={openDrawer} label={checksTitle} testId="toggle-checks"><ListChecks size={18} aria-hidden />{countsBadge}</PanelToggle>}
      {sidePanel && (
        <PanelToggle id="markups" open={openDrawer} label={sidePanel.title} testId="toggle-markups" withLabel={!floating}>
          <Hexagon size={floating ? 18 : 14} aria-hidden />
          {!floating && sidePanel.title}
          {sidePanel.count !== undefined && <span className="font-mono text-xs" aria-label={sidePanel.countLabel}>{sidePanel.count}</span>}
        </PanelToggle>
      )}
    </div>
  );

  return (
    <div className={`flex h-full min-h-0 flex-col bg-paper text-ink ${floating ? 'touch-targets' : ''}`} data-testid="editor" data-read-only={!canEdit} data-screen={floating ? 'compact' : 'desktop'}>
      <Toolbar saveStatus={save.status} saveDetail={save.lastError} saveLeavingFor={save.leavingFor} extra={extensions?.toolbarExtra} panels={panelToggles} compact={floating} />
      {editingNeedsLargerScreen && (
        <p className="border-b border-paper-edge bg-paper-deep px-3 py-2 text-sm" data-testid="larger-screen-note">
          Read-only on a phone: editing needs a larger screen (a tablet or a computer).
        </p>
      )}
      {extensions?.banner}
      <div className="relative flex min-h-0 flex-1">
        {canEdit && (
          <Drawer id="shelf" title="Parts shelf" side="left" floating={floating} dockedClassName="flex h-full w-60 shrink-0 border-r border-paper-edge">
            <PartsShelf focusPlan={focusPlan} pickToPlace={floating} />
          </Drawer>
        )}
        <main className="flex min-w-0 flex-1 flex-col" aria-label="Plan and checks">
          <div ref={planBox} className="relative min-h-0 flex-1" data-testid="plan-area">
            <PlanStage failing={failing} onContextMenu={openMenu} describedBy="selection-announcer" overlay={extensions?.planOverlay} underlay={extensions?.planUnderlay} />
            <PlacingBanner />
            {menu && <Suspense fallback={null}><ContextMenu at={menu} onClose={closeMenu} /></Suspense>}
          </div>
          <Drawer id="checks" title="Checks and section" side="bottom" floating={floating} dockedClassName="contents">
            <Tabs
              className={`flex min-h-0 shrink-0 flex-col ${floating ? 'h-full' : `${bottom !== 'checks' ? SECTION_PANEL_HEIGHT : 'h-64'} border-t border-paper-edge`}`}
              panelClassName="min-h-0 flex-1 overflow-auto"
              label="Checks and section"
              active={bottom}
              onChange={setBottom}
              tabs={[
                { id: 'checks', title: checksTitle, label: <span className="flex items-center gap-2">Checks{countsBadge}</span> },
                ...DRAWING_TABS,
              ]}
            >
              {bottom === 'checks' ? <ChecksPanel checks={checks} layoutId={canEdit ? layoutId : undefined} />
                : bottom === 'walls' || bottom === 'roof' ? <Suspense fallback={loading}><WallsView view={bottom} /></Suspense>
                : <Suspense fallback={loading}><SectionView /></Suspense>}
            </Tabs>
          </Drawer>
        </main>
        <Drawer id="details" title="Details and bay" side="right" floating={floating} dockedClassName="flex w-80 shrink-0 flex-col border-l border-paper-edge bg-paper">
          <aside className="flex h-full min-h-0 flex-col" aria-label="Details and bay">
            <Tabs
              className="flex h-full min-h-0 flex-col"
              panelClassName="min-h-0 flex-1 overflow-auto"
              label="Details and bay"
              active={side}
              onChange={setSide}
              tabs={[
                { id: 'details', title: 'Details panel', label: 'Details' },
                { id: 'bay', title: 'Bay panel', label: 'Bay' },
              ]}
            >
              {side === 'details' ? <DetailsPanel /> : <Suspense fallback={loading}><BayPanel /></Suspense>}
            </Tabs>
          </aside>
        </Drawer>
        {sidePanel && (
          <Drawer id="markups" title={sidePanel.title} side="right" floating={floating} dockedOpen={openDrawer === 'markups'} dockedClassName="flex w-72 shrink-0 flex-col border-l border-paper-edge">
            {sidePanel.content}
          </Drawer>
        )}
      </div>
      <SelectionAnnouncer id="selection-announcer" />
      <ShortcutSheet />
      {canEdit && <ConflictDialog conflict={save.conflict} onTakeTheirs={save.takeTheirs} onClose={save.closeConflict} />}
    </div>
  );
}

function PanelToggle({ id, open, label, testId, withLabel = false, children }: { id: DrawerId; open: DrawerId | null; label: string; testId?: string; withLabel?: boolean; children: ReactNode }) {
  const pressed = open === id;
  return (
    <button
      type="button"
      aria-pressed={pressed}
      aria-label={withLabel ? undefined : label}
      title={label}
      data-testid={testId ?? `toggle-${id}`}
      onClick={() => toggleDrawer(id)}
      className={`inline-flex items-center justify-center gap-1.5 rounded border px-2 py-1 text-sm ${pressed ? 'border-copper bg-copper-light text-copper-dark' : 'border-paper-edge bg-paper text-ink hover:border-ink-faint'}`}
    >
      {children}
    </button>
  );
}

/** While a kind picked by touch waits for its spot: what to do, and a way out. */
function PlacingBanner() {
  const api = useEditorApi();
  const placing = useEditor((s) => s.placing);
  if (!placing) return null;
  return (
    <div className="absolute inset-x-0 top-2 z-20 mx-auto flex w-fit max-w-[calc(100%-1rem)] items-center gap-2 rounded border border-copper bg-paper py-0 pl-3 text-sm shadow" role="status" data-testid="placing-banner">
      Tap the plan where the {KINDS[placing].title.toLowerCase()} goes.
      <button type="button" className="inline-flex size-11 items-center justify-center text-ink-soft hover:text-ink" aria-label="Stop placing" onClick={() => api.getState().setPlacing(null)}>
        <X size={18} aria-hidden />
      </button>
    </div>
  );
}
