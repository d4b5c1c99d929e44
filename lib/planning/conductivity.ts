/**
 * Thermal conductivity (λ, W/m·K) of the materials a van build-up is made of, matched from the
 * free-text material name of a layer. Each entry names its source:
 * - "EN ISO 10456 Table 3 (from memory)": design values of the standard's table of common materials.
 * - "typical declared λ (from memory)": manufacturers' declared values for insulation products
 *   (EN 13162–13165 product standards); use your product's own declared value when you have it.
 * Overrides per material name come from `systems.insulation.conductivities`.
 *
 * Plain data. Must never import UI, framework or database code.
 */

export interface MaterialConductivity {
  id: string;
  title: string;
  /** Lower-case words; the first entry whose word occurs in the layer's material name wins. */
  match: string[];
  lambda: number;
  source: string;
}

const ISO = 'EN ISO 10456 Table 3 (from memory)';
const DECLARED = 'typical declared λ (from memory)';

/**
 * Order matters: specific names before general ones — "mineral wool", "glass wool", "rock wool"
 * before the bare word "wool" (which means sheep wool), "plywood" before "wood".
 */
export const CONDUCTIVITIES: MaterialConductivity[] = [
  { id: 'pir', title: 'PIR/PUR board', match: ['pir', 'pur', 'polyiso', 'polyurethane'], lambda: 0.022, source: DECLARED },
  { id: 'xps', title: 'XPS foam board', match: ['xps', 'extruded polystyrene'], lambda: 0.034, source: DECLARED },
  { id: 'eps', title: 'EPS foam board', match: ['eps', 'expanded polystyrene', 'polystyrene'], lambda: 0.036, source: DECLARED },
  { id: 'elastomer', title: 'Closed-cell elastomeric/PE foam', match: ['closed-cell', 'closed cell', 'elastomeric', 'pe foam', 'polyethylene foam'], lambda: 0.036, source: DECLARED },
  { id: 'mineral-wool', title: 'Mineral wool', match: ['mineral wool', 'glass wool', 'glass fibre wool', 'rock wool', 'stone wool', 'glasswool', 'stonewool'], lambda: 0.037, source: DECLARED },
  { id: 'sheep-wool', title: 'Sheep wool', match: ['sheep wool', 'sheep', 'wool batt', 'wool'], lambda: 0.038, source: DECLARED },
  { id: 'polyester', title: 'Polyester fibre', match: ['polyester', 'polyester fibre'], lambda: 0.040, source: DECLARED },
  { id: 'cork', title: 'Cork board', match: ['cork'], lambda: 0.040, source: DECLARED },
  { id: 'plywood', title: 'Plywood (500 kg/m³)', match: ['plywood', 'ply'], lambda: 0.13, source: ISO },
  { id: 'mdf', title: 'Fibreboard / MDF', match: ['mdf', 'fibreboard', 'hardboard'], lambda: 0.14, source: ISO },
  { id: 'softwood', title: 'Softwood timber', match: ['pine', 'spruce', 'softwood', 'batten', 'cladding', 'tongue and groove', 'timber', 'wood'], lambda: 0.13, source: ISO },
  { id: 'pvc', title: 'PVC / vinyl', match: ['vinyl', 'pvc', 'lino'], lambda: 0.17, source: ISO },
  { id: 'carpet', title: 'Textile floor covering / carpet lining', match: ['carpet', 'felt', 'textile'], lambda: 0.06, source: ISO },
  { id: 'rubber', title: 'Rubber', match: ['rubber'], lambda: 0.17, source: ISO },
  { id: 'steel', title: 'Steel', match: ['steel'], lambda: 50, source: ISO },
  { id: 'aluminium', title: 'Aluminium', match: ['aluminium', 'aluminum'], lambda: 160, source: ISO },
  { id: 'grp', title: 'GRP / fibreglass sheet', match: ['grp', 'fibreglass', 'fiberglass'], lambda: 0.3, source: DECLARED },
];

export interface ResolvedConductivity {
  lambda: number;
  source: string;
  title: string;
}

/** λ for a layer's material, or null when it is not recognised. Overrides match the name exactly (case-insensitive). */
export function conductivityOf(material: string, overrides: Record<string, number> = {}): ResolvedConductivity | null {
  const name = material.trim().toLowerCase();
  for (const [key, lambda] of Object.entries(overrides)) {
    if (key.trim().toLowerCase() === name) return { lambda, source: 'declared λ entered for this layout', title: material };
  }
  for (const [c, patterns] of MATCHERS) {
    if (patterns.some((re) => re.test(name))) return { lambda: c.lambda, source: c.source, title: c.title };
  }
  return null;
}

/** The family a layer's material belongs to (`plywood`, `mdf`, `pir`…), by the same matching and no overrides; null when not recognised. */
export function materialFamily(material: string): string | null {
  const name = material.trim().toLowerCase();
  for (const [c, patterns] of MATCHERS) if (patterns.some((re) => re.test(name))) return c.id;
  return null;
}

/** Whole-word patterns, built once. */
const MATCHERS: [MaterialConductivity, RegExp[]][] = CONDUCTIVITIES.map((c) => [c, c.match.map((w) => new RegExp(`(^|[^a-z])${escapeRe(w)}([^a-z]|$)`))]);

function escapeRe(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
