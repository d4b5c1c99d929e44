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
  measured?: number;
  required?: number;
  unit?: string;
  message: string;
  /** Standard and clause, handbook table, or "common practice, no source". */
  source?: string;
}

export interface CheckReport {
  /** True when no finding fails. */
  ok: boolean;
  findings: Finding[];
}
