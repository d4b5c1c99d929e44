/**
 * The editor's store (zustand, vanilla so tests drive it headlessly): the layout document, the
 * selection, the arrangement on show, the viewport, the gesture in progress and the undo history.
 * Every action below says how undo treats it. The document validates against the schema after
 * every write (lengths rounded to whole mm). Must never hold Konva nodes, DOM objects or fetch.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Arrangement, Bay, BuildUp, LayoutDoc, Module, ModuleKind, Occupants } from '@/lib/layout/schema';
import type { Systems } from '@/lib/layout/systems';
import type { LengthUnit } from '@/lib/layout/units';
import { baySchema, buildUpSchema, firstProblem, occupantsSchema, settingsSchema, type LayoutSettings } from '@/lib/layout/schema';
import { type Viewport, fitToBay, zoomAt, panBy, actualSize, CSS_PX_PER_MM, screenToMm } from '../geometry/viewport';
import type { GridStep, HandleId } from '../geometry/snapping';
import { emptyHistory, pushEntry, type History } from './history';
import * as edits from './moduleEdits';
import { withSystems } from './systemsEdits';
import { dragGesture, startMarquee, startMove, startOpeningMove, startResize, type Gesture } from './gestures';
import * as openingEdits from './openingEdits';
import type { OpeningPreset } from './openingEdits';
import type { Opening } from '@/lib/layout/schema';
import { px } from '../types';
import { readableProblem } from '@/lib/layout/field-names';
import { inArrangement, modulesIn } from '@/lib/layout/bay';

export interface EditorOptions {
  doc: LayoutDoc;
  version: number;
  readOnly?: boolean;
  units?: LengthUnit;
  /** Injected clock for nudge bursts (tests). */
  now?: () => number;
}

/** Result of an action that may be refused: the message is for a toast. */
export type EditResult = { ok: true } | { ok: false; error: string };

/** Snap threshold on screen (px): an edge this close sticks (common practice, no source). */
export const SNAP_PX = 8;

export interface EditorState {
  doc: LayoutDoc;
  /** Last saved document and its version; the document is unsaved while `doc !== savedDoc`. */
  savedDoc: LayoutDoc;
  version: number;
  readOnly: boolean;
  units: LengthUnit;
  selection: string[];
  /** Modules a clicked finding names: drawn highlighted until the selection changes. */
  highlight: string[];
  /**
   * The selected opening (window, roof opening, body point), or null. Openings are selected on
   * their own: selecting one clears the module selection and selecting modules clears it.
   */
  openingSelection: string | null;
  /** Openings a clicked finding names: drawn highlighted until the selection changes. */
  openingHighlight: string[];
  arrangement: Arrangement;
  /** Another arrangement drawn in phantom lines over the current one, or null. */
  phantom: Arrangement | null;
  /** A kind picked on the Parts shelf by touch, waiting for a tap on the plan to say where; a view state, never in undo. */
  placing: ModuleKind | null;
  viewport: Viewport;
  /** The view is fitted to the bay and nobody has zoomed or panned since: it stays fitted as the plan's box changes size. */
  viewFitted: boolean;
  /** Screen pixels per mm that make the drawing real size on this display (1:1). */
  actualPxPerMm: number;
  steps: { enabled: boolean; step: GridStep };
  gesture: Gesture | null;
  /** The pointer let go of the gesture; it is committed just after the frame that shows it (usePlanPointer). */
  gestureReleased: boolean;
  history: History;
  shortcutSheetOpen: boolean;
  /** Bumped by "Save now"; the autosave hook watches it. */
  saveRequest: number;

