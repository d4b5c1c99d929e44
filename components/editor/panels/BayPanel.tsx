'use client';
/**
 * The Bay panel: bay dimensions, wheel arches, doors, bulkhead and cab seats, the build-up
 * layers (material and thickness, with common presets) and the occupants (standing height,
 * sleepers' statures). Each change is one undo entry through the store; the schema refuses
 * impossible values (a door past the end of its wall) with a message. Never writes otherwise.
 */
import { memo } from 'react';
import { Plus, X } from 'lucide-react';
import { toast } from '@/components/ui/toast';
import { useShallow } from 'zustand/react/shallow';
import { BAY_LIMITS } from '@/lib/layout/vocabulary';
import type { Bay, BuildUp, Door, WheelArch } from '@/lib/layout/schema';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { LengthField } from './LengthField';
import { DEFAULT_SETTINGS } from '@/lib/checks/settings';
import { LAYER_PRESETS } from './buildUpPresets';
import { clearHeight, layersThickness } from '@/lib/layout/bay';
import { formatLength } from '@/lib/layout/units';

const section = 'space-y-2 border-b border-paper-edge p-4';
const h3 = 'text-xs font-semibold uppercase tracking-wide text-ink-soft';
const smallBtn = 'inline-flex items-center gap-1 rounded border border-paper-edge bg-paper px-2 py-0.5 text-xs hover:border-ink-faint disabled:opacity-40';

