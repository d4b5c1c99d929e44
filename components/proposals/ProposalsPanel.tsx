'use client';
// Proposals from a client's brief: the brief form, progress while the server lays out and checks
// the candidates (cancellable), the proposals side by side as small plans with their figures and
// explained scores, "Open as a new layout" through the ordinary create route (on an existing
// layout's Proposals page: "Open as a variant of this layout", its variants route) — or, when nothing
// fits, the reasons and the nearest candidates with what they miss.
import { useEffect, useRef, useState } from 'react';
import { useRouter } from 'next/navigation';
import { useForm, type Resolver } from 'react-hook-form';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { NDJSON, readProgressStream } from '@/lib/api/progress-stream';
import { formatNumber } from '@/lib/format';
import type { LayoutDto } from '@/db/layouts';
import type { Bay } from '@/lib/layout/schema';
import {
  BED_PREFERENCE_WORDS, BED_PREFERENCES, briefSchema, FRIDGE_SIZES, MATTRESS_CLASSES, PRIORITIES, PRIORITY_WORDS, TYPICAL_BRIEF, type Brief,
} from '@/lib/proposals/brief';
import type { Proposal, ProposalResult } from '@/lib/proposals/generate';
import { METRIC_WORDS } from '@/lib/proposals/score';
import { PlanThumbnail } from './PlanThumbnail';
import type { BayTemplateChoice } from '@/components/layouts/NewLayoutForm';

interface Values {
  /** A bay template's id, THIS_LAYOUT, or MEASURED (the fields below). */
  template: string;
  bayLength: string;
  bayWidth: string;
  bayHeight: string;
  archX: string;
  archLength: string;
  archWidth: string;
  archHeight: string;
  doorOffset: string;
  doorWidth: string;
  sleepers: string;
  standing: string;
  beltedSeats: string;
  bed: Brief['bed'];
  mattress: Brief['mattress'];
  counterMin: string;
  sink: boolean;
  hob: boolean;
  fridge: Brief['kitchen']['fridge'];
  days: string;
  people: string;
  toilet: boolean;
  shower: boolean;
  fuel: Brief['fuel'];
  garage: string;
  priority: Brief['priority'];
}

const MATTRESS_WORDS: Record<Brief['mattress'], string> = { none: 'No standard size', single: 'Single', 'small-double': 'Small double', double: 'Double', king: 'King', 'super-king': 'Super king' };
const FRIDGE_WORDS: Record<Brief['kitchen']['fridge'], string> = { none: 'None', small: 'Small (about 30 L)', medium: 'Medium (about 50 L)', large: 'Large (about 85 L)' };

/** Which form field a brief path belongs to. */
const FIELD_OF: Record<string, keyof Values> = {
  'bay.template': 'template', 'bay.bay.length': 'bayLength', 'bay.bay.width': 'bayWidth', 'bay.bay.height': 'bayHeight',
 sleepers: 'sleepers', standing: 'standing', beltedSeats: 'beltedSeats', bed: 'bed', mattress: 'mattress',
  'kitchen.counterMin': 'counterMin', 'kitchen.fridge': 'fridge', 'water.days': 'days', 'water.people': 'people', garageHeight: 'garage', priority: 'priority',
};

/** A measured bay's arch and door fields, by the last step of an issue's path (both arches share their fields). */
const ARCH_FIELD: Record<string, keyof Values> = { x: 'archX', length: 'archLength', width: 'archWidth', height: 'archHeight' };
const DOOR_FIELD: Record<string, keyof Values> = { offset: 'doorOffset', width: 'doorWidth' };
function measuredField(path: string[]): keyof Values | undefined {
  if (path[0] !== 'bay' || path[1] !== 'bay') return undefined;
  if (path[2] === 'wheelArches') return ARCH_FIELD[path[4]];
  if (path[2] === 'doors') return path[3] === '0' ? DOOR_FIELD[path[4]] : 'bayWidth';
  return undefined;
}

const num = (s: string): number => (s.trim() === '' ? Number.NaN : Number(s.trim()));

/** The Bay choice that stands for the existing layout's own (measured) bay. */
const THIS_LAYOUT = 'this-layout';
/** The Bay choice for a bay measured by hand: the fields the Bay panel uses, validated by the same bay schema. */
const MEASURED = 'measured';

