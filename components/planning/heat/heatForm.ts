/**
 * The Heating and insulation panel's form: the heater's fuel and its exhaust/intake placement,
 * the design temperature difference, air changes, declared λ values per material, and windows
 * — read into `systems.heating` and `systems.insulation`. Pure TypeScript; empty stays absent.
 */
import * as z from 'zod/mini';
import type { LayoutDoc, Systems } from '@/lib/layout';
import { compact, field, shown } from '../quantities';

export const heatSchema = z
  .object({
    fuel: z.enum(['', 'diesel', 'petrol', 'gas', 'electric']),
    exhaustClearOfOpenings: z.boolean(),
    intakeClearOfExhaust: z.boolean(),
    deltaK: field.plain(['K', '°C'], 'a temperature difference, e.g. 20 K', { min: 1, max: 80 })(false),
    airChangesPerHour: field.plain(['/h', 'ach'], 'air changes an hour, e.g. 1', { min: 0, max: 30 })(false),
    conductivities: z.array(z.object({
      material: z.string().check(z.trim(), z.minLength(1, 'name the material as in the build-up'), z.maxLength(80)),
      lambda: field.plain(['W/mK', 'W/m·K'], 'a conductivity, e.g. 0.035', { min: 0.005, max: 500 })(true),
    })).check(z.maxLength(40)),
    windows: z.array(z.object({
      id: z.string(),
      face: z.enum(['walls', 'roof']),
      areaM2: field.plain(['m²', 'm2'], 'an area, e.g. 0.4 m²', { min: 0.01, max: 10 })(true),
      uValue: field.plain(['W/m²K'], 'a U-value, e.g. 3.0', { min: 0.1, max: 10 })(true),
    })).check(z.maxLength(20)),
  })
  .check(z.superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.conductivities.forEach((c, i) => {
      const key = c.material.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['conductivities', i, 'material'], message: 'already listed' });
      seen.add(key);
    });
  }));
export type HeatInput = z.input<typeof heatSchema>;

export function heatDefaults(doc: LayoutDoc): HeatInput {
  const h = doc.systems?.heating ?? {};
  const ins = doc.systems?.insulation ?? {};
  return {
    fuel: h.fuel ?? '',
    exhaustClearOfOpenings: h.exhaustClearOfOpenings ?? false,
    intakeClearOfExhaust: h.intakeClearOfExhaust ?? false,
    deltaK: shown(ins.deltaK),
    airChangesPerHour: shown(ins.airChangesPerHour),
    conductivities: Object.entries(ins.conductivities ?? {}).map(([material, lambda]) => ({ material, lambda: shown(lambda) })),
    windows: (ins.windows ?? []).map((w) => ({ id: w.id, face: w.face, areaM2: shown(w.areaM2), uValue: shown(w.uValue) })),
  };
}

export function heatSystems(v: z.output<typeof heatSchema>): Pick<Systems, 'heating' | 'insulation'> {
  return {
    heating: compact({
      fuel: v.fuel === '' ? undefined : v.fuel,
      exhaustClearOfOpenings: v.exhaustClearOfOpenings || undefined,
      intakeClearOfExhaust: v.intakeClearOfExhaust || undefined,
    }),
    insulation: compact({
      deltaK: v.deltaK,
      airChangesPerHour: v.airChangesPerHour,
      conductivities: v.conductivities.length ? Object.fromEntries(v.conductivities.map((c) => [c.material, c.lambda!])) : undefined,
      windows: v.windows.length ? v.windows.map((w) => ({ id: w.id, face: w.face, areaM2: w.areaM2!, uValue: w.uValue! })) : undefined,
    }),
  };
}
