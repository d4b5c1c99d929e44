'use client';
/**
 * Two-point calibration of a photo: the person clicks two points on the photo whose distance
 * they know (a tape laid on the floor, a door opening), types that distance, and says where the
 * first point is in the bay (e.g. 0, 0 for the bulkhead corner at the left wall). The maths is
 * lib/tracing; this only collects the clicks and the numbers.
 */
import { useState, type MouseEvent } from 'react';
import { formatLength, parseLength, type LengthUnit } from '@/lib/layout/units';
import { calibrateFromImage, CalibrationError, imageToBay, type Point, type TracingPlacement } from '@/lib/tracing/calibration';
import type { UploadDto } from '@/lib/uploads/dto';

interface Props {
  upload: UploadDto;
  units: LengthUnit;
  onSave: (placement: TracingPlacement) => void;
  onCancel: () => void;
  saving: boolean;
}

export function CalibrateDialog({ upload, units, onSave, onCancel, saving }: Props) {
  const [points, setPoints] = useState<Point[]>([]);
  const [natural, setNatural] = useState<{ w: number; h: number } | null>(null);
  const [distance, setDistance] = useState('');
  const [anchorX, setAnchorX] = useState(upload.tracing ? '' : '0');
  const [anchorY, setAnchorY] = useState(upload.tracing ? '' : '0');
  const [rotation, setRotation] = useState(upload.tracing?.rotation ?? 0);
  const [error, setError] = useState<string | null>(null);

  function click(e: MouseEvent<HTMLImageElement>) {
    const img = e.currentTarget;
    const box = img.getBoundingClientRect();
    // Screen → image pixels: the photo is shown scaled to fit.
    const p = { x: ((e.clientX - box.left) / box.width) * img.naturalWidth, y: ((e.clientY - box.top) / box.height) * img.naturalHeight };
    setPoints((ps) => (ps.length >= 2 ? [p] : [...ps, p]));
    setError(null);
  }

  function save() {
    const real = parseLength(distance, units);
    if (points.length < 2) return setError('Click two points on the photo first.');
    if (real === null) return setError('Type the real distance between the two points, e.g. 1000 mm or 100 cm.');
    const ax = anchorX.trim() === '' ? null : parseLength(anchorX, units);
    const ay = anchorY.trim() === '' ? null : parseLength(anchorY, units);
    if ((anchorX.trim() !== '' && ax === null) || (anchorY.trim() !== '' && ay === null)) return setError('The first point’s position must be lengths, e.g. 0 or 120 mm.');
    try {
      // Without a position, the first point stays where the current placement puts it.
      let firstInBay = { x: ax ?? 0, y: ay ?? 0 };
      if ((ax === null || ay === null) && upload.tracing) {
        const here = imageToBay(points[0], upload.tracing);
        firstInBay = { x: ax ?? here.x, y: ay ?? here.y };
      }
      onSave(calibrateFromImage(points[0], points[1], real, firstInBay, rotation, upload.tracing?.opacity ?? 0.5));
    } catch (err) {
      setError(err instanceof CalibrationError ? err.message : 'The photo could not be scaled from those points.');
    }
  }

  const span = points.length === 2 ? Math.hypot(points[1].x - points[0].x, points[1].y - points[0].y) : null;
  return (
    <div className="space-y-3 text-sm">
      <p className="text-ink-soft">Click two points on the photo whose real distance you know, then type it.</p>
      <div className="relative inline-block max-w-full border border-paper-edge">
        {/* eslint-disable-next-line @next/next/no-img-element -- a rights-checked route, clicked for coordinates */}
        <img src={upload.url} alt={`${upload.fileName}: click two points`} className="block max-h-[50vh] max-w-full cursor-crosshair select-none" onClick={click} draggable={false}
          onLoad={(e) => setNatural({ w: e.currentTarget.naturalWidth, h: e.currentTarget.naturalHeight })} data-testid="calibrate-image" />
        {natural && points.map((p, i) => (
          <span key={i} aria-hidden="true" className="pointer-events-none absolute -ml-2 -mt-2 flex h-4 w-4 items-center justify-center rounded-full border-2 border-copper bg-paper text-[9px] font-bold text-copper"
            style={{ left: `${(p.x / natural.w) * 100}%`, top: `${(p.y / natural.h) * 100}%` }}>{i + 1}</span>
        ))}
      </div>
      <p className="font-mono text-xs text-ink-soft" aria-live="polite">
        {points.length === 0 ? 'No points yet.' : points.length === 1 ? 'Point 1 set; click point 2.' : `Points 1 and 2 are ${span!.toFixed(0)} px apart on the photo.`}
      </p>
      <label className="block"><span className="label">Real distance between the points</span>
        <input className="field font-mono" value={distance} onChange={(e) => setDistance(e.target.value)} placeholder={`e.g. ${formatLength(1000, units)}`} aria-label="Real distance between the points" />
      </label>
      <div className="grid grid-cols-3 gap-2">
        <label><span className="label">Point 1 at x</span><input className="field font-mono" value={anchorX} onChange={(e) => setAnchorX(e.target.value)} placeholder="keep" aria-label="Point 1 x in the bay" /></label>
        <label><span className="label">Point 1 at y</span><input className="field font-mono" value={anchorY} onChange={(e) => setAnchorY(e.target.value)} placeholder="keep" aria-label="Point 1 y in the bay" /></label>
        <label><span className="label">Turn</span>
          <select className="field font-mono" value={rotation} onChange={(e) => setRotation(Number(e.target.value))} aria-label="Turn the photo">
            {[0, 90, 180, 270].map((r) => <option key={r} value={r}>{r}°</option>)}
          </select>
        </label>
      </div>
      {error && <p role="alert" className="field-error">{error}</p>}
      <div className="flex justify-end gap-2">
        <button type="button" className="btn-quiet" onClick={onCancel}>Cancel</button>
        <button type="button" className="btn-primary" onClick={save} disabled={saving}>Place under the plan</button>
      </div>
    </div>
  );
}
