/**
 * What changed between two revisions of a layout, for the side-by-side comparison: modules
 * added, removed, moved (x, y or elevation) or resized (length, width, height; a 90° turn shows
 * as a swap), other edits to a module (label, facing, arrangements, surfaces, mount, mass, props), the
 * bay's own measurements, its openings (windows, roof openings, body points: added, removed, moved
 * along their wall or in plan, resized, or otherwise changed), and which check findings changed status.
 *
 * Pure data in, data out. Findings are taken structurally (id, status, arrangement, moduleIds),
 * so this file needs nothing from lib/checks. Must never import React, Next, the database or the
 * check engine.
 */
import type { Arrangement, LayoutDoc, Module, Opening } from './schema';
import { layersThickness } from './bay';

export interface Moved {
  dx: number;
  dy: number;
  /** Change of elevation (underside above the finished floor). */
  dz: number;
}

export interface Resized {
  dLength: number;
  dWidth: number;
  dHeight: number;
  /** Length and width swapped: the module was turned by 90°. */
  rotated: boolean;
}

export type OtherField = 'kind' | 'label' | 'facing' | 'arrangements' | 'surfaces' | 'mount' | 'massKg' | 'props';

export interface ModuleChange {
  id: string;
  before: Module;
  after: Module;
  moved: Moved | null;
  resized: Resized | null;
  other: OtherField[];
}

export interface BayChange {
  field: 'length' | 'width' | 'height' | 'bulkhead' | 'cabSeats' | 'wheelArches' | 'doors' | 'buildUp' | 'occupants';
  before: string;
  after: string;
}

/** How an opening moved: along its wall (windows, body points on a wall), up, or in plan (roof openings, the underside). */
export interface OpeningMoved {
  /** Along its wall from the wall's start, or rearwards (x) for a roof opening or a point underneath. */
  dAlong: number;
  /** Across the van (y): a roof opening or a point underneath. */
  dAcross: number;
  /** Up: a window's sill, a body point's height. */
  dUp: number;
}

export interface OpeningChange {
  id: string;
  before: Opening;
  after: Opening;
  moved: OpeningMoved | null;
  /** Change of size: width and height of a window, length and width of a roof opening. */
  resized: { dA: number; dB: number } | null;
  /** Other fields changed: its wall or door, kind, label, opens, frame. */
  other: string[];
}

export interface OpeningsDiff {
  added: Opening[];
  removed: Opening[];
  changed: OpeningChange[];
}

export interface RevisionDiff {
  added: Module[];
  removed: Module[];
  /** Modules present in both whose placement, size or details differ. */
  changed: ModuleChange[];
  /** Ids of changed modules that moved / were resized (a module may be in both). */
  moved: string[];
  resized: string[];
  unchanged: number;
  bay: BayChange[];
  /** The bay's openings, matched by id like modules. */
  openings: OpeningsDiff;
}

function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

function sortedProps(p: Module['props']): [string, unknown][] {
  return Object.entries(p ?? {}).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
}

function moduleChange(before: Module, after: Module): ModuleChange | null {
  const dx = after.x - before.x;
  const dy = after.y - before.y;
  const dz = after.elevation - before.elevation;
  const moved = dx || dy || dz ? { dx, dy, dz } : null;
  const dLength = after.length - before.length;
  const dWidth = after.width - before.width;
  const dHeight = after.height - before.height;
  const rotated = (dLength !== 0 || dWidth !== 0) && after.length === before.width && after.width === before.length;
  const resized = dLength || dWidth || dHeight ? { dLength, dWidth, dHeight, rotated } : null;
  const other: OtherField[] = [];
  if (before.kind !== after.kind) other.push('kind');
  if ((before.label ?? '') !== (after.label ?? '')) other.push('label');
  if (before.facing !== after.facing) other.push('facing');
  if (!same([...before.arrangements].sort(), [...after.arrangements].sort())) other.push('arrangements');
  if (!same(surfaceList(before), surfaceList(after))) other.push('surfaces');
  if ((before.mount ?? 'inside') !== (after.mount ?? 'inside')) other.push('mount');
  if (before.massKg !== after.massKg) other.push('massKg');
  if (!same(sortedProps(before.props), sortedProps(after.props))) other.push('props');
  if (!moved && !resized && !other.length) return null;
  return { id: after.id, before, after, moved, resized, other };
}

