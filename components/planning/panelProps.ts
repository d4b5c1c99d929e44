/**
 * What the build-plan page hands each systems panel: the draft document (its results follow
 * every keystroke), the display unit for lengths, whether it is read-only, where to send the
 * parsed section, where to report whether its fields read cleanly, and the system findings.
 * Types only.
 */
import type { Finding } from '@/lib/checks/types';
import type { LayoutDoc, LengthUnit, Systems } from '@/lib/layout';

export interface PanelProps {
  doc: LayoutDoc;
  units: LengthUnit;
  readOnly: boolean;
  /** Replaces the named sections of `doc.systems` (an undefined section is removed). */
  onSystems: (patch: Partial<Systems>) => void;
  onValidity: (ok: boolean) => void;
  findings: Finding[];
}
