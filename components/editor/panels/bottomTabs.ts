/**
 * The docked bottom panel's drawing tabs, after Checks: one list for the editor (Editor.tsx) and
 * its frame as served (EditorLoader.tsx), so the two name them alike.
 */
import type { TabDef } from '@/components/ui/Tabs';

export const DRAWING_TABS: readonly TabDef[] = [
  { id: 'section', title: 'Side section', label: 'Side section' },
  { id: 'walls', title: 'Wall elevations', label: 'Walls' },
  { id: 'roof', title: 'Roof plan', label: 'Roof' },
];
