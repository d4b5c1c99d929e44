'use client';
/**
 * The Checks panel in the editor: the report as ChecksReportView shows it, with the editor's
 * units and highlight; clicking a finding selects and highlights the modules and openings it
 * names (switching to its arrangement).
 */
import { useCallback } from 'react';
import type { Finding } from '@/lib/checks/types';
import { useEditorApi, useEditor } from '../store/EditorStoreContext';
import type { LiveChecks } from '../api/useLiveChecks';
import { ChecksReportView } from './ChecksReportView';

export function ChecksPanel({ checks, layoutId }: { checks: LiveChecks; layoutId?: string }) {
  const api = useEditorApi();
  const units = useEditor((s) => s.units);
  const highlight = useEditor((s) => s.highlight);
  const openingHighlight = useEditor((s) => s.openingHighlight);
  const focus = useCallback((f: Finding) => {
    const s = api.getState();
    if (f.arrangement && f.arrangement !== s.arrangement) s.setArrangement(f.arrangement);
    api.getState().setHighlight(f.moduleIds ?? [], f.openingIds ?? []);
  }, [api]);
  return <ChecksReportView checks={checks} units={units} layoutId={layoutId} highlight={highlight} openingHighlight={openingHighlight} focus={focus} />;
}
