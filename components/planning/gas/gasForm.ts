/**
 * The Gas and ventilation panel's form: the gas locker's sealing, drop-out vent and cylinder
 * restraint, the fixed ventilation of the living space, the installer's certificate, the
 * cylinder tare and the alarms — read into `systems.gas` and `systems.alarms`. Pure TypeScript.
 * A yes/no left unanswered stays absent (the checks ask for it), never "no".
 */
import * as z from 'zod/mini';
import type { LayoutDoc, Systems } from '@/lib/layout';
import { compact, field, shown, triState, triStateOf } from '../quantities';

const cm2 = field.plain(['cm²', 'cm2'], 'a free area, e.g. 100 cm²', { min: 0, max: 5000 });

export const gasSchema = z.object({
  sealed: triState,
  ventAreaCm2: cm2(false),
  ventAtFloor: triState,
  cylindersSecured: triState,
  highVentCm2: cm2(false),
  highVentInRoof: z.boolean(),
  lowVentCm2: cm2(false),
  floorAreaM2: field.plain(['m²', 'm2'], 'an area, e.g. 6.5 m²', { min: 0.5, max: 40 })(false),
  installerCertified: z.boolean(),
  cylinderTareKg: field.mass({ max: 100 })(false),
  alarmCo: z.boolean(),
  alarmLpg: z.boolean(),
});
export type GasInput = z.input<typeof gasSchema>;

export function gasDefaults(doc: LayoutDoc): GasInput {
  const g = doc.systems?.gas ?? {};
  return {
    sealed: triStateOf(g.locker?.sealed),
    ventAreaCm2: shown(g.locker?.ventAreaCm2),
    ventAtFloor: triStateOf(g.locker?.ventAtFloor),
    cylindersSecured: triStateOf(g.locker?.cylindersSecured),
    highVentCm2: shown(g.ventilation?.highVentCm2),
    highVentInRoof: g.ventilation?.highVentInRoof ?? false,
    lowVentCm2: shown(g.ventilation?.lowVentCm2),
    floorAreaM2: shown(g.ventilation?.floorAreaM2),
    installerCertified: g.installerCertified ?? false,
    cylinderTareKg: shown(g.cylinderTareKg),
    alarmCo: doc.systems?.alarms?.co ?? false,
    alarmLpg: doc.systems?.alarms?.lpg ?? false,
  };
}

export function gasSystems(v: z.output<typeof gasSchema>): Pick<Systems, 'gas' | 'alarms'> {
  return {
    gas: compact({
      locker: compact({ sealed: v.sealed, ventAreaCm2: v.ventAreaCm2, ventAtFloor: v.ventAtFloor, cylindersSecured: v.cylindersSecured }),
      ventilation: compact({ highVentCm2: v.highVentCm2, highVentInRoof: v.highVentInRoof || undefined, lowVentCm2: v.lowVentCm2, floorAreaM2: v.floorAreaM2 }),
      installerCertified: v.installerCertified || undefined,
      cylinderTareKg: v.cylinderTareKg,
    }),
    alarms: compact({ co: v.alarmCo || undefined, lpg: v.alarmLpg || undefined }),
  };
}
