'use client';
/**
 * Which drawer is open over the plan on a tablet or phone (Parts shelf, Details, Checks, Mark-ups):
 * one at a time, remembered on this device (localStorage) so the editor opens the way it was left.
 * On a desktop the shelf, Details and Checks stand beside the plan and only Mark-ups use this.
 * Must never hold anything about a layout: it is a preference of the device.
 */
import { useSyncExternalStore } from 'react';

export type DrawerId = 'shelf' | 'details' | 'checks' | 'markups';
const DRAWERS: readonly DrawerId[] = ['shelf', 'details', 'checks', 'markups'];
const KEY = 'baywright.drawer';

let open: DrawerId | null = null;
let loaded = false;
const listeners = new Set<() => void>();

function load(): void {
  if (loaded || typeof window === 'undefined') return;
  loaded = true;
  try {
    const saved = window.localStorage.getItem(KEY);
    open = DRAWERS.includes(saved as DrawerId) ? (saved as DrawerId) : null;
  } catch {
    open = null; // storage refused (private mode): start closed
  }
}

export function openDrawer(): DrawerId | null {
  load();
  return open;
}

export function setDrawer(next: DrawerId | null): void {
  load();
  if (next === open) return;
  open = next;
  try {
    if (next) window.localStorage.setItem(KEY, next);
    else window.localStorage.removeItem(KEY);
  } catch {
    // not remembered, still works
  }
  listeners.forEach((l) => l());
}

export function toggleDrawer(id: DrawerId): void {
  setDrawer(openDrawer() === id ? null : id);
}

function subscribe(l: () => void): () => void {
  listeners.add(l);
  return () => listeners.delete(l);
}

export function useOpenDrawer(): DrawerId | null {
  return useSyncExternalStore(subscribe, openDrawer, () => null);
}
