/**
 * The layout document's fixed word lists (arrangements, facings, surfaces, module kinds, mattress
 * regions, battery chemistries), apart from the zod schema that uses them, so client code can
 * import a list without pulling the schema library into the browser. `schema.ts` and
 * `systems.ts` re-export them; this file must never import anything.
 */

export const ARRANGEMENTS = ['travel', 'lounge', 'sleep'] as const;

export const FACINGS = ['front', 'rear', 'left', 'right'] as const;

export const SURFACES = ['sleep', 'seat', 'counter'] as const;

export const MODULE_KINDS = [
  'bed-platform',
  'bed-infill',
  'bench-seat',
  'seat',
  'table',
  'kitchen-counter',
  'sink-unit',
  'hob',
  'fridge',
  'wardrobe',
  'drawer-unit',
  'overhead-locker',
  'fresh-water-tank',
  'grey-water-tank',
  'gas-locker',
  'electrics-bay',
  'heater',
  'toilet-cabinet',
  'shower-tray',
  'step',
] as const;

export const MATTRESS_REGIONS = ['uk', 'eu', 'us'] as const;

export const BATTERY_CHEMISTRIES = ['lead-acid', 'agm', 'lifepo4'] as const;