function bayChanges(before: LayoutDoc, after: LayoutDoc): BayChange[] {
  const out: BayChange[] = [];
  for (const field of ['length', 'width', 'height', 'cabSeats'] as const) {
    if (before.bay[field] !== after.bay[field]) out.push({ field, before: String(before.bay[field]), after: String(after.bay[field]) });
  }
  if (before.bay.bulkhead !== after.bay.bulkhead) out.push({ field: 'bulkhead', before: before.bay.bulkhead ? 'yes' : 'no', after: after.bay.bulkhead ? 'yes' : 'no' });
  if (!same(before.bay.wheelArches, after.bay.wheelArches)) out.push({ field: 'wheelArches', before: `${before.bay.wheelArches.length}`, after: `${after.bay.wheelArches.length}` });
  if (!same(before.bay.doors, after.bay.doors)) out.push({ field: 'doors', before: `${before.bay.doors.length}`, after: `${after.bay.doors.length}` });
  const thickness = (d: LayoutDoc) => (['floor', 'roof', 'walls'] as const).map((s) => `${s} ${layersThickness(d.buildUp[s])} mm`).join(', ');
  if (!same(before.buildUp, after.buildUp)) out.push({ field: 'buildUp', before: thickness(before), after: thickness(after) });
  if (!same(before.occupants, after.occupants)) {
    const words = (d: LayoutDoc) => `standing ${d.occupants.standingHeight} mm, ${d.occupants.sleepers.length} sleeper(s)`;
    out.push({ field: 'occupants', before: words(before), after: words(after) });
  }
  return out;
}

function openingChange(b: Opening, a: Opening): OpeningChange | null {
  const other: string[] = [];
  let moved: OpeningMoved | null = null;
  let resized: OpeningChange['resized'] = null;
  if (b.type !== a.type) other.push('type');
  else if (a.type === 'window' && b.type === 'window') {
    if (a.wall !== b.wall || a.door !== b.door) other.push('wall');
    const m = { dAlong: a.position - b.position, dAcross: 0, dUp: a.sillHeight - b.sillHeight };
    if (m.dAlong || m.dUp) moved = m;
    if (a.width !== b.width || a.height !== b.height) resized = { dA: a.width - b.width, dB: a.height - b.height };
    if (a.opens !== b.opens) other.push('opens');
    if (a.frameDepth !== b.frameDepth) other.push('frame');
  } else if (a.type === 'roof-opening' && b.type === 'roof-opening') {
    if (a.kind !== b.kind) other.push('kind');
    const m = { dAlong: a.x - b.x, dAcross: a.y - b.y, dUp: 0 };
    if (m.dAlong || m.dAcross) moved = m;
    if (a.length !== b.length || a.width !== b.width) resized = { dA: a.length - b.length, dB: a.width - b.width };
    if (a.frameHeight !== b.frameHeight) other.push('frame');
  } else if (a.type === 'body-point' && b.type === 'body-point') {
    if (a.kind !== b.kind) other.push('kind');
    if (a.wall !== b.wall) other.push('wall');
    const m = { dAlong: a.position - b.position, dAcross: (a.across ?? 0) - (b.across ?? 0), dUp: a.height - b.height };
    if (m.dAlong || m.dAcross || m.dUp) moved = m;
  }
  if ((a.label ?? '') !== (b.label ?? '')) other.push('label');
  if (!moved && !resized && !other.length) return null;
  return { id: a.id, before: b, after: a, moved, resized, other };
}

/** Openings are matched by id, like modules. */
export function diffOpenings(before: Opening[], after: Opening[]): OpeningsDiff {
  const beforeById = new Map(before.map((o) => [o.id, o]));
  const afterIds = new Set(after.map((o) => o.id));
  const changed: OpeningChange[] = [];
  for (const a of after) {
    const b = beforeById.get(a.id);
    const c = b ? openingChange(b, a) : null;
    if (c) changed.push(c);
  }
  return { added: after.filter((o) => !beforeById.has(o.id)), removed: before.filter((o) => !afterIds.has(o.id)), changed };
}

