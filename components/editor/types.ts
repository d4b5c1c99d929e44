/**
 * Shared types of the layout editor: the props the page hands it, and the branded length types
 * that keep millimetres (the document) and pixels (the screen) from being mixed up.
 * Must never hold behaviour: types and tiny constructors only.
 */
import type { ReactNode } from 'react';
import type { Arrangement, LayoutDoc, LengthUnit } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';
import type { Viewport } from './geometry/viewport';

/** What the layout page passes to `<EditorLoader />` (fixed contract with the app shell). */
export interface EditorProps {
  layoutId: string;
  initialDoc: LayoutDoc;
  initialVersion: number;
  /** False for clients and viewer links: the same drawing, read-only (no shelf, no drag, no save). */
  canEdit: boolean;
  units: LengthUnit;
  /** Optional additions from other features (sharing: comment pins, viewer links); none by default. */
  extensions?: EditorExtensions;
  /**
   * The check report of `initialDoc`, made by the server as the page rendered: the report itself when
   * it was ready in time, else its promise (streamed); null: ask as usual.
   */
  initialChecks?: CheckReport | Promise<CheckReport | null> | null;
}

/** Hooks other features plug into the editor without the editor knowing what they are. */
export interface EditorExtensions {
  /** Extra Konva nodes (a Group, not a Layer) drawn over the plan in the overlay's layer, in world mm. */
  planOverlay?: (view: { viewport: Viewport; arrangement: Arrangement }) => ReactNode;
  /** Extra Konva layers drawn under the plan (tracing photos), never listening for events. */
  planUnderlay?: (view: { viewport: Viewport; arrangement: Arrangement }) => ReactNode;
  /** Extra controls at the right end of the toolbar (behind "More" on a tablet). */
  toolbarExtra?: ReactNode;
  /** A panel of the page's own beside Details (Mark-ups): docked on a desktop, a drawer on a tablet; its toggle sits in the toolbar. */
  sidePanel?: { title: string; count?: number; countLabel?: string; content: ReactNode };
  /** A strip under the toolbar (rendered inside the editor's store provider): where the layout stands with its revisions. */
  banner?: ReactNode;
  /** Where findings come from instead of POST /api/checks (a viewer link has no session). */
  fetchChecks?: (doc: LayoutDoc, signal?: AbortSignal) => Promise<CheckReport>;
  /** A newer stored copy to show while read-only (live viewer links): replaces the document when its version moves on. */
  incoming?: { doc: LayoutDoc; version: number } | null;
}

declare const mmBrand: unique symbol;
declare const pxBrand: unique symbol;
/** A length in millimetres of the van (world space). */
export type Mm = number & { readonly [mmBrand]: true };
/** A length in CSS pixels on screen. */
export type Px = number & { readonly [pxBrand]: true };

export const mm = (n: number): Mm => n as Mm;
export const px = (n: number): Px => n as Px;
