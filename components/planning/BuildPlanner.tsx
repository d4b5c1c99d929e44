'use client';
/**
 * The build-plan page: tabs for Weight, Power, Water, Gas and ventilation, Heating and insulation
 * (each a form over `doc.systems` with its results and findings), the parts list, the cut list and
 * the quote. The document lives in the editor's store, as in the editor: every form edit is one
 * `updateSystems` (one undo entry; typing merges), autosave saves it with the layout version
 * (If-Match) through the one save function, and a conflict opens the editor's dialog, which here
 * also offers to put these entries on their version. Never touches modules or the bay: those are
 * the editor's.
 */
import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore, type ReactNode } from 'react';
import dynamic from 'next/dynamic';
import { useStore } from 'zustand';
import { CircleAlert, CircleX } from 'lucide-react';
import type { LayoutDoc, LengthUnit } from '@/lib/layout';
import { BUILD_PLAN_CAUTION } from '@/lib/layout/cautions';
import { createEditorStore, isDirty } from '@/components/editor/store/editorStore';
import { EditorStoreProvider } from '@/components/editor/store/EditorStoreContext';
import { useAutosave } from '@/components/editor/api/useAutosave';
import { useLatestSaved } from '@/components/editor/api/useLatestSaved';
import { formatDateTime } from '@/lib/format';
import { useEditorKeyboard } from '@/components/editor/commands/useEditorKeyboard';
import { CommandButton } from '@/components/editor/panels/CommandButton';
import { SaveIndicator } from '@/components/editor/panels/SaveIndicator';
import { systemChecks } from '@/lib/checks/systems';
import type { Finding } from '@/lib/checks/types';
import type { CutOptions } from './cut/CutListPanel';
import { RevisionChooser, type DocumentsFrom } from './RevisionChooser';
import { Tabs } from '@/components/ui/Tabs';
import type { PanelProps } from './panelProps';
import { BUILD_TABS, type BuildTab } from './buildTabs';
import { ShowTabContext } from './FindingList';
import { foldWaiting, statusCounts } from '@/lib/checks/words';

// Each tab's panel is its own chunk, fetched when the tab is first opened (the page's own tab
// comes with the page). A visited form stays mounted, hidden, so half-typed fields survive.
const loadingTab = () => <p className="text-sm text-ink-soft" role="status">Loading…</p>;
const WeightPanel = dynamic(() => import('./weight/WeightPanel').then((m) => m.WeightPanel), { loading: loadingTab });
const PowerPanel = dynamic(() => import('./power/PowerPanel').then((m) => m.PowerPanel), { loading: loadingTab });
const WaterPanel = dynamic(() => import('./water/WaterPanel').then((m) => m.WaterPanel), { loading: loadingTab });
const GasPanel = dynamic(() => import('./gas/GasPanel').then((m) => m.GasPanel), { loading: loadingTab });
const HeatPanel = dynamic(() => import('./heat/HeatPanel').then((m) => m.HeatPanel), { loading: loadingTab });
const PartsListPanel = dynamic(() => import('./parts/PartsListPanel').then((m) => m.PartsListPanel), { loading: loadingTab });
const CutListPanel = dynamic(() => import('./cut/CutListPanel').then((m) => m.CutListPanel), { loading: loadingTab });
const QuotePanel = dynamic(() => import('./quote/QuotePanel').then((m) => m.QuotePanel), { loading: loadingTab });
// Shown only when someone saved first.
const ConflictDialog = dynamic(() => import('@/components/editor/panels/ConflictDialog').then((m) => m.ConflictDialog));


const TOPIC: Record<BuildTab, { title: string; prefix?: string }> = {
  weight: { title: 'Weight', prefix: 'mass.' },
  power: { title: 'Power', prefix: 'power.' },
  water: { title: 'Water', prefix: 'water.' },
  gas: { title: 'Gas & ventilation', prefix: 'gas.' },
  heat: { title: 'Heating & insulation', prefix: 'heat.' },
  parts: { title: 'Parts list' },
  cut: { title: 'Cut list' },
  quote: { title: 'Quote' },
};

export interface BuildPlannerProps {
  layoutId: string;
  layoutName: string;
  initialDoc: LayoutDoc;
  initialVersion: number;
  /** When that version was saved (ISO). */
  initialSavedAt?: string | null;
  canEdit: boolean;
  units: LengthUnit;
  clientName: string | null;
  initialTab?: BuildTab;
  /** What the parts list, the cut list and the quote are made from, and that revision's document. */
  documents: DocumentsFrom & { doc: LayoutDoc | null };
}

/** The build plan's own commands: the editor's, limited to what a form page does. */
const PLAN_COMMANDS = ['edit.undo', 'edit.redo', 'edit.save'] as const;

