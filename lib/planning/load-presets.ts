/**
 * Preset 12 V loads for the loads table: typical draws and hours of use, common practice, no
 * source (measure or read the maker's plate for the real figure). The designer picks one and edits it.
 *
 * Plain data. Must never import UI, framework or database code.
 */
import type { PowerLoad } from '../layout';

export interface LoadPreset {
  id: string;
  label: string;
  load: Omit<PowerLoad, 'id'>;
  note: string;
}

export const LOAD_PRESETS: LoadPreset[] = [
  { id: 'compressor-fridge', label: '40–50 L compressor fridge', load: { label: 'Compressor fridge', watts: 45, dutyCycle: 0.33, supply: 'dc' }, note: 'runs about a third of the time in warm weather (common practice, no source)' },
  { id: 'led-lights', label: 'LED lights', load: { label: 'LED lights', watts: 12, hoursPerDay: 4, supply: 'dc' }, note: 'four to six spots in the evening (common practice, no source)' },
  { id: 'water-pump', label: 'Water pump', load: { label: 'Water pump', watts: 60, hoursPerDay: 0.25, supply: 'dc' }, note: 'a 5 A diaphragm pump, a quarter hour a day (common practice, no source)' },
  { id: 'device-charging', label: 'Phones and laptop', load: { label: 'Device charging', watts: 30, hoursPerDay: 3, supply: 'dc' }, note: 'USB-C laptop and two phones (common practice, no source)' },
  { id: 'heater-fan', label: 'Diesel heater (fan and pump)', load: { label: 'Heater fan and fuel pump', watts: 25, hoursPerDay: 8, supply: 'dc' }, note: 'average running draw after the glow-plug start (common practice, no source)' },
  { id: 'roof-fan', label: 'Roof fan', load: { label: 'Roof fan', watts: 20, hoursPerDay: 4, supply: 'dc' }, note: 'mid speed (common practice, no source)' },
];

export function loadPreset(id: string): LoadPreset | undefined {
  return LOAD_PRESETS.find((p) => p.id === id);
}
