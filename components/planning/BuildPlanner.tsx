'use client';
/**
 * The build-plan page's working area: tabs for Weight, Power, Water, Gas and ventilation,
 * Heating and insulation (each a form over `doc.systems` with its results and findings), the
 * parts list, the cut list and the quote. It keeps the draft document and the saved one, runs
 * the system checks on the draft as it changes, and saves the draft's systems with the layout
 * version (If-Match); when someone saved first it says so and offers to put these entries on
 * their version or to open the saved version. Never touches modules or the bay: those are the editor's.
 */
import { useCallback, useEffect, useMemo, useState, useSyncExternalStore, type ReactNode } from 'react';
import dynamic from 'next/dynamic';
import { CircleAlert, CircleX, Save } from 'lucide-react';
import { toast } from 'sonner';
import type { LayoutDoc, LengthUnit } from '@/lib/layout';
import { systemChecks } from '@/lib/checks/systems';
import type { Finding } from '@/lib/checks/types';
import type { CutOptions } from './cut/CutListPanel';
import { PlanTabs } from './PlanTabs';
import { saveLayoutDoc, stableJson, withSystems, type SaveOutcome } from './saveLayout';
import type { PanelProps } from './panelProps';
import { BUILD_TABS, type BuildTab } from './buildTabs';
import { ShowTabContext } from './FindingList';
import { foldWaiting, statusCounts } from '@/lib/checks/words';
import { fieldName } from '@/lib/layout/field-names';

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
  initialDoc: LayoutDoc;
  initialVersion: number;
  canEdit: boolean;
  units: LengthUnit;
  clientName: string | null;
  initialTab?: BuildTab;
}

type Conflict = Extract<SaveOutcome, { kind: 'conflict' }>['theirs'];

const noSubscription = () => () => undefined;

function counts(findings: Finding[], prefix: string) {
  const mine = foldWaiting(findings.filter((f) => f.id.startsWith(prefix))).judged;
  return { fail: mine.filter((f) => f.status === 'fail').length, warn: mine.filter((f) => f.status === 'warn').length };
}

