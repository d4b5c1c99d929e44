/**
 * Common build-up layers a designer starts from. Thicknesses are typical retail sizes
 * (common practice, no source); edit per van.
 */
import type { Layer } from '@/lib/layout';

export const LAYER_PRESETS: { group: 'floor' | 'roof' | 'walls' | 'any'; layer: Layer }[] = [
  { group: 'floor', layer: { material: 'XPS foam board', thickness: 20 } },
  { group: 'floor', layer: { material: 'Plywood', thickness: 12 } },
  { group: 'floor', layer: { material: 'Plywood', thickness: 18 } },
  { group: 'floor', layer: { material: 'Vinyl flooring', thickness: 2 } },
  { group: 'floor', layer: { material: 'Timber battens', thickness: 25 } },
  { group: 'walls', layer: { material: 'Closed-cell foam', thickness: 24 } },
  { group: 'walls', layer: { material: 'Sheep wool insulation', thickness: 50 } },
  { group: 'walls', layer: { material: 'Plywood lining', thickness: 6 } },
  { group: 'walls', layer: { material: 'Plywood lining', thickness: 12 } },
  { group: 'walls', layer: { material: 'Carpet lining', thickness: 3 } },
  { group: 'roof', layer: { material: 'Closed-cell foam', thickness: 20 } },
  { group: 'roof', layer: { material: 'Polyiso board', thickness: 25 } },
  { group: 'roof', layer: { material: 'Tongue-and-groove cladding', thickness: 10 } },
  { group: 'any', layer: { material: 'Vapour barrier', thickness: 1 } },
];
