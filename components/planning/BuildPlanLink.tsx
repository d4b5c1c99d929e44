'use client';
/**
 * The "Build plan" entry in the editor's toolbar (through its toolbar slot): a plain link to
 * /layouts/[id]/build. A full page load on purpose, so the editor's guard against leaving with
 * unsaved changes still asks first. Holds no state.
 */
import { ClipboardList } from 'lucide-react';

export function BuildPlanLink({ layoutId }: { layoutId: string }) {
  return (
    <a href={`/layouts/${encodeURIComponent(layoutId)}/build`} className="btn-quiet px-2 py-1" data-testid="build-plan-link">
      <ClipboardList size={14} aria-hidden="true" /> Build plan
    </a>
  );
}