export function BuildPlanner(props: BuildPlannerProps) {
  const { layoutId, canEdit, units, clientName } = props;
  const [saved, setSaved] = useState({ doc: props.initialDoc, version: props.initialVersion });
  const [draft, setDraft] = useState(props.initialDoc);
  const [formKey, setFormKey] = useState(0);
  const [tab, setTab] = useState<BuildTab>(props.initialTab ?? 'weight');
  const [visited, setVisited] = useState<ReadonlySet<BuildTab>>(() => new Set([props.initialTab ?? 'weight']));
  const openTab = (t: BuildTab) => {
    setTab(t);
    setVisited((v) => (v.has(t) ? v : new Set(v).add(t)));
  };
  const [invalid, setInvalid] = useState<Set<string>>(new Set());
  const [saving, setSaving] = useState(false);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [refused, setRefused] = useState<Extract<SaveOutcome, { kind: 'invalid' }> | null>(null);
  const [cut, setCut] = useState<CutOptions>({ kerfMm: 3, trimMm: 0, respectGrain: true });

  // False in the server render and during hydration, true once React runs here (tests wait for it).
  const hydrated = useSyncExternalStore(noSubscription, () => true, () => false);
  const findings = useMemo(() => systemChecks(draft), [draft]);
  const dirty = useMemo(() => stableJson(draft.systems ?? null) !== stableJson(saved.doc.systems ?? null), [draft, saved]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const onSystems = useCallback((patch: Parameters<PanelProps['onSystems']>[0]) => setDraft((d) => withSystems(d, patch)), []);
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

  const save = async (doc: LayoutDoc, version: number) => {
    setSaving(true);
    setRefused(null);
    const out = await saveLayoutDoc(layoutId, doc, version);
    setSaving(false);
    if (out.kind === 'saved') {
      setSaved({ doc, version: out.version });
      setConflict(null);
      toast.success(`Build plan saved (version ${out.version})`);
    } else if (out.kind === 'conflict') setConflict(out.theirs);
    else if (out.kind === 'invalid') setRefused(out);
    else toast.error(out.message);
  };

  const keepMineOnTheirs = () => {
    if (!conflict) return;
    const merged = { ...conflict.doc, systems: draft.systems };
    if (!merged.systems) delete merged.systems;
    setDraft(merged);
    setSaved({ doc: conflict.doc, version: conflict.version });
    void save(merged, conflict.version);
  };
  const loadTheirs = () => {
    if (!conflict) return;
    setSaved({ doc: conflict.doc, version: conflict.version });
    setDraft(conflict.doc);
    setInvalid(new Set());
    setFormKey((k) => k + 1);
    setConflict(null);
  };

  const panelProps = (t: BuildTab): PanelProps => ({ doc: draft, units, readOnly: !canEdit, onSystems, onValidity: validity[t], findings });
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
    <div className="space-y-4" data-testid="build-planner" data-dirty={dirty} data-hydrated={hydrated}>
      {canEdit && (
        <div className="sticky top-0 z-10 flex flex-wrap items-center gap-3 border-b border-paper-edge bg-paper py-2">
          <button type="button" className="btn-primary" disabled={!dirty || saving || invalid.size > 0 || !!conflict} onClick={() => save(draft, saved.version)}>
            <Save size={14} aria-hidden="true" /> {saving ? 'Saving…' : 'Save build plan'}
          </button>
          <span className="text-sm text-ink-soft" role="status" data-testid="save-state">
            {invalid.size > 0 ? `Correct the marked fields in ${[...invalid].map((t) => TOPIC[t as BuildTab].title).join(', ')} to save.`
              : dirty ? 'Unsaved changes.' : `Saved · version ${saved.version}`}
          </span>
        </div>
      )}
      {conflict && (
        <div role="alert" className="rounded-sm border border-brick bg-brick-light p-3 text-sm" data-testid="conflict">
          <p className="font-semibold">Someone saved this layout after you opened it (now version {conflict.version}{conflict.updatedBy ? `, by ${conflict.updatedBy}` : ''}).</p>
          <p className="mt-1">Your build-plan entries are still here. Their drawing may have changed modules, so check the results after either choice.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className="btn-primary" onClick={keepMineOnTheirs}>Put my build plan on their version and save</button>
            <button type="button" className="btn-quiet" onClick={loadTheirs}>Discard my entries and open the saved version</button>
          </div>
        </div>
      )}
      {refused && (
        <div role="alert" className="rounded-sm border border-brick bg-brick-light p-3 text-sm">
          <p className="font-semibold">{refused.message}</p>
          <ul className="mt-1 list-disc pl-5 text-xs">{refused.issues.map((i, n) => <li key={n}>{fieldName(i.path)}: {i.message}</li>)}</ul>
        </div>
      )}
      <ShowTabContext.Provider value={openTab}>
      <PlanTabs tabs={tabs} active={tab} onChange={(t) => openTab(t as BuildTab)}>
        <div className="p-4" key={formKey}>
          {/* Forms stay mounted (hidden) so a half-typed field survives a tab change. */}
          {(['weight', 'power', 'water', 'gas', 'heat'] as const).filter((t) => visited.has(t)).map((t) => (
            <div key={t} hidden={tab !== t}>{panels[t]}</div>
          ))}
          {tab === 'parts' && canEdit && <PartsListPanel layoutId={layoutId} doc={draft} cut={cut} dirty={dirty} />}
          {tab === 'cut' && <CutListPanel doc={draft} options={cut} onOptions={setCut} />}
          {tab === 'quote' && (canEdit
            ? <QuotePanel layoutId={layoutId} savedDoc={saved.doc} savedVersion={saved.version} clientName={clientName} dirty={dirty} cut={cut} canSend={canEdit} />
            : <p className="text-sm">Your workshop&apos;s quote for this layout is on <a className="text-copper underline" href={`/layouts/${layoutId}/quote`}>the quote page</a>.</p>)}
        </div>
      </PlanTabs>
      </ShowTabContext.Provider>
    </div>
  );
}