export const BayPanel = memo(function BayPanel() {
  const api = useEditorApi();
  const { doc, units, readOnly } = useEditor(useShallow((s) => ({ doc: s.doc, units: s.units, readOnly: s.readOnly })));
  const bay = doc.bay;
  const say = (r: { ok: boolean; error?: string }) => {
    if (!r.ok && r.error) toast.error(r.error);
    return r;
  };
  const setBay = (patch: Partial<Bay>) => say(api.getState().updateBay(patch));
  const setArch = (i: number, patch: Partial<WheelArch>) => setBay({ wheelArches: bay.wheelArches.map((a, j) => (j === i ? { ...a, ...patch } : a)) });
  const setDoor = (i: number, patch: Partial<Door>) => setBay({ doors: bay.doors.map((d, j) => (j === i ? { ...d, ...patch } : d)) });
  const setLayers = (part: keyof BuildUp, layers: BuildUp[keyof BuildUp]) => say(api.getState().updateBuildUp({ ...doc.buildUp, [part]: layers }));
  const occ = doc.occupants;

  return (
    <div className="text-sm">
      <fieldset disabled={readOnly}>
        <div className={section}>
          <h3 className={h3}>Bay (bare metal)</h3>
          <div className="grid grid-cols-3 gap-2">
            <LengthField label="Length" unit={units} valueMm={bay.length} min={BAY_LIMITS.length.min} max={BAY_LIMITS.length.max} onCommit={(v) => setBay({ length: v })} testId="bay-length" />
            <LengthField label="Width" unit={units} valueMm={bay.width} min={BAY_LIMITS.width.min} max={BAY_LIMITS.width.max} onCommit={(v) => setBay({ width: v })} />
            <LengthField label="Height" unit={units} valueMm={bay.height} min={BAY_LIMITS.height.min} max={BAY_LIMITS.height.max} onCommit={(v) => setBay({ height: v })} />
          </div>
          <div className="flex items-center gap-4 pt-1">
            <label className="flex items-center gap-1.5"><input type="checkbox" className="accent-copper" checked={bay.bulkhead} onChange={(e) => setBay({ bulkhead: e.target.checked })} /> Bulkhead</label>
            <label className="flex items-center gap-1.5">Seats in the cab
              <input type="number" min={0} max={9} value={bay.cabSeats} onChange={(e) => setBay({ cabSeats: Math.max(0, Math.min(9, Math.round(Number(e.target.value) || 0))) })} className="w-14 rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono" />
            </label>
          </div>
          <p className="text-xs text-ink-soft">Clear height after build-up: <span className="font-mono">{formatLength(clearHeight(doc), units)}</span></p>
          <LengthField
            label="Load floor above the road (for what hangs under the floor)"
            unit={units}
            valueMm={doc.settings?.floorAboveRoad ?? DEFAULT_SETTINGS.floorAboveRoad}
            min={100}
            max={2000}
            onCommit={(v) => say(api.getState().updateSettings({ floorAboveRoad: v }, 'Edit load floor height'))}
            testId="floor-above-road"
          />
        </div>

        <div className={section}>
          <div className="flex items-center justify-between"><h3 className={h3}>Wheel arches</h3>
            <button type="button" className={smallBtn} onClick={() => setBay({ wheelArches: [...bay.wheelArches, { side: bay.wheelArches.some((a) => a.side === 'left') ? 'right' : 'left', x: Math.max(0, Math.round(bay.length / 2) - 475), length: 950, width: 210, height: 320 }] })}><Plus size={12} aria-hidden /> Add</button>
          </div>
          {bay.wheelArches.map((a, i) => (
            <div key={i} className="space-y-1 rounded border border-paper-edge p-2">
              <div className="flex items-center justify-between">
                <label className="flex items-center gap-1.5 text-xs text-ink-soft">Arch {i + 1}, side
                  <select value={a.side} onChange={(e) => setArch(i, { side: e.target.value as WheelArch['side'] })} className="rounded border border-paper-edge bg-paper px-1 py-0.5 text-ink">
                    <option value="left">left</option><option value="right">right</option>
                  </select>
                </label>
                <button type="button" aria-label={`Remove wheel arch ${i + 1}`} className={smallBtn} onClick={() => setBay({ wheelArches: bay.wheelArches.filter((_, j) => j !== i) })}><X size={12} aria-hidden /></button>
              </div>
              <div className="grid grid-cols-2 gap-2">
                <LengthField label="From bulkhead" unit={units} valueMm={a.x} onCommit={(v) => setArch(i, { x: v })} />
                <LengthField label="Length" unit={units} valueMm={a.length} onCommit={(v) => setArch(i, { length: v })} />
                <LengthField label="Stands in from wall" unit={units} valueMm={a.width} onCommit={(v) => setArch(i, { width: v })} />
                <LengthField label="Height" unit={units} valueMm={a.height} onCommit={(v) => setArch(i, { height: v })} />
              </div>
            </div>
          ))}
        </div>

        <div className={section}>
          <div className="flex items-center justify-between"><h3 className={h3}>Doors</h3>
            <button type="button" className={smallBtn} onClick={() => setBay({ doors: [...bay.doors, { id: `door${bay.doors.length + 1}`, wall: 'left', offset: 200, width: Math.min(1000, bay.length - 200) }] })}><Plus size={12} aria-hidden /> Add</button>
          </div>
          {bay.doors.map((d, i) => (
            <div key={d.id + i} className="grid grid-cols-[auto_1fr_1fr_auto] items-end gap-1">
              <label className="text-xs"><span className="sr-only">Wall</span>
                <select value={d.wall} onChange={(e) => setDoor(i, { wall: e.target.value as Door['wall'] })} className="rounded border border-paper-edge bg-paper px-1 py-1">
                  <option value="left">left wall</option><option value="right">right wall</option><option value="rear">rear</option>
                </select>
              </label>
              <LengthField label={d.wall === 'rear' ? 'From left wall' : 'From bulkhead'} unit={units} valueMm={d.offset} onCommit={(v) => setDoor(i, { offset: v })} />
              <LengthField label="Opening" unit={units} valueMm={d.width} onCommit={(v) => setDoor(i, { width: v })} />
              <button type="button" aria-label={`Remove door ${d.id}`} className={smallBtn} onClick={() => setBay({ doors: bay.doors.filter((_, j) => j !== i) })}><X size={12} aria-hidden /></button>
            </div>
          ))}
        </div>

        {(['floor', 'walls', 'roof'] as const).map((part) => (
          <div key={part} className={section}>
            <div className="flex items-center justify-between">
              <h3 className={h3}>Build-up: {part} <span className="font-mono normal-case">{formatLength(layersThickness(doc.buildUp[part]), units)}</span></h3>
              <label className="text-xs"><span className="sr-only">Add a {part} layer</span>
                <select
                  value=""
                  onChange={(e) => {
                    const p = LAYER_PRESETS[Number(e.target.value)];
                    if (p) setLayers(part, [...doc.buildUp[part], { ...p.layer }]);
                  }}
                  className="rounded border border-paper-edge bg-paper px-1 py-0.5"
                >
                  <option value="">Add layer…</option>
                  {LAYER_PRESETS.map((p, i) => (p.group === part || p.group === 'any') && <option key={i} value={i}>{p.layer.material} {p.layer.thickness} mm</option>)}
                </select>
              </label>
            </div>
            {doc.buildUp[part].length === 0 && <p className="text-xs text-ink-soft">No layers: bare metal.</p>}
            {doc.buildUp[part].map((l, i) => (
              <div key={i} className="grid grid-cols-[1fr_6rem_auto] items-end gap-1">
                <label className="block"><span className="sr-only">Material of {part} layer {i + 1}</span>
                  <input
                    defaultValue={l.material}
                    key={l.material}
                    onBlur={(e) => e.target.value !== l.material && setLayers(part, doc.buildUp[part].map((x, j) => (j === i ? { ...x, material: e.target.value } : x)))}
                    className="w-full rounded border border-paper-edge bg-paper px-2 py-1"
                  />
                </label>
                <LengthField label={`Thickness of ${part} layer ${i + 1}`} compact unit={units} valueMm={l.thickness} onCommit={(v) => setLayers(part, doc.buildUp[part].map((x, j) => (j === i ? { ...x, thickness: v } : x)))} />
                <button type="button" aria-label={`Remove ${l.material}`} className={smallBtn} onClick={() => setLayers(part, doc.buildUp[part].filter((_, j) => j !== i))}><X size={12} aria-hidden /></button>
              </div>
            ))}
          </div>
        ))}

        <div className={section}>
          <h3 className={h3}>Occupants</h3>
          <LengthField label="Standing height (tallest person who must stand)" unit={units} valueMm={occ.standingHeight} onCommit={(v) => say(api.getState().updateOccupants({ ...occ, standingHeight: v }))} testId="standing-height" />
          <div className="flex items-center justify-between pt-1"><span className="text-xs text-ink-soft">Sleepers&apos; statures</span>
            <button type="button" className={smallBtn} onClick={() => say(api.getState().updateOccupants({ ...occ, sleepers: [...occ.sleepers, 1750] }))}><Plus size={12} aria-hidden /> Add sleeper</button>
          </div>
          {occ.sleepers.map((h, i) => (
            <div key={i} className="grid grid-cols-[1fr_auto] items-end gap-1">
              <LengthField label={`Sleeper ${i + 1}`} unit={units} valueMm={h} min={300} onCommit={(v) => say(api.getState().updateOccupants({ ...occ, sleepers: occ.sleepers.map((x, j) => (j === i ? v : x)) }))} />
              <button type="button" aria-label={`Remove sleeper ${i + 1}`} className={smallBtn} onClick={() => say(api.getState().updateOccupants({ ...occ, sleepers: occ.sleepers.filter((_, j) => j !== i) }))}><X size={12} aria-hidden /></button>
            </div>
          ))}
        </div>
      </fieldset>
    </div>
  );
});
