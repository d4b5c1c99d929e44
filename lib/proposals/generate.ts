/**
 * The proposal generator: from a brief to the best few checked layouts, or to the honest reasons
 * none can be made. It enumerates every variant of every pattern the brief allows (patterns.ts),
 * in an order shuffled by the brief's seed, up to MAX_CANDIDATES; lays each out, skipping one
 * already seen; builds it as a stored layout document through the parser; runs the full check
 * engine; keeps those with no failing finding that also meet the brief; scores them (score.ts);
 * and returns the best of each zoning (pattern, kitchen wall, wet-room wall) — never the same plan
 * shifted. When none passes, the reasons come from the checks' own findings (rule, measured,
 * required) and the layout misses, with the nearest candidates and what each misses.
 *
 * Deterministic for a brief (its seed included); no clock, no randomness of its own, no I/O.
 * Pure: must never import React, Next, the database or the services.
 */
import { runChecks } from '../checks';
import { findBeds, type Bed } from '../checks/beds';
import { resolveSettings } from '../checks/settings';
import type { CheckReport, Finding } from '../checks/types';
import { buildUpThickness } from '../layout/bay';
import { parseLayoutDoc } from '../layout/parse';
import type { Bay, LayoutDoc } from '../layout/schema';
import { bayTemplate, DEFAULT_BUILD_UP } from '../layout/templates';
import { BED_PREFERENCE_WORDS, mattressOfClass, type Brief } from './brief';
import { frameOf, unmirror, type Frame } from './frame';
import { toModule, type Part } from './parts';
import { isLounge, layOut, PATTERNS, patternsFor, type LayoutMiss, type PatternId, type Variant } from './patterns';
import { figuresOf, scoreAll, type Figures, type Score } from './score';
import { explainFinding, explainMiss, type Reason } from './reasons';

/**
 * Proposals are written as version-3 documents (each module's top per arrangement set by
 * `surfacesOf`) and go through `parseLayoutDoc`, like every document that enters the system.
 */
const PROPOSAL_SCHEMA_VERSION = 3;

/** At most this many candidates are laid out and checked for one brief (bounded work per request). */
export const MAX_CANDIDATES = 2000;
/** Proposals returned at most; nearest candidates shown when none passes. */
export const MAX_PROPOSALS = 4;
export const MAX_NEAREST = 3;

export interface Proposal {
  /** A, B, C… in the order shown. */
  letter: string;
  pattern: PatternId;
  title: string;
  /** What makes it different: pattern, bed orientation, where the kitchen and wet room stand. */
  zoning: string;
  doc: LayoutDoc;
  figures: Figures;
  scores: Score[];
  total: number;
}

export interface NearMiss {
  pattern: PatternId;
  title: string;
  zoning: string;
  doc: LayoutDoc;
  misses: Reason[];
}

export interface ProposalStats {
  /** Variants enumerated for the brief (before the cap). */
  variants: number;
  /** Candidates laid out and run through the check engine. */
  checked: number;
  passed: number;
  /** Variants that could not be laid out at all. */
  notLaidOut: number;
}

export interface ProposalResult {
  ok: boolean;
  proposals: Proposal[];
  /** When nothing passes: why, in the trade's words, strongest first. */
  reasons: Reason[];
  nearest: NearMiss[];
  stats: ProposalStats;
}

export interface GenerateOptions {
  maxCandidates?: number;
  /** Told how far the search is, every 50 candidates (the worker passes it on). */
  onProgress?: (done: number, total: number) => void;
  /** Read before each candidate: true stops the search with `ProposalsCancelledError`. */
  cancelled?: () => boolean;
}

/** The search was stopped because the caller cancelled it. */
export class ProposalsCancelledError extends Error {
  constructor() {
    super('The proposals were cancelled.');
    this.name = 'JobCancelled';
  }
}

/** The bay a brief names: a template by id, or the measured bay. Throws a RangeError for an unknown template. */
export function briefBay(brief: Brief): Bay {
  if (brief.bay.source === 'measured') return brief.bay.bay;
  const t = bayTemplate(brief.bay.template);
  if (!t) throw new RangeError(`no bay template "${brief.bay.template}"`);
  return t.bay;
}

