/**
 * The build-planning rules (mass.*, power.*, water.*, gas.*) live here; the build-planning engineer
 * replaces this placeholder with the real `systemChecks`. Pure: must never import UI, framework or
 * database code.
 */
import type { LayoutDoc } from '../../layout/schema'; import type { Finding } from '../types';
export function systemChecks(_doc: LayoutDoc): Finding[] { return []; }