  // Document edits: each is ONE undo entry (nudges within a burst merge into one).
  addModule(kind: ModuleKind, centre?: { x: number; y: number }): EditResult & { id?: string };
  moveSelection(dx: number, dy: number): EditResult;
  nudgeSelection(dx: number, dy: number): EditResult;
  rotateSelection(): EditResult;
  duplicateSelection(): EditResult;
  deleteSelection(): EditResult;
  updateModule(id: string, patch: Partial<Omit<Module, 'id'>>, label?: string): EditResult;
  /** Adds a window, roof opening or body point at a free spot and selects it. */
  addOpening(preset: OpeningPreset): EditResult & { id?: string };
  /** Changes one opening's fields (undefined removes an optional one), checked against the bay schema. */
  updateOpening(id: string, patch: Record<string, unknown>, label?: string): EditResult;
  deleteOpening(id: string): EditResult;
  toggleMembership(id: string, arrangement: Arrangement): EditResult;
  updateBay(patch: Partial<Bay>): EditResult;
  updateBuildUp(buildUp: BuildUp): EditResult;
  updateOccupants(occupants: Occupants): EditResult;
  /** Sets (or, with undefined, clears back to the studio's default) this layout's own check settings. */
  updateSettings(patch: Partial<LayoutSettings>, label?: string): EditResult;
  renameLayout(name: string): EditResult;
  /**
   * Replaces the named sections of the build plan's inputs (`doc.systems`; undefined removes one).
   * ONE undo entry; typing into the same sections within a burst merges into it.
   */
  updateSystems(patch: Partial<Systems>, label?: string): EditResult;
  undo(): void;
  redo(): void;

  // Gestures: begin and drag change no document; commit is ONE undo entry; cancel leaves none.
  beginMove(ids: string[]): void;
  beginResize(id: string, handle: HandleId): void;
  beginMarquee(x: number, y: number, additive: boolean): void;
  /** A drag of one opening: along its wall, or in plan for a roof opening or an underside point. */
  beginOpeningMove(id: string): void;
  dragTo(dx: number, dy: number): void;
  /** The pointer let go: the gesture's change counts as unsaved until it is committed. */
  releaseGesture(): void;
  commitGesture(): EditResult;
  cancelGesture(): void;

  // View state: not part of the document, never in undo.
  select(ids: string[], mode?: 'replace' | 'toggle' | 'add'): void;
  selectAll(): void;
  setHighlight(ids: string[], openingIds?: string[]): void;
  /** Select one opening (null: none); clears the module selection. Not in undo. */
  selectOpening(id: string | null): void;
  setArrangement(a: Arrangement): void;
  setPhantom(a: Arrangement | null): void;
  /** Pick a kind to place with the next tap on the plan (null: stop). Not in undo. */
  setPlacing(kind: ModuleKind | null): void;
  setViewport(v: Viewport): void;
  resizeViewport(width: number, height: number): void;
  zoomBy(factor: number, sx?: number, sy?: number): void;
  panBy(dx: number, dy: number): void;
  fit(): void;
  actualSize(): void;
  setActualPxPerMm(v: number): void;
  setSteps(s: Partial<EditorState["steps"]>): void;
  setUnits(u: LengthUnit): void;
  setShortcutSheet(open: boolean): void;

  // Saving: never in undo. `replaceDoc` (their version after a conflict) clears history.
  requestSave(): void;
  markSaved(doc: LayoutDoc, version: number): void;
  replaceDoc(doc: LayoutDoc, version: number): void;
}

export type EditorStore = StoreApi<EditorState>;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