const noSubscription = () => () => undefined;

function counts(findings: Finding[], prefix: string) {
  const mine = foldWaiting(findings.filter((f) => f.id.startsWith(prefix))).judged;
  return { fail: mine.filter((f) => f.status === 'fail').length, warn: mine.filter((f) => f.status === 'warn').length };
}

export function BuildPlanner(props: BuildPlannerProps) {
  const { layoutId, canEdit, units, clientName } = props;
  const [store] = useState(() => createEditorStore({ doc: props.initialDoc, version: props.initialVersion, readOnly: !canEdit, units }));
  const doc = useStore(store, (s) => s.doc);
  const savedDoc = useStore(store, (s) => s.savedDoc);
  const unsaved = useStore(store, isDirty);
  const save = useAutosave(store, layoutId, canEdit);
  // The version as saved, the same the save indicator shows, checked against the server on opening
  // (a page the back button brings from the browser's cache is otherwise a copy from before).
  const { version, savedAt } = useLatestSaved(store, layoutId, { initialSavedAt: props.initialSavedAt });
  useEditorKeyboard(store, PLAN_COMMANDS);

  const [formKey, setFormKey] = useState(0);
  const [tab, setTab] = useState<BuildTab>(props.initialTab ?? 'weight');
  const [visited, setVisited] = useState<ReadonlySet<BuildTab>>(() => new Set([props.initialTab ?? 'weight']));
  const openTab = (t: BuildTab) => {
    setTab(t);
    setVisited((v) => (v.has(t) ? v : new Set(v).add(t)));
  };
  const [invalid, setInvalid] = useState<Set<string>>(new Set());
  const [cut, setCut] = useState<CutOptions>({ kerfMm: 3, trimMm: 0, respectGrain: true });

  // False in the server render and during hydration, true once React runs here (tests wait for it).
  const hydrated = useSyncExternalStore(noSubscription, () => true, () => false);
  const findings = useMemo(() => systemChecks(doc), [doc]);
  const dirty = unsaved || save.status === 'saving';

  // A form's own edit goes to the store; any other change of the inputs (undo, redo, their version
  // after a conflict) reloads the forms, which read their values once, at mount.
  const fromForm = useRef(false);
  useEffect(() => store.subscribe((s, prev) => {
    if (s.doc.systems === prev.doc.systems || fromForm.current) return;
    setInvalid(new Set());
    setFormKey((k) => k + 1);
  }), [store]);
  const onSystems = useCallback((patch: Parameters<PanelProps['onSystems']>[0]) => {
    fromForm.current = true;
    try {
      store.getState().updateSystems(patch);
    } finally {
      fromForm.current = false;
    }
  }, [store]);
  const validity = useMemo(() => {
    const make = (id: string) => (ok: boolean) => setInvalid((s) => {
      if (ok === !s.has(id)) return s;
      const next = new Set(s);
      if (ok) next.delete(id);
      else next.add(id);
      return next;
    });
    return Object.fromEntries(BUILD_TABS.map((t) => [t, make(t)])) as Record<BuildTab, (ok: boolean) => void>;
  }, []);

  /** After a conflict: their drawing, with my build-plan entries put on it as one edit (undoable), which then autosaves. */
  const keepMine = () => save.takeTheirs((mine) => {
    const theirs = store.getState().doc.systems ?? {};
    const keys = new Set([...Object.keys(theirs), ...Object.keys(mine.systems ?? {})]) as Set<keyof NonNullable<LayoutDoc['systems']>>;
    store.getState().updateSystems(Object.fromEntries([...keys].map((k) => [k, mine.systems?.[k]])), 'Put my build plan on their version');
  });

  // Issued means frozen: parts, cut list and quote come from the chosen revision; the draft only when chosen.
  const frozen = props.documents.revision && props.documents.doc ? { doc: props.documents.doc, version: props.documents.revision.layoutVersion } : null;
  const documentsHref = (choice: string) => `/layouts/${encodeURIComponent(layoutId)}/build?tab=${tab}&revision=${encodeURIComponent(choice)}`;
  const documentsChooser = <RevisionChooser from={props.documents} href={documentsHref} />;

  const panelProps = (t: BuildTab): PanelProps => ({ doc, units, readOnly: !canEdit, onSystems, onValidity: validity[t], findings });
  const panels: Partial<Record<BuildTab, ReactNode>> = {
    weight: <WeightPanel {...panelProps('weight')} />,
    power: <PowerPanel {...panelProps('power')} />,
    water: <WaterPanel {...panelProps('water')} />,
    gas: <GasPanel {...panelProps('gas')} />,
    heat: <HeatPanel {...panelProps('heat')} />,
  };
  const visibleTabs = BUILD_TABS.filter((t) => canEdit || t !== 'parts');
  const tabs = visibleTabs.map((t) => {
    const c = TOPIC[t].prefix ? counts(findings, TOPIC[t].prefix!) : null;
    return {
      id: t,
      title: `${TOPIC[t].title}${c ? `: ${statusCounts({ ...c, pass: 0 })}` : ''}${invalid.has(t) ? ', has a field to correct' : ''}`,
      label: (
        <span className="flex items-center gap-1.5">
          {TOPIC[t].title}
          {invalid.has(t) && <CircleX size={12} className="text-brick" aria-hidden="true" />}
          {c && c.fail > 0 && <span className="inline-flex items-center gap-0.5 font-mono text-xs text-brick"><CircleX size={12} aria-hidden="true" />{c.fail}</span>}
          {c && c.warn > 0 && <span className="inline-flex items-center gap-0.5 font-mono text-xs text-ochre"><CircleAlert size={12} aria-hidden="true" />{c.warn}</span>}
        </span>
      ),
    };
  });

  return (
    <EditorStoreProvider store={store}>
    <header>
      <h1 className="text-xl font-semibold">Build plan · {props.layoutName}</h1>
      <p className="text-sm text-ink-soft" data-testid="build-plan-facts">
        Bay <span className="font-mono">{doc.bay.length} × {doc.bay.width} × {doc.bay.height} mm</span> · version <span className="font-mono" data-testid="saved-version">{version}</span>
        {savedAt ? <>, saved <span data-testid="saved-at">{formatDateTime(savedAt)}</span></> : ''}
        {clientName ? ` · for ${clientName}` : ''}
        {canEdit ? '' : ' · view only'}
      </p>
      {doc.systems?.note && <p className="mt-1 text-sm text-ink-soft">{doc.systems.note}</p>}
      <p className="mt-1 text-xs text-ink-soft">{BUILD_PLAN_CAUTION}</p>
    </header>
    <div className="space-y-4" data-testid="build-planner" data-dirty={dirty} data-hydrated={hydrated}>
      {canEdit && (
        <div className="sticky top-0 z-10 flex flex-wrap items-center gap-3 border-b border-paper-edge bg-paper py-2">
          <CommandButton id="edit.undo" withLabel />
          <CommandButton id="edit.redo" withLabel />
          <SaveIndicator status={save.status} version={version} detail={save.lastError} leavingFor={save.leavingFor} />
          {invalid.size > 0 && (
            <span className="text-sm text-brick" role="status" data-testid="fields-to-correct">
              Correct the marked fields in {[...invalid].map((t) => TOPIC[t as BuildTab].title).join(', ')}: until then their last good values are the ones saved.
            </span>
          )}
        </div>
      )}
      {canEdit && save.conflict && (
        <ConflictDialog
          conflict={save.conflict}
          onTakeTheirs={() => save.takeTheirs()}
          onClose={save.closeConflict}
          keepMine={{ label: 'Put my build plan on their version', run: keepMine }}
        />
      )}
      <ShowTabContext.Provider value={openTab}>
      <Tabs className="panel" label="Build plan" tabs={tabs} active={tab} onChange={(t) => openTab(t as BuildTab)}>
        <div className="p-4" key={formKey}>
          {/* Forms stay mounted (hidden) so a half-typed field survives a tab change. */}
          {(['weight', 'power', 'water', 'gas', 'heat'] as const).filter((t) => visited.has(t)).map((t) => (
            <div key={t} hidden={tab !== t}>{panels[t]}</div>
          ))}
          {(tab === 'parts' || tab === 'cut' || (tab === 'quote' && canEdit)) && <div className="mb-3">{documentsChooser}</div>}
          {tab === 'parts' && canEdit && <PartsListPanel layoutId={layoutId} doc={frozen?.doc ?? doc} cut={cut} dirty={!frozen && dirty} revision={props.documents.revision?.letter ?? null} />}
          {tab === 'cut' && <CutListPanel doc={frozen?.doc ?? doc} options={cut} onOptions={setCut} />}
          {tab === 'quote' && (canEdit
            ? <QuotePanel layoutId={layoutId} savedDoc={frozen?.doc ?? savedDoc} savedVersion={frozen?.version ?? version} revision={props.documents.revision} clientName={clientName} dirty={!frozen && dirty} cut={cut} canSend={canEdit} />
            : <p className="text-sm">Your workshop&apos;s quote for this layout is on <a className="text-copper underline" href={`/layouts/${layoutId}/quote`}>the quote page</a>.</p>)}
        </div>
      </Tabs>
      </ShowTabContext.Provider>
    </div>
    </EditorStoreProvider>
  );
}