/** A small deterministic generator (mulberry32) for the seeded order. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function variantsFor(brief: Brief): Variant[] {
  const out: Variant[] = [];
  const walls = ['left', 'right'] as const;
  const hasWet = brief.toilet || brief.shower;
  for (const pattern of patternsFor(brief.bed, brief.sleepers.length)) {
    for (const bedStep of [0, 1, 2]) {
      for (const raised of isLounge(pattern) || brief.garageHeight !== null ? [false] : [false, true]) {
        for (const kitchenWall of walls) {
          for (const wetWall of hasWet ? walls : (['left'] as const)) {
            for (const wetFirst of hasWet && kitchenWall === wetWall ? [false, true] : [false]) {
              for (const counterStep of [0, 1, 2]) {
                for (const wardrobe of [false, true]) {
                  for (const appliances of ['beside', 'under', 'apart'] as const) {
                    for (const fromRear of [false, true]) out.push({ pattern, bedStep, raised, kitchenWall, wetWall, wetFirst, counterStep, wardrobe, appliances, fromRear });
                  }
                }
              }
            }
          }
        }
      }
    }
  }
  return out;
}

function zoningOf(v: Variant, hasWet: boolean, bedAcross: boolean): { key: string; words: string } {
  const wall = (w: 'left' | 'right') => (w === 'left' ? 'left-hand wall' : 'door side');
  const bed = `${isLounge(v.pattern) ? `made up ${bedAcross ? 'across' : 'lengthways'}` : PATTERNS[v.pattern].bed}${PATTERNS[v.pattern].levels === 2 ? (isLounge(v.pattern) ? ' with a drop-down bed over it' : ' with a bunk over it') : ''}`;
  return {
    key: `${v.pattern}|${bedAcross}|${v.kitchenWall}|${hasWet ? v.wetWall : '-'}|${v.appliances === 'apart'}`,
    words: `Bed ${bed}; kitchen on the ${wall(v.kitchenWall)}${v.appliances === 'apart' ? ', fridge and gas locker across from it' : ''}${hasWet ? `; wet room on the ${wall(v.wetWall)}` : ''}`,
  };
}

function documentOf(f: Frame, brief: Brief, parts: Part[], title: string): LayoutDoc | null {
  const placed = f.mirrored ? parts.map((p) => unmirror(p, f.bay.width)) : parts;
  const bay = f.mirrored ? briefBay(brief) : f.bay;
  const parsed = parseLayoutDoc({
    schemaVersion: PROPOSAL_SCHEMA_VERSION,
    name: title,
    bay,
    buildUp: DEFAULT_BUILD_UP,
    occupants: { standingHeight: brief.standing ?? 0, sleepers: brief.sleepers },
    modules: placed.map(toModule),
    systems: { water: { persons: brief.water.people } },
  });
  return parsed.ok ? parsed.value : null;
}

/** What of the brief a checked layout still misses, beyond the check rules (bed class). */
function briefMisses(brief: Brief, beds: Bed[]): Reason[] {
  const out: Reason[] = [];
  const m = mattressOfClass(brief.mattress);
  const bed = beds[0];
  if (m && bed && (bed.long < m.length || bed.short < m.width)) {
    out.push({ rule: 'mattress class', measured: bed.short < m.width ? bed.short : bed.long, required: bed.short < m.width ? m.width : m.length, unit: 'mm', message: `A ${m.name} mattress needs ${m.width} × ${m.length} mm; the largest bed here is ${bed.short} × ${bed.long} mm clear (UK trade sizes, common practice).` });
  }
  return out;
}

interface Evaluated {
  variant: Variant;
  doc: LayoutDoc;
  zoning: { key: string; words: string };
  fails: Reason[];
  shortfall: number;
  figures?: Figures;
}