export function createEditorStore(opts: EditorOptions): EditorStore {
  const now = opts.now ?? (() => Date.now());
  const initialViewport: Viewport = { scale: 0.25, originX: px(60), originY: px(60), width: px(1000), height: px(600) };

  return createStore<EditorState>()((set, get) => {
    /** Write a new document as one undo entry; refuse (and say why) on any schema error. */
    function commit(label: string, change: () => { doc: LayoutDoc; selection?: string[]; opening?: string | null }, mergeKey?: string): EditResult {
      const s = get();
      if (s.readOnly) return { ok: false, error: 'This layout is view only.' };
      try {
        const { doc, selection, opening } = change();
        if (doc === s.doc) return { ok: true };
        const sel = selection ?? s.selection;
        const openingAfter = opening === undefined ? s.openingSelection : opening;
        set({
          doc,
          selection: sel,
          openingSelection: openingAfter,
          history: pushEntry(s.history, { label, before: s.doc, after: doc, selectionBefore: s.selection, selectionAfter: sel, openingBefore: s.openingSelection, openingAfter, mergeKey, at: now() }),
        });
        return { ok: true };
      } catch (e) {
        if (e instanceof edits.EditError) return { ok: false, error: readableProblem(e.message) };
        throw e;
      }
    }
    const selected = () => get().selection.filter((id) => get().doc.modules.some((m) => m.id === id));
    const snapOpts = () => {
      const s = get();
      return { enabled: s.steps.enabled, step: s.steps.step, threshold: screenToMm(s.viewport, SNAP_PX) };
    };

    return {
      doc: opts.doc,
      savedDoc: opts.doc,
      version: opts.version,
      readOnly: opts.readOnly ?? false,
      units: opts.units ?? 'mm',
      selection: [],
      highlight: [],
      openingSelection: null,
      openingHighlight: [],
      arrangement: 'lounge',
      phantom: null,
      placing: null,
      viewport: fitToBay(initialViewport, opts.doc.bay.length, opts.doc.bay.width),
      viewFitted: true,
      actualPxPerMm: CSS_PX_PER_MM,
      steps: { enabled: true, step: 10 },
      gesture: null,
      gestureReleased: false,
      history: emptyHistory(),
      shortcutSheetOpen: false,
      saveRequest: 0,

      addModule(kind, centre) {
        let id: string | undefined;
        const r = commit('Place module', () => {
          const placed = edits.placeModule(get().doc, kind, centre, get().steps.enabled ? get().steps.step : 1);
          id = placed.module.id;
          return { doc: placed.doc, selection: [placed.module.id] };
        });
        if (r.ok && id) {
          const m = get().doc.modules.find((o) => o.id === id)!;
          // A kind that does not exist in the arrangement on show (a table while showing sleep): show one it exists in.
          if (!inArrangement(m, get().arrangement)) set({ arrangement: m.arrangements[0] });
        }
        return { ...r, id };
      },
      moveSelection(dx, dy) {
        const ids = selected();
        if (ids.length === 0) return { ok: true };
        return commit(`Move ${plural(ids.length, 'module')}`, () => ({ doc: edits.moveModules(get().doc, ids, dx, dy) }));
      },
      nudgeSelection(dx, dy) {
        const oid = get().openingSelection;
        if (oid && get().selection.length === 0) {
          const o = get().doc.bay.openings.find((p) => p.id === oid);
          if (!o) return { ok: true };
          return commit(`Nudge ${openingWord(o)}`, () => ({ doc: openingEdits.moveOpening(get().doc, oid, dx, dy) }), `nudge-opening:${oid}`);
        }
        const ids = selected();
        if (ids.length === 0) return { ok: true };
        return commit(`Nudge ${plural(ids.length, 'module')}`, () => ({ doc: edits.moveModules(get().doc, ids, dx, dy) }), `nudge:${ids.join(',')}`);
      },
      rotateSelection() {
        const ids = selected();
        if (ids.length === 0) return { ok: true };
        return commit(`Rotate ${plural(ids.length, 'module')}`, () => ({ doc: edits.rotateModules(get().doc, ids) }));
      },
      duplicateSelection() {
        const ids = selected();
        if (ids.length === 0) return { ok: true };
        return commit(`Duplicate ${plural(ids.length, 'module')}`, () => {
          const d = edits.duplicateModules(get().doc, ids);
          return { doc: d.doc, selection: d.ids };
        });
      },
      deleteSelection() {
        const oid = get().openingSelection;
        if (oid && get().selection.length === 0) return get().deleteOpening(oid);
        const ids = selected();
        if (ids.length === 0) return { ok: true };
        return commit(`Delete ${plural(ids.length, 'module')}`, () => ({ doc: edits.deleteModules(get().doc, ids), selection: [] }));
      },
      updateModule(id, patch, label = 'Edit module') {
        return commit(label, () => ({ doc: edits.patchModule(get().doc, id, patch) }));
      },
      addOpening(preset) {
        let id: string | undefined;
        const r = commit(`Add ${openingEdits.OPENING_PRESET_WORDS[preset].toLowerCase()}`, () => {
          const placed = openingEdits.placeOpening(get().doc, preset);
          id = placed.opening.id;
          return { doc: placed.doc, selection: [], opening: placed.opening.id };
        });
        if (r.ok) set({ highlight: [], openingHighlight: [] });
        return { ...r, id };
      },
      updateOpening(id, patch, label) {
        const o = get().doc.bay.openings.find((p) => p.id === id);
        return commit(label ?? `Edit ${o ? openingWord(o) : 'opening'}`, () => ({ doc: openingEdits.patchOpening(get().doc, id, patch) }));
      },
      deleteOpening(id) {
        const o = get().doc.bay.openings.find((p) => p.id === id);
        if (!o) return { ok: true };
        return commit(`Delete ${openingWord(o)}`, () => ({ doc: openingEdits.deleteOpening(get().doc, id), opening: null }));
      },
      toggleMembership(id, arrangement) {
        return commit(`Change arrangements`, () => ({ doc: edits.toggleMembership(get().doc, id, arrangement) }));
      },
      updateBay(patch) {
        return commit('Edit bay', () => {
          const bay = { ...get().doc.bay, ...patch };
          const problem = firstProblem(baySchema, bay);
          if (problem) throw new edits.EditError(problem);
          return { doc: { ...get().doc, bay } };
        });
      },
      updateBuildUp(buildUp) {
        return commit('Edit build-up', () => {
          const problem = firstProblem(buildUpSchema, buildUp);
          if (problem) throw new edits.EditError(problem);
          return { doc: { ...get().doc, buildUp } };
        });
      },
      updateOccupants(occupants) {
        return commit('Edit occupants', () => {
          const problem = firstProblem(occupantsSchema, occupants);
          if (problem) throw new edits.EditError(problem);
          return { doc: { ...get().doc, occupants } };
        });
      },
      updateSettings(patch, label = 'Edit check settings') {
        return commit(label, () => {
          const merged: Record<string, unknown> = { ...get().doc.settings, ...patch };
          for (const key of Object.keys(merged)) if (merged[key] === undefined) delete merged[key];
          const problem = firstProblem(settingsSchema, merged);
          if (problem) throw new edits.EditError(problem);
          const { settings: _old, ...rest } = get().doc;
          return { doc: Object.keys(merged).length ? { ...rest, settings: merged as LayoutSettings } : rest };
        });
      },
      renameLayout(name) {
        const trimmed = name.trim();
        if (!trimmed) return { ok: false, error: 'Give the layout a name.' };
        if (trimmed.length > 120) return { ok: false, error: 'A layout name has at most 120 characters.' };
        return commit('Rename layout', () => ({ doc: { ...get().doc, name: trimmed } }));
      },
      updateSystems(patch, label = 'Edit the build plan') {
        return commit(label, () => ({ doc: withSystems(get().doc, patch) }), `systems:${Object.keys(patch).sort().join(',')}`);
      },
      undo() {
        const s = get();
        if (s.gesture) return s.cancelGesture();
        const entry = s.history.past[s.history.past.length - 1];
        if (!entry) return;
        const ids = new Set(entry.before.modules.map((m) => m.id));
        set({ doc: entry.before, selection: entry.selectionBefore.filter((id) => ids.has(id)), openingSelection: openingIn(entry.before, entry.openingBefore), history: { past: s.history.past.slice(0, -1), future: [entry, ...s.history.future] } });
      },
      redo() {
        const s = get();
        const entry = s.history.future[0];
        if (!entry || s.gesture) return;
        const ids = new Set(entry.after.modules.map((m) => m.id));
        set({ doc: entry.after, selection: entry.selectionAfter.filter((id) => ids.has(id)), openingSelection: openingIn(entry.after, entry.openingAfter), history: { past: [...s.history.past, { ...entry, mergeKey: undefined }], future: s.history.future.slice(1) } });
      },

      beginMove(ids) {
        const s = get();
        if (s.readOnly) return;
        set({ gesture: startMove(s.doc, s.arrangement, ids) });
      },
      beginResize(id, handle) {
        const s = get();
        if (s.readOnly) return;
        set({ gesture: startResize(s.doc, s.arrangement, id, handle) });
      },
      beginMarquee(x, y, additive) {
        set({ gesture: startMarquee(x, y, additive, additive ? get().selection : []) });
      },
      beginOpeningMove(id) {
        const s = get();
        if (s.readOnly) return;
        set({ gesture: startOpeningMove(s.doc, s.arrangement, id) });
      },
      dragTo(dx, dy) {
        const s = get();
        if (!s.gesture) return;
        set({ gesture: dragGesture(s.gesture, dx, dy, snapOpts(), s.doc, s.arrangement) });
      },
      releaseGesture() {
        if (get().gesture) set({ gestureReleased: true });
      },
      commitGesture() {
        const g = get().gesture;
        if (!g) return { ok: true };
        set({ gesture: null, gestureReleased: false });
        if (g.kind === 'marquee') {
          const ids = g.additive ? Array.from(new Set([...g.base, ...g.preview.hits])) : g.preview.hits;
          set({ selection: ids, highlight: [], openingSelection: null, openingHighlight: [] });
          return { ok: true };
        }
        if (g.kind === 'opening') {
          const moved = g.preview.opening;
          if (JSON.stringify(moved) === JSON.stringify(g.start)) return { ok: true };
          return commit(`Move ${openingWord(g.start)}`, () => ({ doc: openingEdits.replaceOpening(get().doc, moved), opening: moved.id }));
        }
        if (g.kind === 'move') {
          const { dx, dy } = g.preview;
          if (dx === 0 && dy === 0) return { ok: true };
          return commit(`Move ${plural(g.ids.length, 'module')}`, () => ({ doc: edits.moveModules(get().doc, g.ids, dx, dy) }));
        }
        const r = g.preview.rect;
        if (r.x === g.start.x && r.y === g.start.y && r.length === g.start.length && r.width === g.start.width) return { ok: true };
        return commit('Resize module', () => ({ doc: edits.resizeModule(get().doc, g.ids[0], r) }));
      },
      cancelGesture() {
        if (get().gesture) set({ gesture: null, gestureReleased: false });
      },

      select(ids, mode = 'replace') {
        const cur = get().selection;
        let next: string[];
        if (mode === 'replace') next = ids;
        else if (mode === 'add') next = Array.from(new Set([...cur, ...ids]));
        else next = [...cur.filter((id) => !ids.includes(id)), ...ids.filter((id) => !cur.includes(id))];
        set({ selection: next, highlight: [], openingSelection: null, openingHighlight: [] });
      },
      selectOpening(id) {
        const known = id !== null && get().doc.bay.openings.some((o) => o.id === id);
        set({ openingSelection: known ? id : null, selection: known ? [] : get().selection, highlight: [], openingHighlight: [] });
      },
      selectAll() {
        const s = get();
        set({ selection: modulesIn(s.doc, s.arrangement).map((m) => m.id), openingSelection: null });
      },
      setHighlight(ids, openingIds = []) {
        const doc = get().doc;
        const modules = ids.filter((id) => doc.modules.some((m) => m.id === id));
        const openings = openingIds.filter((id) => doc.bay.openings.some((o) => o.id === id));
        // A finding about openings only selects its first opening, so Details shows it.
        set({ highlight: ids, openingHighlight: openings, selection: modules, openingSelection: modules.length === 0 && openings.length > 0 ? openings[0] : null });
      },
      setArrangement(a) {
        const s = get();
        if (s.gesture) set({ gesture: null, gestureReleased: false });
        // Keep only selected modules that exist in the arrangement now shown.
        const inA = new Set(modulesIn(s.doc, a).map((m) => m.id));
        set({ arrangement: a, selection: s.selection.filter((id) => inA.has(id)), phantom: s.phantom === a ? null : s.phantom });
      },
      setPlacing(kind) {
        set({ placing: get().readOnly ? null : kind });
      },
      setPhantom(a) {
        set({ phantom: a === get().arrangement ? null : a });
      },
      setViewport(v) {
        set({ viewport: v, viewFitted: false });
      },
      resizeViewport(width, height) {
        const v = get().viewport;
        if (v.width === width && v.height === height) return;
        const next = { ...v, width: px(width), height: px(height) };
        // Open fitted to the bay, and stay fitted while the screen settles (panels load, a drawer
        // closes, the tablet turns) until the person zooms or pans.
        set({ viewport: get().viewFitted ? fitToBay(next, get().doc.bay.length, get().doc.bay.width) : next });
      },
      zoomBy(factor, sx, sy) {
        const v = get().viewport;
        set({ viewport: zoomAt(v, factor, sx ?? v.width / 2, sy ?? v.height / 2), viewFitted: false });
      },
      panBy(dx, dy) {
        set({ viewport: panBy(get().viewport, dx, dy), viewFitted: false });
      },
      fit() {
        const s = get();
        set({ viewport: fitToBay(s.viewport, s.doc.bay.length, s.doc.bay.width), viewFitted: true });
      },
      actualSize() {
        const s = get();
        set({ viewport: actualSize(s.viewport, s.actualPxPerMm, s.viewport.width / 2, s.viewport.height / 2), viewFitted: false });
      },
      setActualPxPerMm(v) {
        if (Number.isFinite(v) && v > 0.5 && v < 20) set({ actualPxPerMm: v });
      },
      setSteps(steps) {
        set({ steps: { ...get().steps, ...steps } });
      },
      setUnits(units) {
        set({ units });
      },
      setShortcutSheet(open) {
        set({ shortcutSheetOpen: open });
      },

      requestSave() {
        set({ saveRequest: get().saveRequest + 1 });
      },
      markSaved(doc, version) {
        set({ savedDoc: doc, version });
      },
      replaceDoc(doc, version) {
        set({ doc, savedDoc: doc, version, selection: [], highlight: [], openingSelection: null, openingHighlight: [], gesture: null, gestureReleased: false, history: emptyHistory() });
      },
    };
  });
}

/** An opening in words for undo labels: "window", "roof vent", "heater exhaust". */
function openingWord(o: Opening): string {
  if (o.type === 'window') return 'window';
  if (o.type === 'roof-opening') return openingEdits.OPENING_PRESET_WORDS[o.kind].toLowerCase();
  return openingEdits.OPENING_PRESET_WORDS[o.kind].toLowerCase();
}

/** The opening id if that opening is in the document, else null. */
function openingIn(doc: LayoutDoc, id: string | null | undefined): string | null {
  return id && doc.bay.openings.some((o) => o.id === id) ? id : null;
}

/** Something not yet saved: an edit, or a drag let go whose commit is a frame away. */
export const isDirty = (s: Pick<EditorState, 'doc' | 'savedDoc'> & Partial<Pick<EditorState, 'gestureReleased'>>) => s.doc !== s.savedDoc || s.gestureReleased === true;
export const canUndo = (s: EditorState) => s.history.past.length > 0 || s.gesture !== null;
export const canRedo = (s: EditorState) => s.history.future.length > 0;