/** Modules are matched by id: an id in both documents is the same module, whatever else changed. */
export function diffRevisions(before: LayoutDoc, after: LayoutDoc): RevisionDiff {
  const beforeById = new Map(before.modules.map((m) => [m.id, m]));
  const afterById = new Map(after.modules.map((m) => [m.id, m]));
  const added = after.modules.filter((m) => !beforeById.has(m.id));
  const removed = before.modules.filter((m) => !afterById.has(m.id));
  const changed: ModuleChange[] = [];
  let unchanged = 0;
  for (const a of after.modules) {
    const b = beforeById.get(a.id);
    if (!b) continue;
    const c = moduleChange(b, a);
    if (c) changed.push(c);
    else unchanged += 1;
  }
  return {
    added,
    removed,
    changed,
    moved: changed.filter((c) => c.moved).map((c) => c.id),
    resized: changed.filter((c) => c.resized).map((c) => c.id),
    unchanged,
    bay: bayChanges(before, after),
    openings: diffOpenings(before.bay.openings ?? [], after.bay.openings ?? []),
  };
}

/** The part of a check finding the comparison needs (lib/checks `Finding` fits it). */
export interface FindingLike {
  id: string;
  status: 'pass' | 'warn' | 'fail';
  arrangement?: Arrangement;
  moduleIds?: string[];
  /** The openings it is about (clearance rules): part of what makes it "the same finding". */
  openingIds?: string[];
  message: string;
}

export interface FindingChange {
  /** Rule id, arrangement, modules and openings: what identifies "the same finding" in both reports. */
  key: string;
  id: string;
  arrangement?: Arrangement;
  moduleIds?: string[];
  before: FindingLike['status'] | null;
  after: FindingLike['status'] | null;
  /** better: towards pass (or a warn/fail gone); worse: towards fail (or a new warn/fail). */
  direction: 'better' | 'worse';
  message: string;
}

const RANK = { pass: 0, warn: 1, fail: 2 } as const;

function keyed(findings: FindingLike[]): Map<string, FindingLike> {
  const out = new Map<string, FindingLike>();
  for (const f of findings) {
    const openings = f.openingIds?.length ? `|${[...f.openingIds].sort().join(',')}` : '';
    const base = `${f.id}|${f.arrangement ?? ''}|${[...(f.moduleIds ?? [])].sort().join(',')}${openings}`;
    let key = base;
    // The same rule may say two things about the same place: number the repeats.
    for (let n = 2; out.has(key); n++) key = `${base}#${n}`;
    out.set(key, f);
  }
  return out;
}

/**
 * Findings whose status differs between the two reports. A finding present on one side only
 * counts when it is a warn or fail there (a pass appearing or vanishing with a module is not
 * news); findings that kept their status are left out.
 */
export function diffFindings(before: FindingLike[], after: FindingLike[]): FindingChange[] {
  const b = keyed(before);
  const a = keyed(after);
  const out: FindingChange[] = [];
  for (const key of new Set([...b.keys(), ...a.keys()])) {
    const fb = b.get(key);
    const fa = a.get(key);
    const sb = fb?.status ?? null;
    const sa = fa?.status ?? null;
    if (sb === sa) continue;
    if (sb === null && sa === 'pass') continue;
    if (sa === null && sb === 'pass') continue;
    const rb = sb === null ? 0 : RANK[sb];
    const ra = sa === null ? 0 : RANK[sa];
    const f = (fa ?? fb)!;
    out.push({
      key, id: f.id,
      ...(f.arrangement ? { arrangement: f.arrangement } : {}),
      ...(f.moduleIds?.length ? { moduleIds: f.moduleIds } : {}),
      before: sb, after: sa,
      direction: ra > rb ? 'worse' : 'better',
      message: f.message,
    });
  }
  return out.sort((x, y) => (x.direction === y.direction ? x.key.localeCompare(y.key) : x.direction === 'worse' ? -1 : 1));
}

/** A module's surfaces as a comparable list ('travel:seat', …). */
function surfaceList(m: Module): string[] {
  return (['travel', 'lounge', 'sleep'] as const).filter((a) => m.surfaces?.[a] !== undefined).map((a) => `${a}:${m.surfaces![a]}`);
}
