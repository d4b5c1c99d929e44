/**
 * The cut list: sheet-material panels of each cabinet-type module, from the panels its kind's
 * carcass is made of (declared with the kind, lib/layout/kinds.ts), grouped by sheet material and
 * nested onto standard sheets.
 *
 * Rules (common practice, no source; a starting list for the workshop, not a joinery design):
 * a carcass has two sides (depth × height) between which the top, bottom and shelves sit
 * (front width − 2 × carcass thickness), a 6 mm back over the full front width × height, and
 * counters carry an 18 mm worktop over the whole top. The front width runs along the module's
 * working face (`facing`). Drawer boxes, doors and face frames are not listed. Panels larger than
 * a sheet are split into equal pieces (joined over a batten). Sheets are the common 2440 × 1220 mm
 * board (common practice).
 *
 * The wall and roof lining panels follow (lining-panels.ts), each with the cut-outs the windows and
 * roof openings make in it; a panel's area (`partAreaM2`) and its material's net area leave them out.
 *
 * `cutListFromDoc(doc, options)` → parts; `planCutList(doc, options)` → parts nested per material.
 * Pure; never throws on a valid LayoutDoc. Must never import UI, framework or database code.
 */
import { kindSpec } from '../layout/kinds';
import type { LayoutDoc, Module } from '../layout';
import { moduleFacts, moduleName } from './module-facts';
import { liningPanels, liningSurfaceName, netAreaM2, type CutOut } from './lining-panels';
import { nestCutList, STANDARD_SHEET, type NestOptions, type NestResult, type SheetSize } from './sheet-nesting';

export interface SheetMaterial {
  id: string;
  title: string;
  thicknessMm: number;
}

/** Common practice, no source: lightweight poplar/birch plywood in three thicknesses. */
export const SHEET_MATERIALS: Record<string, SheetMaterial> = {
  'ply-18': { id: 'ply-18', title: 'Plywood 18 mm (worktops, bed tops)', thicknessMm: 18 },
  'ply-15': { id: 'ply-15', title: 'Plywood 15 mm (carcasses)', thicknessMm: 15 },
  'ply-6': { id: 'ply-6', title: 'Plywood 6 mm (backs)', thicknessMm: 6 },
};

export interface CutPart {
  id: string;
  label: string;
  /** The module it is cut for; null for a lining panel. */
  moduleId: string | null;
  /** A key of SHEET_MATERIALS, or of the cut list's `liningMaterials`. */
  material: string;
  /** Along the grain, mm. */
  length: number;
  width: number;
  grain: boolean;
  /** What the openings take out of a lining panel; empty for a carcass piece. */
  cutOuts: CutOut[];
}

/** A part's area less its cut-outs, m². */
export function partAreaM2(p: Pick<CutPart, 'length' | 'width' | 'cutOuts'>): number {
  return netAreaM2(p.length, p.width, p.cutOuts);
}

export interface CutListOptions extends NestOptions {
  sheet?: SheetSize;
  /** List the wall and roof lining panels too; default true (the parts list leaves them out: no price key yet). */
  lining?: boolean;
}

export interface CutList {
  parts: CutPart[];
  /** Modules with no sheet parts, and why. */
  skipped: { moduleId: string; reason: string }[];
  /** The sheet materials the linings are cut from (by the build-up layer's name and thickness). */
  liningMaterials: SheetMaterial[];
}

/** The sheet material a lining layer is cut from: one per layer name and thickness. */
function liningMaterial(layer: { material: string; thickness: number }): SheetMaterial {
  const slug = layer.material.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'sheet';
  const name = layer.material.trim();
  return { id: `lining-${slug}-${layer.thickness}`, title: `${name} ${layer.thickness} mm${/lining/i.test(name) ? '' : ' (lining)'}`, thicknessMm: layer.thickness };
}

/** Front width along the working face, depth into the module. */
function faceDims(m: Module): { front: number; depth: number } {
  return m.facing === 'left' || m.facing === 'right' ? { front: m.length, depth: m.width } : { front: m.width, depth: m.length };
}

