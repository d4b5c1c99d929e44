/**
 * Nesting a cut list onto standard sheets by guillotine packing: every cut runs edge to edge of
 * the piece it divides, as on a panel saw. Parts are placed largest first, each into the free
 * rectangle it fits most tightly (best short-side fit), and the rest of that rectangle is divided
 * along its shorter leftover side. Each part claims its size plus one kerf; the usable sheet is the
 * sheet less the edge trim on every side. With `respectGrain`, parts marked `grain` keep their
 * length along the sheet's length; others may turn 90°.
 *
 * `nestCutList(parts, sheet, options)` → `NestResult` for one sheet material: sheets with their
 * placements (for drawing the nesting), parts that cannot be placed (with the reason), sheets
 * needed, the area lower bound and the waste %. Heuristic: not guaranteed optimal; compare
 * `sheetsNeeded` with `lowerBound`. Plain numbers; must never import UI, framework or database code.
 */

export interface NestPart {
  id: string;
  label: string;
  /** Along the grain, mm. */
  length: number;
  width: number;
  /** The length must run along the sheet's length (visible faces). */
  grain: boolean;
}

export interface SheetSize {
  /** Along the sheet's grain, mm (2440 for the common 8 × 4 ft board). */
  length: number;
  width: number;
}

export interface NestOptions {
  /** Saw kerf, mm; default 3 (a typical panel-saw blade, common practice, no source). */
  kerfMm?: number;
  /** Trim taken off every sheet edge, mm; default 0. */
  trimMm?: number;
  /** Keep grain-marked parts along the sheet's length; default true. */
  respectGrain?: boolean;
}

export interface Placement {
  partId: string;
  label: string;
  /** Corner on the sheet, mm: x along the sheet's length, y across. */
  x: number;
  y: number;
  /** Extent along the sheet's length and across it. */
  length: number;
  width: number;
  rotated: boolean;
}

export interface NestedSheet {
  index: number;
  placements: Placement[];
  /** Part area ÷ sheet area, %. */
  usedPct: number;
}

export interface NestResult {
  sheet: SheetSize;
  kerfMm: number;
  trimMm: number;
  sheets: NestedSheet[];
  unplaced: { partId: string; label: string; reason: string }[];
  sheetsNeeded: number;
  /** ⌈placed part area ÷ usable sheet area⌉: no packing can use fewer sheets. */
  lowerBound: number;
  /** Offcut share of the sheets bought, %. */
  wastePct: number;
}

interface FreeRect { x: number; y: number; w: number; h: number }
interface OpenSheet { free: FreeRect[]; placements: Placement[] }

export const STANDARD_SHEET: SheetSize = { length: 2440, width: 1220 };
export const DEFAULT_KERF_MM = 3;

