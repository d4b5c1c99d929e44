/**
 * The check report contract (DESIGN.md). A finding says what was measured, what was needed, in
 * which unit, and where the rule comes from. Pure data: no React, no database, no Next.
 */
import type { Arrangement } from '../layout/schema';

export type FindingStatus = 'pass' | 'warn' | 'fail';

export interface Finding {
  /** Stable dotted id of the rule, e.g. `sleep.length`; one rule may yield several findings. */
  id: string;
  status: FindingStatus;
  arrangement?: Arrangement;
  moduleIds?: string[];
  /** The bay's openings (windows, roof openings, body points) the finding is about, by id. */
  openingIds?: string[];
  measured?: number;
  required?: number;
  unit?: string;
  message: string;
  /** Standard and clause, handbook table, or "common practice, no source". */
  source?: string;
  /**
   * Present only when the rule could not be checked because inputs are missing: the on-screen
   * fields to fill in (their labels as the user sees them) and the build-plan tab that holds each.
   * The Checks list folds every such finding into one "not yet checked" line.
   */
  needs?: FindingNeed[];
}

/** One missing input, named as the user sees it on screen. */
export interface FindingNeed {
  /** The field's label, e.g. "Mass in running order". Never a JSON path. */
  label: string;
  /** Where it is entered: a build-plan tab, or the editor itself. */
  where: 'weight' | 'power' | 'water' | 'gas' | 'heat' | 'editor';
}

export interface CheckReport {
  /** True when no finding fails. */
  ok: boolean;
  findings: Finding[];
}