/**
 * A measured bay from the form: its length, width and height, a pair of wheel arches alike on both
 * sides, the side door on the right-hand wall and rear doors across the full width.
 */
function measuredBay(v: Values): unknown {
  const arch = (side: 'left' | 'right') => ({ side, x: num(v.archX), length: num(v.archLength), width: num(v.archWidth), height: num(v.archHeight) });
  return {
    length: num(v.bayLength), width: num(v.bayWidth), height: num(v.bayHeight),
    wheelArches: [arch('left'), arch('right')],
    doors: [{ id: 'side', wall: 'right', offset: num(v.doorOffset), width: num(v.doorWidth) }, { id: 'rear', wall: 'rear', offset: 0, width: num(v.bayWidth) }],
    bulkhead: true, cabSeats: 2,
  };
}

/** The layout a proposal is made for (its Proposals page): its bay, and the brief read from it. */
export interface ProposalsFor {
  id: string;
  name: string;
  bay: Bay;
  brief: Brief;
}

function toBrief(v: Values, forLayout?: ProposalsFor): unknown {
  return {
    bay: forLayout && v.template === THIS_LAYOUT ? { source: 'measured', bay: forLayout.bay }
      : v.template === MEASURED ? { source: 'measured', bay: measuredBay(v) }
        : { source: 'template', template: v.template },
    sleepers: v.sleepers.split(/[,;\s]+/).filter(Boolean).map(num),
    standing: v.standing.trim() === '' ? null : num(v.standing),
    beltedSeats: num(v.beltedSeats),
    bed: v.bed,
    mattress: v.mattress,
    kitchen: { counterMin: num(v.counterMin), sink: v.sink, hob: v.hob, fridge: v.fridge },
    water: { days: num(v.days), people: num(v.people) },
    toilet: v.toilet,
    shower: v.shower,
    fuel: v.fuel,
    garageHeight: v.garage.trim() === '' ? null : num(v.garage),
    priority: v.priority,
    seed: 1,
  };
}

/** The brief's own schema decides; its messages land beside the field they concern. */
const resolverFor = (forLayout?: ProposalsFor): Resolver<Values> => async (values) => {
  const parsed = briefSchema.safeParse(toBrief(values, forLayout));
  if (parsed.success) return { values, errors: {} };
  const errors: Record<string, { type: string; message: string }> = {};
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String);
    const key = FIELD_OF[path.join('.')] ?? measuredField(path) ?? FIELD_OF[path[0]] ?? (path[0] === 'sleepers' ? 'sleepers' : undefined);
    if (key && !errors[key]) errors[key] = { type: 'brief', message: issue.message };
  }
  return { values: {}, errors: errors as never };
};

/** A measured bay's fields start at a common long high-roof van's figures (the designer types their own). */
const MEASURED_DEFAULTS = { bayLength: '3800', bayWidth: '1800', bayHeight: '2000', archX: '2050', archLength: '950', archWidth: '210', archHeight: '320', doorOffset: '150', doorWidth: '1200' };

const DEFAULTS: Values = {
  template: 'l3h2',
  ...MEASURED_DEFAULTS,
  sleepers: TYPICAL_BRIEF.sleepers.join(', '),
  standing: String(TYPICAL_BRIEF.standing ?? ''),
  beltedSeats: '0',
  bed: 'any',
  mattress: 'none',
  counterMin: String(TYPICAL_BRIEF.kitchen.counterMin),
  sink: true,
  hob: true,
  fridge: 'medium',
  days: String(TYPICAL_BRIEF.water.days),
  people: String(TYPICAL_BRIEF.water.people),
  toilet: false,
  shower: false,
  fuel: 'gas',
  garage: '',
  priority: 'floor',
};

/** The form's values for a brief read from a layout. */
function valuesOf(b: Brief): Values {
  return {
    template: THIS_LAYOUT,
    ...MEASURED_DEFAULTS,
    sleepers: b.sleepers.join(', '),
    standing: b.standing === null ? '' : String(b.standing),
    beltedSeats: String(b.beltedSeats),
    bed: b.bed,
    mattress: b.mattress,
    counterMin: String(b.kitchen.counterMin),
    sink: b.kitchen.sink,
    hob: b.kitchen.hob,
    fridge: b.kitchen.fridge,
    days: String(b.water.days),
    people: String(b.water.people),
    toilet: b.toilet,
    shower: b.shower,
    fuel: b.fuel,
    garage: b.garageHeight === null ? '' : String(b.garageHeight),
    priority: b.priority,
  };
}