export function nestCutList(parts: NestPart[], sheet: SheetSize = STANDARD_SHEET, options: NestOptions = {}): NestResult {
  const kerf = options.kerfMm ?? DEFAULT_KERF_MM;
  const trim = options.trimMm ?? 0;
  const respectGrain = options.respectGrain ?? true;
  if (!(sheet.length > 0 && sheet.width > 0) || !Number.isFinite(sheet.length) || !Number.isFinite(sheet.width)) throw new RangeError('sheet length and width must be positive');
  if (!(kerf >= 0) || !Number.isFinite(kerf)) throw new RangeError('kerf must be zero or more');
  if (!(trim >= 0) || 2 * trim >= Math.min(sheet.length, sheet.width)) throw new RangeError('trim must be zero or more and leave some sheet');
  const usableL = sheet.length - 2 * trim;
  const usableW = sheet.width - 2 * trim;
  // The kerf after the last part of a row runs off into the trim (or off the sheet): widen the
  // region by one kerf so a part may end exactly at the usable edge.
  const regionL = usableL + kerf;
  const regionW = usableW + kerf;

  const unplaced: NestResult['unplaced'] = [];
  const valid: NestPart[] = [];
  for (const p of parts) {
    if (!(p.length > 0 && p.width > 0) || !Number.isFinite(p.length) || !Number.isFinite(p.width)) {
      unplaced.push({ partId: p.id, label: p.label, reason: 'length and width must be positive numbers' });
      continue;
    }
    const turns = !respectGrain || !p.grain;
    const fitsStraight = p.length <= usableL && p.width <= usableW;
    const fitsTurned = turns && p.width <= usableL && p.length <= usableW;
    if (!fitsStraight && !fitsTurned) {
      unplaced.push({ partId: p.id, label: p.label, reason: `${p.length} × ${p.width} mm is larger than the usable sheet (${usableL} × ${usableW} mm${turns ? '' : ', grain kept along the length'})` });
      continue;
    }
    valid.push(p);
  }
  valid.sort((a, b) => Math.max(b.length, b.width) - Math.max(a.length, a.width) || b.length * b.width - a.length * a.width || a.id.localeCompare(b.id));

  const open: OpenSheet[] = [];
  const newSheet = (): OpenSheet => ({ free: [{ x: trim, y: trim, w: regionL, h: regionW }], placements: [] });
  for (const p of valid) {
    const orientations: { l: number; w: number; rotated: boolean }[] = [{ l: p.length, w: p.width, rotated: false }];
    if ((!respectGrain || !p.grain) && p.length !== p.width) orientations.push({ l: p.width, w: p.length, rotated: true });
    type Choice = { sheet: OpenSheet; rect: number; o: (typeof orientations)[number]; score: number };
    let best: Choice | null = null;
    for (const s of open) {
      for (let ri = 0; ri < s.free.length; ri++) {
        const r = s.free[ri];
        for (const o of orientations) {
          const fw = o.l + kerf;
          const fh = o.w + kerf;
          if (fw > r.w || fh > r.h) continue;
          const score = Math.min(r.w - fw, r.h - fh);
          if (best === null || score < best.score) best = { sheet: s, rect: ri, o, score };
        }
      }
    }
    if (best === null) {
      const s = newSheet();
      open.push(s);
      // On a fresh sheet too, take the orientation that leaves the tighter fit.
      const fitting = orientations.filter((c) => c.l <= usableL && c.w <= usableW);
      const score = (c: (typeof orientations)[number]) => Math.min(regionL - c.l - kerf, regionW - c.w - kerf);
      const o = fitting.reduce((a, c) => (score(c) < score(a) ? c : a));
      best = { sheet: s, rect: 0, o, score: score(o) };
    }
    const { sheet: s, rect, o } = best;
    const r = s.free[rect];
    s.placements.push({ partId: p.id, label: p.label, x: r.x, y: r.y, length: o.l, width: o.w, rotated: o.rotated });
    s.free.splice(rect, 1, ...splitGuillotine(r, o.l + kerf, o.w + kerf));
  }

  const sheetArea = sheet.length * sheet.width;
  const placedArea = valid.reduce((a, p) => a + p.length * p.width, 0);
  const sheets = open.map((s, i): NestedSheet => ({
    index: i,
    placements: s.placements,
    usedPct: (s.placements.reduce((a, pl) => a + pl.length * pl.width, 0) / sheetArea) * 100,
  }));
  return {
    sheet,
    kerfMm: kerf,
    trimMm: trim,
    sheets,
    unplaced,
    sheetsNeeded: sheets.length,
    lowerBound: Math.ceil(placedArea / (usableL * usableW) - 1e-9),
    wastePct: sheets.length ? (1 - placedArea / (sheets.length * sheetArea)) * 100 : 0,
  };
}

/** Divide what is left of `r` after a `fw × fh` corner, along the shorter leftover side. */
function splitGuillotine(r: FreeRect, fw: number, fh: number): FreeRect[] {
  const right = r.w - fw;
  const below = r.h - fh;
  const out: FreeRect[] = [];
  if (right < below) {
    // Horizontal cut: the strip below spans the whole width.
    if (right > 0) out.push({ x: r.x + fw, y: r.y, w: right, h: fh });
    if (below > 0) out.push({ x: r.x, y: r.y + fh, w: r.w, h: below });
  } else {
    // Vertical cut: the strip to the right spans the whole height.
    if (right > 0) out.push({ x: r.x + fw, y: r.y, w: right, h: r.h });
    if (below > 0) out.push({ x: r.x, y: r.y + fh, w: fw, h: below });
  }
  return out;
}
