/**
 * The layout document's fixed word lists (arrangements, facings, surfaces, mattress regions,
 * battery chemistries) and size limits, apart from the schema that uses them. The module kinds
 * and their ids live with each kind in `kinds.ts`. `schema.ts` and `systems.ts` re-export them;
 * this file must never import anything.
 */

export const ARRANGEMENTS = ['travel', 'lounge', 'sleep'] as const;

export const FACINGS = ['front', 'rear', 'left', 'right'] as const;

/** What a module's top is used as in one arrangement. */
export const SURFACES = ['sleep', 'seat', 'counter'] as const;

/** A per-arrangement surface as the document writes it: one of SURFACES, or 'none' (nothing to use). */
export const SURFACE_CHOICES = ['sleep', 'seat', 'counter', 'none'] as const;

/**
 * Where a module is mounted: inside the body (the default), hanging under the floor, on the roof,
 * or behind the rear doors. Outside mounts keep their place in bay coordinates.
 */
export const MOUNTS = ['inside', 'under-floor', 'roof', 'rear'] as const;

export const MATTRESS_REGIONS = ['uk', 'eu', 'us'] as const;

/**
 * Openings in the bay's walls and roof (schema version 4). `type` says where it is: a window in a
 * wall or a door, a roof opening, or a point on the body (an outlet or filler on the outside).
 */
export const OPENING_TYPES = ['window', 'roof-opening', 'body-point'] as const;
/** Where a window sits: a wall of the bay, or a door (then `door` names it). */
export const WINDOW_WALLS = ['left', 'right', 'rear', 'door'] as const;
export const ROOF_OPENING_KINDS = ['vent', 'fan', 'skylight'] as const;
export const BODY_POINT_KINDS = ['fuel-filler', 'heater-exhaust', 'heater-intake', 'gas-drop-vent'] as const;
/** Where a body point sits: a wall of the bay (outside face), or the underside of the floor. */
export const BODY_POINT_WALLS = ['left', 'right', 'rear', 'underside'] as const;

/** The one set of limits for openings, used by the schema and (later) the Details panel. */
export const OPENING_LIMITS = {
  /** At most this many openings per bay, so every rule over openings stays bounded (common practice, no source). */
  count: 64,
  /** A body point may sit this far below the load floor (on a sill, under the floor). */
  belowFloor: 2000,
  /** Deepest inside frame of a window (blind, fly screen) or roof opening. */
  frame: 500,
} as const;

export const BATTERY_CHEMISTRIES = ['lead-acid', 'agm', 'lifepo4'] as const;

/**
 * The one set of limits for the bay's size, used by the schema (so the API), the new-layout form
 * and the editor's Bay panel alike. The upper bound keeps arithmetic sane and leaves room for the
 * synthetic stress layouts of the benchmark; a bay longer than the vehicle's overall length is
 * reported as out of range by the weight check.
 */
export const BAY_LIMITS = {
  length: { min: 500, max: 100_000 },
  width: { min: 500, max: 100_000 },
  height: { min: 500, max: 100_000 },
} as const;

/** The one set of limits for a module's place and size, used by the schema and the Details panel. */
export const MODULE_LIMITS = {
  position: { min: -100_000, max: 100_000 },
  length: { min: 1, max: 100_000 },
  width: { min: 1, max: 100_000 },
  elevation: { min: 0, max: 5000 },
  height: { min: 1, max: 5000 },
  massKg: { min: 0, max: 5000 },
} as const;
