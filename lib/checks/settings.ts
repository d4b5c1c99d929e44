/**
 * The numbers the rules compare against: per-layout settings (`doc.settings`) layered over a
 * studio's defaults over the built-in defaults below, plus the fixed rule constants. Every
 * default names its source beside it. Pure: must never import UI, framework or database code.
 */
import { settingsSchema, type LayoutDoc, type LayoutSettings, type MattressRegion } from '../layout/schema';

export interface CheckSettings {
  /** Walkway and escape width, mm. */
  walkwayMin: number;
  /** Bed length beyond the tallest sleeper, mm. */
  bedAllowance: number;
  bedWidthPerSleeper: number;
  /** Bed pieces closer than this in plan join one bed; their tops may differ by this much. */
  levelTolerance: number;
  /** Headroom above the tallest stature before it stops being a warning. */
  headMargin: number;
  mattressRegion: MattressRegion;
  /** Height of the load floor above the road, unladen, mm (the under-floor envelope). */
  floorAboveRoad: number;
}

export const DEFAULT_SETTINGS: Readonly<CheckSettings> = Object.freeze({
  walkwayMin: 450, // EN 1646-1 walkway/escape width — from memory, clause not checked (SOURCES.walkwayMin)
  bedAllowance: 100, // common practice, no source (SOURCES.bedLength)
  bedWidthPerSleeper: 600, // common practice, no source (SOURCES.bedWidth)
  levelTolerance: 20, // common practice, no source (SOURCES.bedLevel)
  headMargin: 20, // common practice, no source (SOURCES.headroom)
  mattressRegion: 'uk',
  floorAboveRoad: 550, // common practice, no source: a large panel van's load floor, unladen (SOURCES.underFloor)
});

/** Fixed constants of the rules (not per-layout settings). */
export const RULE_CONSTANTS = Object.freeze({
  /** Arm's reach in front of a unit, mm — common practice, no source (SOURCES.armReach). */
  armReach: 700,
  /** A module whose underside is below this (above the finished floor) blocks the floor — common practice (SOURCES.floorBlock). */
  floorBlockBelow: 1000,
  /** Comfortable walkway = walkwayMin + this — common practice 500–600 mm (SOURCES.walkwayComfort). */
  walkwayComfortExtra: 100,
  /** Corridor from a bed to a door, mm — common practice, no source (SOURCES.egress). */
  egressCorridor: 400,
  /** Sleep pieces whose tops step by more than this are separate sleeping places, mm — common practice, no source (SOURCES.placeStep). */
  placeStep: 150,
  /**
   * Sitting height to sit up in bed under, mm: 95th-percentile British man aged 19–65, Pheasant &
   * Haslegrave, Bodyspace, Table 10.1 (from memory; SOURCES.sittingHeight).
   */
  sittingHeight: 965,
  /** A sleeping place whose mattress top is higher than this needs a ladder or step, mm — EN 747-1, from memory (SOURCES.climb). */
  climbFrom: 800,
  /** Ground clearance an under-floor module keeps, mm — common practice, no source (SOURCES.underFloor). */
  groundClearance: 200,
  /** Rear projection beyond which it must be marked, mm — from memory (SOURCES.rearProjection). */
  rearProjectionMax: 1000,
});

function definedOnly(s: LayoutSettings | undefined): Partial<CheckSettings> {
  const out: Partial<CheckSettings> = {};
  if (!s) return out;
  for (const [k, v] of Object.entries(s)) if (v !== undefined) (out as Record<string, unknown>)[k] = v;
  return out;
}

/**
 * The settings a check run uses: built-in defaults, then the studio's defaults, then the
 * layout's own `doc.settings`. Throws a RangeError naming the field when the studio defaults
 * are not valid settings (the layout's own settings are validated by the document schema).
 */
export function resolveSettings(doc: Pick<LayoutDoc, 'settings'>, studioDefaults?: LayoutSettings): CheckSettings {
  let studio: LayoutSettings | undefined;
  if (studioDefaults !== undefined) {
    const parsed = settingsSchema.safeParse(studioDefaults);
    if (!parsed.success) {
      const what = parsed.error.issues.map((i) => `${i.path.join('.') || 'settings'}: ${i.message}`).join('; ');
      throw new RangeError(`Studio check defaults are not valid: ${what}`);
    }
    studio = parsed.data;
  }
  const layout = doc.settings !== undefined ? settingsSchema.safeParse(doc.settings) : undefined;
  if (layout && !layout.success) {
    const what = layout.error.issues.map((i) => `settings.${i.path.join('.')}: ${i.message}`).join('; ');
    throw new RangeError(`Layout settings are not valid: ${what}`);
  }
  return { ...DEFAULT_SETTINGS, ...definedOnly(studio), ...definedOnly(layout?.data) };
}
