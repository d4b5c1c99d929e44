'use client';
/**
 * The layout editor screen: Parts shelf on the left, the plan in the middle with Checks and the
 * side section below it, Details and Bay on the right, the toolbar above. It creates the store
 * once, wires live checks, autosave and the keyboard, and composes panels; it draws nothing and
 * holds no editing logic itself. Read-only (canEdit false): same drawing, no shelf, no saving.
 */
import { lazy, Suspense, useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { CircleX, CircleAlert, CircleCheck } from 'lucide-react';
import type { EditorProps } from './types';
import { createEditorStore } from './store/editorStore';
import { EditorStoreProvider, useEditor, useEditorApi } from './store/EditorStoreContext';
import { PlanStage } from './canvas/PlanStage';
import { PartsShelf } from './panels/PartsShelf';
import { DetailsPanel } from './panels/DetailsPanel';
import { ChecksPanel } from './panels/ChecksPanel';
import { foldWaiting, statusCounts } from '@/lib/checks/words';
import { Toolbar } from './panels/Toolbar';
import { Tabs } from '@/components/ui/Tabs';
import { ShortcutSheet } from './panels/ShortcutSheet';
import { ConflictDialog } from './panels/ConflictDialog';
import { SelectionAnnouncer } from './panels/SelectionAnnouncer';
import { useLiveChecks } from './api/useLiveChecks';
import { useAutosave } from './api/useAutosave';
import { useEditorKeyboard } from './commands/useEditorKeyboard';
import { countByStatus, failingModuleIds } from './panels/findingGroups';

// Behind tabs: loaded when first opened, so the editor's first load stays small.
const BayPanel = lazy(() => import('./panels/BayPanel').then((m) => ({ default: m.BayPanel })));
const SectionView = lazy(() => import('./section/SectionView').then((m) => ({ default: m.SectionView })));
// Opened by a right-click or the menu key: loaded then.
const ContextMenu = lazy(() => import('./panels/ContextMenu').then((m) => ({ default: m.ContextMenu })));
const loading = <p className="p-4 text-sm text-ink-soft">Loading…</p>;

export default function Editor(props: EditorProps) {
  const [store] = useState(() => createEditorStore({ doc: props.initialDoc, version: props.initialVersion, readOnly: !props.canEdit, units: props.units }));
  return (
    <EditorStoreProvider store={store}>
      <EditorScreen {...props} />
    </EditorStoreProvider>
  );
}

function EditorScreen({ layoutId, canEdit, extensions }: EditorProps) {
  const api = useEditorApi();
  const { doc, arrangement } = useEditor(useShallow((s) => ({ doc: s.doc, arrangement: s.arrangement })));
  const checks = useLiveChecks(doc, extensions?.fetchChecks);
  const incoming = extensions?.incoming;
  useEffect(() => {
    if (incoming && !canEdit && incoming.version !== api.getState().version) api.getState().replaceDoc(incoming.doc, incoming.version);
  }, [incoming, canEdit, api]);
  const save = useAutosave(api, layoutId, canEdit);
  useEditorKeyboard(api);
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

  const checksTab = (
    <span className="flex items-center gap-2">
      Checks
      {checks.report && (
        <span className="flex items-center gap-1.5 font-mono text-xs" data-testid="checks-counts">
          <span className="inline-flex items-center gap-0.5 text-ink"><CircleX size={12} aria-hidden className="text-brick" />{counts.fail}</span>
          <span className="inline-flex items-center gap-0.5 text-ink"><CircleAlert size={12} aria-hidden className="text-ochre" />{counts.warn}</span>
          <span className="inline-flex items-center gap-0.5 text-ink"><CircleCheck size={12} aria-hidden className="text-moss" />{counts.pass}</span>
        </span>
      )}
    </span>
  );

  return (
    <div className="flex h-full min-h-0 flex-col bg-paper text-ink" data-testid="editor" data-read-only={!canEdit}>
      <Toolbar saveStatus={save.status} saveDetail={save.lastError} extra={extensions?.toolbarExtra} />
      {extensions?.banner}
      <div className="flex min-h-0 flex-1">
        {canEdit && <PartsShelf focusPlan={focusPlan} />}
        <main className="flex min-w-0 flex-1 flex-col" aria-label="Plan and checks">
          <div ref={planBox} className="relative min-h-0 flex-1">
            <PlanStage failing={failing} onContextMenu={openMenu} describedBy="selection-announcer" overlay={extensions?.planOverlay} underlay={extensions?.planUnderlay} />
            {menu && <Suspense fallback={null}><ContextMenu at={menu} onClose={closeMenu} /></Suspense>}
          </div>
          <Tabs
            className="flex h-64 min-h-0 shrink-0 flex-col border-t border-paper-edge"
            panelClassName="min-h-0 flex-1 overflow-auto"
            label="Checks and section"
            active={bottom}
            onChange={setBottom}
            tabs={[
              { id: 'checks', title: checks.report ? `Checks: ${statusCounts(counts, folded.waiting)}` : 'Checks', label: checksTab },
              { id: 'section', title: 'Side section', label: 'Side section' },
            ]}
          >
            {bottom === 'checks' ? <ChecksPanel checks={checks} layoutId={canEdit ? layoutId : undefined} /> : <Suspense fallback={loading}><SectionView /></Suspense>}
          </Tabs>
        </main>
        <aside className="flex w-80 shrink-0 flex-col border-l border-paper-edge bg-paper" aria-label="Details and bay">
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
      </div>
      <SelectionAnnouncer id="selection-announcer" />
      <ShortcutSheet />
      {canEdit && <ConflictDialog conflict={save.conflict} onTakeTheirs={save.takeTheirs} onClose={save.closeConflict} />}
    </div>
  );
}
