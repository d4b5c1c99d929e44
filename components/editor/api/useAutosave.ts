'use client';
/**
 * Autosave, for every screen that edits a layout through the editor store (the editor, the build
 * plan): a changed document is saved a moment after the last edit (or at once on "Save now"),
 * with its version in If-Match. One save at a time; edits made while saving go in the next one.
 * A 412 stops saving and hands the conflict to the dialog; a lost connection retries with
 * back-off. Also guards against leaving the page with unsaved changes: a click on an in-app link
 * while an edit waits or saves is held, the save flushed, and the link followed once saved
 * (`leavingFor` names where to, for the indicator); only when saving is stopped does it ask.
 * Never saves read-only.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { toast } from '@/components/ui/toast';
import type { LayoutDoc } from '@/lib/layout';
import type { EditorStore } from '../store/editorStore';
import { isDirty } from '../store/editorStore';
import { saveLayout, type FetchLike, type SavedCopy } from './layoutApi';
import { flushOnLeave } from './leaveFlush';
import { fieldName } from '@/lib/layout/field-names';
import { runWaitingCommits } from '@/components/ui/afterNextPaint';

export const AUTOSAVE_DELAY_MS = 1200;

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error' | 'read-only';

export interface Conflict {
  mine: LayoutDoc;
  theirs: SavedCopy;
}

export function useAutosave(api: EditorStore, layoutId: string, canEdit: boolean, fetchFn: FetchLike = fetch) {
  const [status, setStatus] = useState<SaveStatus>(canEdit ? 'saved' : 'read-only');
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [lastError, setLastError] = useState<string | null>(null);
  const inFlight = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const backoff = useRef(0);
  /** Why saving stopped: a conflict (until resolved), no rights (for good), a refused document (until the next edit). */
  const blocked = useRef<null | 'conflict' | 'forbidden' | 'invalid'>(null);
  const saveRef = useRef<() => Promise<void>>(async () => undefined);
  /** A link clicked while a save was due or under way: followed once the layout is saved. */
  const leaving = useRef<HTMLAnchorElement | null>(null);
  const [leavingFor, setLeavingFor] = useState<string | null>(null);

  const stopLeaving = useCallback(() => {
    leaving.current = null;
    setLeavingFor(null);
  }, []);
  /** Follows the held link: a second click, now with nothing unsaved, so the link does what it does. */
  const followHeldLink = useCallback(() => {
    const a = leaving.current;
    stopLeaving();
    if (!a) return;
    if (a.isConnected) a.click();
    else window.location.assign(a.href);
  }, [stopLeaving]);

  const schedule = useCallback((ms: number) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      timer.current = null;
      void saveRef.current();
    }, ms);
  }, []);

  const saveNow = useCallback(async () => {
    if (!canEdit || inFlight.current || blocked.current) return;
    const s = api.getState();
    if (!isDirty(s)) return setStatus('saved');
    if (s.gesture) {
      // Wait for the gesture to end; the commit will schedule another save.
      return;
    }
    inFlight.current = true;
    setStatus('saving');
    const doc = s.doc;
    const result = await saveLayout(fetchFn, layoutId, doc, s.version);
    inFlight.current = false;
    switch (result.kind) {
      case 'saved': {
        backoff.current = 0;
        setLastError(null);
        api.getState().markSaved(doc, result.version);
        const still = isDirty(api.getState());
        setStatus(still ? 'unsaved' : 'saved');
        if (still) schedule(leaving.current ? 0 : AUTOSAVE_DELAY_MS);
        else if (leaving.current) followHeldLink();
        return;
      }
      case 'conflict':
        stopLeaving();
        blocked.current = 'conflict';
        setStatus('conflict');
        setConflict({ mine: api.getState().doc, theirs: result.current });
        return;
      case 'invalid':
        stopLeaving();
        blocked.current = 'invalid';
        setStatus('error');
        setLastError(result.issues.length ? `${result.message}: ${result.issues.slice(0, 3).map((i) => `${fieldName(i.path)}: ${i.message}`).join('; ')}` : result.message);
        toast.error(`Not saved: ${result.message}`);
        return;
      case 'forbidden':
        stopLeaving();
        blocked.current = 'forbidden';
        setStatus('error');
        setLastError(result.message);
        toast.error(result.message);
        return;
      case 'error':
        if (leaving.current) {
          stopLeaving();
          toast.error(`Stayed on this page: the changes could not be saved (${result.message}).`);
        }
        setStatus('error');
        setLastError(result.message);
        if (result.retry) {
          backoff.current = Math.min(30_000, backoff.current ? backoff.current * 2 : 2000);
          schedule(backoff.current);
        } else {
          blocked.current = 'invalid';
          toast.error(result.message);
        }
        return;
    }
  }, [api, canEdit, fetchFn, layoutId, schedule, stopLeaving, followHeldLink]);

  useEffect(() => {
    saveRef.current = saveNow;
  }, [saveNow]);

  useEffect(() => {
    if (!canEdit) return;
    return api.subscribe((s, prev) => {
      if (s.saveRequest !== prev.saveRequest) {
        if (blocked.current === 'invalid') blocked.current = null;
        schedule(0);
        return;
      }
      if (s.doc !== prev.doc || s.gesture !== prev.gesture) {
        if (s.doc !== prev.doc && blocked.current === 'invalid') blocked.current = null;
        if (isDirty(s)) {
          if (!inFlight.current && !blocked.current) setStatus('unsaved');
          if (!blocked.current) schedule(AUTOSAVE_DELAY_MS);
        } else if (!inFlight.current && !blocked.current) {
          setStatus('saved');
        }
      }
    });
  }, [api, canEdit, schedule]);

  // Leave-page guard: the browser's own prompt on unload, and a confirm on in-app links.
  useEffect(() => {
    if (!canEdit) return;
    const unsaved = () => {
      runWaitingCommits(); // a field left a moment ago may still be committing its edit
      return isDirty(api.getState()) || inFlight.current;
    };
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (!unsaved()) return;
      e.preventDefault();
      e.returnValue = '';
    };
    const onClick = (e: MouseEvent) => {
      if (!unsaved() || e.defaultPrevented || e.button !== 0 || e.metaKey || e.ctrlKey) return;
      const a = (e.target as HTMLElement | null)?.closest?.('a[href]') as HTMLAnchorElement | null;
      if (!a || a.target === '_blank' || a.origin !== window.location.origin) return;
      if (!blocked.current) {
        // Saving can go on: hold the click, save now, then follow the link (a second click is held the same way).
        e.preventDefault();
        e.stopPropagation();
        leaving.current = a;
        setLeavingFor(a.textContent?.trim() || 'the page');
        if (!inFlight.current) schedule(0);
        return;
      }
      if (!window.confirm('This layout has changes that are not saved yet. Leave anyway?')) {
        e.preventDefault();
        e.stopPropagation();
      }
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    document.addEventListener('click', onClick, true);
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload);
      document.removeEventListener('click', onClick, true);
    };
  }, [api, canEdit, schedule]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
    runWaitingCommits();
    // Leaving with an edit not yet saved (and saving not stopped): send it now, with keepalive (leaveFlush.ts).
    if (canEdit && !inFlight.current && !blocked.current) void flushOnLeave(api, layoutId, fetchFn);
  }, [api, canEdit, fetchFn, layoutId]);

  /**
   * After the conflict dialog: their version replaces ours (history cleared), saving resumes.
   * `carry` may then put some of my work on their version as a new edit (one undo entry), which
   * autosaves like any other.
   */
  const takeTheirs = useCallback((carry?: (mine: LayoutDoc) => void) => {
    if (!conflict) return;
    api.getState().replaceDoc(conflict.theirs.doc, conflict.theirs.version);
    blocked.current = null;
    setConflict(null);
    setStatus('saved');
    carry?.(conflict.mine);
  }, [api, conflict]);

  const closeConflict = useCallback(() => setConflict(null), []);

  return { status, conflict, lastError, takeTheirs, closeConflict, saveNow, leavingFor };
}