export function cutListFromDoc(doc: LayoutDoc, options: CutListOptions = {}): CutList {
  const sheet = options.sheet ?? STANDARD_SHEET;
  const trim = options.trimMm ?? 0;
  const parts: CutPart[] = [];
  const skipped: CutList['skipped'] = [];
  const t = SHEET_MATERIALS['ply-15'].thicknessMm;
  const tb = SHEET_MATERIALS['ply-6'].thicknessMm;
  for (const m of doc.modules) {
    const facts = moduleFacts(m);
    const rule = facts.carcass;
    if (!rule) {
      skipped.push({ moduleId: m.id, reason: facts.notCut ?? `${kindSpec(m.kind).title.toLowerCase()}: bought in, no sheet parts` });
      continue;
    }
    const { front, depth } = faceDims(m);
    const h = m.height;
    const inner = Math.max(1, front - 2 * t);
    const shelves = Math.max(0, Math.round(rule.shelves));
    const add = (piece: string, material: CutPart['material'], length: number, width: number, grain: boolean, qty = 1) => {
      for (let i = 1; i <= qty; i++) {
        for (const [j, part] of splitToSheet(length, width, grain, sheet, trim).entries()) {
          const n = splitCount(length, width, grain, sheet, trim);
          const label = `${moduleName(m)} — ${piece}${qty > 1 ? ` ${i}` : ''}${n > 1 ? ` (piece ${j + 1} of ${n})` : ''}`;
          parts.push({ id: `${m.id}:${piece}${qty > 1 ? `-${i}` : ''}${n > 1 ? `-p${j + 1}` : ''}`, label, moduleId: m.id, material, length: part.length, width: part.width, grain, cutOuts: [] });
        }
      }
    };
    for (const piece of rule.pieces) {
      switch (piece) {
        case 'sides': add('side', 'ply-15', h, depth, true, 2); break;
        case 'top': add('top', 'ply-15', front, depth, true); break;
        case 'bottom': add('bottom', 'ply-15', inner, depth, false); break;
        case 'back': add('back', 'ply-6', front, h, false); break;
        case 'shelves': if (shelves > 0) add('shelf', 'ply-15', inner, Math.max(1, depth - tb), false, shelves); break;
        case 'front': add('front', 'ply-15', front, h, true); break;
        case 'worktop': add(rule.topName ?? 'worktop', 'ply-18', Math.max(front, depth), Math.min(front, depth), true); break;
      }
    }
  }
  const { L, W } = usable(sheet, trim);
  const liningMaterials = new Map<string, SheetMaterial>();
  const panels = options.lining === false ? [] : liningPanels(doc, L, W);
  const count = new Map<string, number>();
  for (const p of panels) count.set(p.surface, (count.get(p.surface) ?? 0) + 1);
  const seen = new Map<string, number>();
  for (const p of panels) {
    const material = liningMaterial(p.layer);
    liningMaterials.set(material.id, material);
    const i = (seen.get(p.surface) ?? 0) + 1;
    seen.set(p.surface, i);
    // Boards keep their grain up the wall (across the van on the roof): `length` is the rise.
    parts.push({ id: `lining:${p.surface}-${i}`, label: `${liningSurfaceName(p.surface)} — panel ${i} of ${count.get(p.surface)}`, moduleId: null, material: material.id, length: p.rise, width: p.span, grain: true, cutOuts: p.cutOuts });
  }
  return { parts, skipped, liningMaterials: [...liningMaterials.values()] };
}

function usable(sheet: SheetSize, trim: number) {
  return { L: sheet.length - 2 * trim, W: sheet.width - 2 * trim };
}

/** Pieces a panel must be cut into to fit the usable sheet (1 when it fits). */
export function splitCount(length: number, width: number, grain: boolean, sheet: SheetSize, trim = 0): number {
  const { L, W } = usable(sheet, trim);
  const straight = Math.ceil(length / L) * Math.ceil(width / W);
  const turned = grain ? Infinity : Math.ceil(width / L) * Math.ceil(length / W);
  return Math.min(straight, turned);
}

/** Equal pieces of a panel, each fitting the usable sheet. */
export function splitToSheet(length: number, width: number, grain: boolean, sheet: SheetSize, trim = 0): { length: number; width: number }[] {
  const { L, W } = usable(sheet, trim);
  const straight = { nl: Math.ceil(length / L), nw: Math.ceil(width / W) };
  const turned = { nl: Math.ceil(length / W), nw: Math.ceil(width / L) };
  const useTurned = !grain && turned.nl * turned.nw < straight.nl * straight.nw;
  const { nl, nw } = useTurned ? turned : straight;
  const pl = Math.floor(length / nl);
  const pw = Math.floor(width / nw);
  return Array.from({ length: nl * nw }, () => ({ length: pl, width: pw }));
}

export interface CutPlan {
  parts: CutPart[];
  skipped: CutList['skipped'];
  /** Per material: the nesting, and the parts' area less their cut-outs (m²). */
  byMaterial: { material: SheetMaterial; nest: NestResult; netAreaM2: number }[];
  sheetsNeeded: number;
}

export function planCutList(doc: LayoutDoc, options: CutListOptions = {}): CutPlan {
  const { parts, skipped, liningMaterials } = cutListFromDoc(doc, options);
  const byMaterial = [...Object.values(SHEET_MATERIALS), ...liningMaterials]
    .map((material) => ({ material, parts: parts.filter((p) => p.material === material.id) }))
    .filter((g) => g.parts.length > 0)
    .map((g) => ({ material: g.material, nest: nestCutList(g.parts, options.sheet ?? STANDARD_SHEET, options), netAreaM2: g.parts.reduce((a, p) => a + partAreaM2(p), 0) }));
  return { parts, skipped, byMaterial, sheetsNeeded: byMaterial.reduce((a, g) => a + g.nest.sheetsNeeded, 0) };
}