export function generateProposals(brief: Brief, options: GenerateOptions = {}): ProposalResult {
  const f = frameOf(briefBay(brief));
  const all = variantsFor(brief);
  const random = seeded(brief.seed);
  // Fisher–Yates with the seeded generator: the order candidates are tried in.
  const order = all.map((_, i) => i);
  for (let i = order.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [order[i], order[j]] = [order[j], order[i]];
  }
  const limit = Math.min(options.maxCandidates ?? MAX_CANDIDATES, MAX_CANDIDATES);
  const seen = new Set<string>();
  const misses: LayoutMiss[] = [];
  const evaluated: Evaluated[] = [];
  const hasWet = brief.toilet || brief.shower;
  const settings = resolveSettings({});
  let checked = 0;
  let notLaidOut = 0;
  for (let n = 0; n < order.length && checked < limit; n++) {
    if (options.cancelled?.()) throw new ProposalsCancelledError();
    if (n % 50 === 0) options.onProgress?.(Math.min(n, limit), Math.min(order.length, limit));
    const v = all[order[n]];
    const laid = layOut(f, brief, v);
    if (!laid.ok) {
      notLaidOut++;
      misses.push(laid.miss);
      continue;
    }
    const key = JSON.stringify(laid.parts);
    if (seen.has(key)) continue;
    seen.add(key);
    const zoning = zoningOf(v, hasWet, laid.bedAcross);
    const doc = documentOf(f, brief, laid.parts, `${PATTERNS[v.pattern].words}`);
    if (!doc) {
      notLaidOut++;
      continue;
    }
    checked++;
    const report: CheckReport = runChecks(doc);
    const failing = report.findings.filter((x: Finding) => x.status === 'fail');
    // Beds are measured again only for a candidate the checks passed: its figures and the mattress class.
    const beds = failing.length === 0 ? findBeds(doc, buildUpThickness(doc), settings) : [];
    const fails = [...failing.map((x) => explainFinding(x, doc, laid.bedAcross)), ...(failing.length === 0 ? briefMisses(brief, beds) : [])];
    const shortfall = fails.reduce((s, r) => s + Math.abs(r.required - r.measured), 0);
    evaluated.push({ variant: v, doc, zoning, fails, shortfall, figures: fails.length === 0 ? figuresOf(doc, report, beds) : undefined });
  }
  options.onProgress?.(Math.min(order.length, limit), Math.min(order.length, limit));
  const passing = evaluated.filter((e) => e.fails.length === 0);
  const stats: ProposalStats = { variants: all.length, checked, passed: passing.length, notLaidOut };

  if (passing.length > 0) {
    const scored = scoreAll(passing.map((e) => e.figures!), brief.priority).map((s, i) => ({ e: passing[i], ...s }));
    // Best first; ties keep the seeded order (a stable sort).
    scored.sort((a, b) => b.total - a.total);
    const best = new Map<string, (typeof scored)[number]>();
    for (const s of scored) if (!best.has(s.e.zoning.key)) best.set(s.e.zoning.key, s);
    // Different patterns first, then different walls of the same pattern.
    const picked: (typeof scored)[number][] = [];
    const patternsShown = new Set<PatternId>();
    for (const s of best.values()) if (!patternsShown.has(s.e.variant.pattern) && picked.length < MAX_PROPOSALS) { picked.push(s); patternsShown.add(s.e.variant.pattern); }
    for (const s of best.values()) if (!picked.includes(s) && picked.length < MAX_PROPOSALS) picked.push(s);
    picked.sort((a, b) => b.total - a.total);
    const proposals = picked.map((s, i): Proposal => {
      const letter = String.fromCharCode(65 + i);
      const title = `Proposal ${letter}: ${PATTERNS[s.e.variant.pattern].words}`;
      return { letter, pattern: s.e.variant.pattern, title, zoning: s.e.zoning.words, doc: { ...s.e.doc, name: title }, figures: s.e.figures!, scores: s.scores, total: s.total };
    });
    return { ok: true, proposals, reasons: [], nearest: [], stats };
  }
  return { ok: false, proposals: [], reasons: reasonsOf(brief, evaluated, misses), nearest: nearestOf(evaluated), stats };
}

/**
 * Why nothing passed: for each rule that failed, the candidate that came nearest to meeting it
 * (its numbers), strongest rule first — the one that failed in most candidates. Layout misses
 * (no room along a wall, under the bed, headroom to sit up) come after, and lead only when no
 * candidate could be laid out at all.
 */
function reasonsOf(brief: Brief, evaluated: Evaluated[], misses: LayoutMiss[]): Reason[] {
  const byRule = new Map<string, { count: number; nearest: Reason }>();
  const gap = (r: Reason) => Math.abs(r.required - r.measured);
  for (const e of evaluated) {
    const once = new Set<string>();
    for (const r of e.fails) {
      const k = r.rule + '|' + (r.context ?? '');
      const entry = byRule.get(k);
      if (!once.has(k)) {
        once.add(k);
        if (entry) entry.count++;
      }
      if (!entry) byRule.set(k, { count: 1, nearest: r });
      else if (gap(r) < gap(entry.nearest)) entry.nearest = r;
    }
  }
  const fromChecks = [...byRule.values()].sort((a, b) => b.count - a.count || gap(a.nearest) - gap(b.nearest)).map((x) => x.nearest);
  const missBy = new Map<string, LayoutMiss>();
  for (const m of misses) {
    const cur = missBy.get(m.rule);
    if (!cur || Math.abs(m.required - m.measured) < Math.abs(cur.required - cur.measured)) missBy.set(m.rule, m);
  }
  const fromLayout = [...missBy.values()].map(explainMiss);
  const out = evaluated.length > 0 ? [...fromChecks, ...fromLayout] : fromLayout;
  if (out.length === 0) {
    out.push({ rule: 'bed preference', measured: 0, required: 1, unit: 'patterns', message: `No arrangement pattern matches “${BED_PREFERENCE_WORDS[brief.bed]}” in this bay.` });
  }
  return out.slice(0, 8);
}

function nearestOf(evaluated: Evaluated[]): NearMiss[] {
  const ranked = [...evaluated].sort((a, b) => a.fails.length - b.fails.length || a.shortfall - b.shortfall);
  const out: NearMiss[] = [];
  const keys = new Set<string>();
  for (const e of ranked) {
    if (keys.has(e.zoning.key)) continue;
    keys.add(e.zoning.key);
    out.push({ pattern: e.variant.pattern, title: PATTERNS[e.variant.pattern].words, zoning: e.zoning.words, doc: e.doc, misses: e.fails.slice(0, 4) });
    if (out.length >= MAX_NEAREST) break;
  }
  return out;
}