export function ProposalsPanel({ templates, forLayout }: { templates: BayTemplateChoice[]; forLayout?: ProposalsFor }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const abort = useRef<AbortController | null>(null);
  const [startedAt, setStartedAt] = useState(0);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const { register, handleSubmit, formState, watch } = useForm<Values>({ resolver: resolverFor(forLayout), defaultValues: forLayout ? valuesOf(forLayout.brief) : DEFAULTS });

  const run = useMutation({
    mutationFn: (v: Values) => {
      abort.current = new AbortController();
      setStartedAt(Date.now());
      setProgress(null);
      return fetchProposals(toBrief(v, forLayout), abort.current.signal, (done, total) => setProgress({ done, total }));
    },
    onError: (err) => {
      if (err instanceof DOMException && err.name === 'AbortError') toast('Proposals cancelled.');
      else toast.error(err instanceof ApiError || err instanceof Error ? err.message : 'The proposals could not be made.');
    },
  });

  const open = useMutation({
    mutationFn: (p: Proposal) => forLayout
      ? apiFetch<LayoutDto>(`/api/layouts/${forLayout.id}/variants`, { method: 'POST', json: { doc: p.doc } })
      : apiFetch<LayoutDto>('/api/layouts', { method: 'POST', json: { name: p.title, doc: p.doc } }),
    onSuccess: (layout) => {
      queryClient.invalidateQueries({ queryKey: ['layouts'] });
      toast.success(`Created “${layout.name}”`);
      router.push(`/layouts/${layout.id}`);
    },
    onError: (err) => toast.error(err instanceof Error ? err.message : 'The layout could not be created.'),
  });

  const error = (key: keyof Values) => formState.errors[key] && <p className="field-error">{formState.errors[key]?.message}</p>;
  const result = run.data;
  // When the answer comes, bring it into view and move the keyboard focus to its heading.
  const answer = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (!result) return;
    answer.current?.scrollIntoView({ block: 'start' });
    answer.current?.focus();
  }, [result]);

  return (
    <div className="space-y-6">
      <form onSubmit={handleSubmit((v) => run.mutate(v))} className="space-y-4" noValidate aria-label="Brief">
        <div className="grid grid-cols-2 gap-3">
          <div className="col-span-2">
            <label className="label" htmlFor="p-template">Bay</label>
            <select id="p-template" className="field" {...register('template')}>
              {forLayout && <option value={THIS_LAYOUT}>This layout’s bay — {forLayout.bay.length} × {forLayout.bay.width} × {forLayout.bay.height} mm</option>}
              {templates.map((t) => <option key={t.id} value={t.id}>{t.name} — {t.bay.length} × {t.bay.width} × {t.bay.height} mm</option>)}
              <option value={MEASURED}>My own measurements</option>
            </select>
          </div>
          {watch('template') === MEASURED && (
            <fieldset className="col-span-2 grid grid-cols-3 gap-3">
              <legend className="label">Bare-metal load space, wheel arches (both sides) and side door, mm</legend>
              {([
                ['bayLength', 'Length (bulkhead to rear door)'], ['bayWidth', 'Width (wall to wall)'], ['bayHeight', 'Height (floor to roof)'],
                ['archX', 'Arch from bulkhead'], ['archLength', 'Arch length'], ['archWidth', 'Arch stands in from wall'], ['archHeight', 'Arch height'],
                ['doorOffset', 'Side door from bulkhead'], ['doorWidth', 'Side door opening'],
              ] as const).map(([key, label]) => (
                <div key={key}>
                  <label className="text-xs text-ink-soft" htmlFor={`p-${key}`}>{label}</label>
                  <input id={`p-${key}`} className="field font-mono" inputMode="numeric" {...register(key)} />
                  {error(key)}
                </div>
              ))}
            </fieldset>
          )}
          <div>
            <label className="label" htmlFor="p-sleepers">Sleepers’ statures (mm)</label>
            <input id="p-sleepers" className="field font-mono" placeholder="1800, 1650" {...register('sleepers')} />
            {error('sleepers')}
          </div>
          <div>
            <label className="label" htmlFor="p-standing">Standing stature (mm)</label>
            <input id="p-standing" className="field font-mono" inputMode="numeric" placeholder="empty: nobody stands" {...register('standing')} />
            {error('standing')}
          </div>
          <div>
            <label className="label" htmlFor="p-bed">Bed</label>
            <select id="p-bed" className="field" {...register('bed')}>
              {BED_PREFERENCES.map((b) => <option key={b} value={b}>{BED_PREFERENCE_WORDS[b]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="p-mattress">Mattress at least</label>
            <select id="p-mattress" className="field" {...register('mattress')}>
              {MATTRESS_CLASSES.map((m) => <option key={m} value={m}>{MATTRESS_WORDS[m]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="p-seats">Belted seats behind the cab</label>
            <input id="p-seats" className="field font-mono" inputMode="numeric" {...register('beltedSeats')} />
            {error('beltedSeats')}
          </div>
          <div>
            <label className="label" htmlFor="p-garage">Garage under a fixed bed (mm)</label>
            <input id="p-garage" className="field font-mono" inputMode="numeric" placeholder="empty: none" {...register('garage')} />
            {error('garage')}
          </div>
        </div>
        <fieldset className="grid grid-cols-2 gap-3">
          <legend className="label">Kitchen</legend>
          <div>
            <label className="text-xs text-ink-soft" htmlFor="p-counter">Counter at least (mm)</label>
            <input id="p-counter" className="field font-mono" inputMode="numeric" {...register('counterMin')} />
            {error('counterMin')}
          </div>
          <div>
            <label className="text-xs text-ink-soft" htmlFor="p-fridge">Fridge</label>
            <select id="p-fridge" className="field" {...register('fridge')}>
              {FRIDGE_SIZES.map((f) => <option key={f} value={f}>{FRIDGE_WORDS[f]}</option>)}
            </select>
          </div>
          <label className="inline-flex items-center gap-2 text-sm"><input type="checkbox" {...register('sink')} /> Sink</label>
          <label className="inline-flex items-center gap-2 text-sm"><input type="checkbox" {...register('hob')} /> Hob</label>
        </fieldset>
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="label" htmlFor="p-days">Days between water fills</label>
            <input id="p-days" className="field font-mono" inputMode="numeric" {...register('days')} />
            {error('days')}
          </div>
          <div>
            <label className="label" htmlFor="p-people">People using water</label>
            <input id="p-people" className="field font-mono" inputMode="numeric" {...register('people')} />
            {error('people')}
          </div>
          <label className="inline-flex items-center gap-2 text-sm"><input type="checkbox" {...register('toilet')} /> Toilet</label>
          <label className="inline-flex items-center gap-2 text-sm"><input type="checkbox" {...register('shower')} /> Shower</label>
          <fieldset>
            <legend className="label">Cooking and heating</legend>
            <div className="flex gap-4 text-sm">
              <label className="inline-flex items-center gap-2"><input type="radio" value="gas" {...register('fuel')} /> Gas</label>
              <label className="inline-flex items-center gap-2"><input type="radio" value="electric" {...register('fuel')} /> All-electric</label>
            </div>
          </fieldset>
          <div>
            <label className="label" htmlFor="p-priority">What matters most</label>
            <select id="p-priority" className="field" {...register('priority')}>
              {PRIORITIES.map((p) => <option key={p} value={p}>{PRIORITY_WORDS[p]}</option>)}
            </select>
          </div>
        </div>
        <p className="text-xs text-ink-soft">
          Gas, 230 V, heating and seat belts in these proposals are starting points only: the installation must be designed, fitted and tested by qualified people under local codes.
        </p>
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={run.isPending}>{run.isPending ? 'Proposing…' : 'Propose layouts'}</button>
          {run.isPending && <button type="button" className="btn-quiet" onClick={() => abort.current?.abort()}>Cancel</button>}
        </div>
        {run.isPending && <Progress startedAt={startedAt} progress={progress} />}
      </form>

      {result && result.ok && (
        <section aria-label="Proposals" className="space-y-3">
          <h3 ref={answer} tabIndex={-1} className="text-sm font-semibold outline-none">Proposals for this brief</h3>
          <p className="text-sm text-ink-soft">
            {result.proposals.length} proposals from {result.stats.checked} checked candidates ({result.stats.passed} met every check). Each meets every check; open one to refine it.
          </p>
          <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            {result.proposals.map((p) => (
              <li key={p.letter} className="rounded border border-paper-edge bg-paper-light p-3" aria-label={p.title}>
                <h4 className="text-sm font-semibold">{p.title}</h4>
                <p className="text-xs text-ink-soft">{p.zoning}</p>
                <PlanThumbnail doc={p.doc} title={p.title} />
                <dl className="mt-2 grid grid-cols-2 gap-x-2 text-xs">
                  <dt>Walkway</dt><dd className="font-mono">{p.figures.walkwayMm} mm</dd>
                  <dt>Bed</dt><dd className="font-mono">{p.figures.bedLongMm} × {p.figures.bedShortMm} mm</dd>
                  <dt>Counter</dt><dd className="font-mono">{p.figures.counterMm} mm</dd>
                  <dt>Fresh / grey</dt><dd className="font-mono">{p.figures.freshL} / {p.figures.greyL} L</dd>
                  <dt>Score</dt><dd className="font-mono">{p.total} / 100</dd>
                </dl>
                <details className="mt-2 text-xs">
                  <summary className="cursor-pointer">Why this score</summary>
                  <ul className="mt-1 space-y-1">
                    {p.scores.map((s) => <li key={s.metric}><span className="font-semibold">{METRIC_WORDS[s.metric]}</span> {s.points}/100{s.weight > 1 ? ' (counts three times: what matters most)' : ''}: {s.words}</li>)}
                  </ul>
                </details>
                <button type="button" className="btn-primary mt-3" disabled={open.isPending} onClick={() => open.mutate(p)}>{forLayout ? 'Open as a variant of this layout' : 'Open as a new layout'}</button>
              </li>
            ))}
          </ul>
        </section>
      )}

      {result && !result.ok && (
        <section aria-label="Why no proposal fits" className="space-y-3">
          <h3 ref={answer} tabIndex={-1} className="text-sm font-semibold outline-none">No arrangement meets this brief in this bay</h3>
          <ul className="list-disc space-y-1 pl-5 text-sm">
            {result.reasons.map((r, i) => <li key={i}><span className="font-semibold">{r.rule}:</span> {r.message}</li>)}
          </ul>
          {result.nearest.length > 0 && (
            <>
              <h4 className="text-sm font-semibold">Nearest candidates, and what each misses</h4>
              <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2">
                {result.nearest.map((n, i) => (
                  <li key={i} className="rounded border border-paper-edge p-3">
                    <p className="text-xs font-semibold">{n.title}</p>
                    <p className="text-xs text-ink-soft">{n.zoning}</p>
                    <PlanThumbnail doc={n.doc} title={n.title} />
                    <ul className="mt-1 list-disc pl-4 text-xs">{n.misses.map((m, k) => <li key={k}>{m.message}</li>)}</ul>
                  </li>
                ))}
              </ul>
            </>
          )}
        </section>
      )}
    </div>
  );
}

/**
 * Asks for the proposals as a progress stream (lib/api/progress-stream.ts): the bar follows the
 * server's count of candidates; aborting the signal closes the request, and the server stops.
 */
async function fetchProposals(brief: unknown, signal: AbortSignal, onProgress: (done: number, total: number) => void): Promise<ProposalResult> {
  const res = await fetch('/api/proposals', {
    method: 'POST',
    headers: { 'content-type': 'application/json', accept: NDJSON },
    body: JSON.stringify(brief),
    signal,
  });
  if (!res.ok) {
    const body = await res.json().catch(() => ({}));
    throw new ApiError(res.status, body.error ?? `Request failed (${res.status})`, body);
  }
  return readProgressStream<ProposalResult>(res, onProgress);
}

function Progress({ startedAt, progress }: { startedAt: number; progress: { done: number; total: number } | null }) {
  const [now, setNow] = useState(startedAt);
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 250);
    return () => clearInterval(timer);
  }, []);
  const seconds = Math.max(0, (now - startedAt) / 1000);
  return (
    <div role="status" className="space-y-1 text-sm text-ink-soft">
      {progress && progress.total > 0
        ? <progress className="w-full" aria-label="Laying out and checking candidates" max={progress.total} value={progress.done} />
        : <progress className="w-full" aria-label="Laying out and checking candidates" />}
      <p>Laying out and checking candidate arrangements{progress ? `: ${formatNumber(progress.done)} of ${formatNumber(progress.total)}` : '…'} {seconds.toFixed(1)} s</p>
    </div>
  );
}
