/**
 * `doc.systems`: what build planning needs beyond the drawing — the base vehicle's masses and
 * axle geometry, the load carried, the 12 V system (battery, loads, solar, charging, circuits),
 * water use, gas and ventilation, heating and the insulation inputs. Every part is optional, so
 * documents written before build planning stay valid; a rule that lacks a value says what to enter.
 *
 * Positions (`…X`) are millimetres in bay coordinates (x rearwards from the front of the load
 * floor): the front axle and the cab seats usually sit ahead of the bay (negative x), a rear rack
 * behind it (x > bay.length). Masses are kg, areas cm² or m² as named, energy Wh.
 *
 * Must never import React, Konva, Next or the database (lint-enforced). Computation lives in
 * `lib/planning`, rules in `lib/checks/systems`; this file only says what the data may be.
 */
import { z } from 'zod';
import { BATTERY_CHEMISTRIES } from './vocabulary';

export { BATTERY_CHEMISTRIES };

const kg = (max: number) => z.number().finite().min(0, 'cannot be negative').max(max, `at most ${max} kg`);
/** A position along x in bay coordinates (mm); may lie ahead of the bay or behind it. */
const xMm = z.number().int('whole millimetres').min(-20_000).max(40_000);
const yMm = z.number().int('whole millimetres').min(-5_000).max(10_000);
const pct = z.number().finite().min(0, 'at least 0 %').max(100, 'at most 100 %');
const id = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, - and _ only');
const text = (max: number) =>
  z.string().max(max).refine((s) => !/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(s), 'control characters are not allowed');

/** The base vehicle as registered (certificate of conformity) or as weighed. */
export const vehicleSchema = z.strictObject({
  /** Mass in running order: includes a 75 kg driver and fuel (Reg. (EU) 1230/2012 Art. 2, as cited, clause not checked). */
  massInRunningOrderKg: kg(10_000).optional(),
  /** The front axle's share of the mass in running order (weighbridge with driver aboard, or the certificate's split). */
  frontAxleRunningOrderKg: kg(10_000).optional(),
  maxAuthorisedMassKg: kg(10_000).optional(),
  maxFrontAxleKg: kg(10_000).optional(),
  maxRearAxleKg: kg(10_000).optional(),
  wheelbaseMm: z.number().int().min(1_000, 'a wheelbase of at least 1000 mm').max(8_000).optional(),
  /** Where the front axle centre lies in bay coordinates (usually negative: ahead of the load floor). */
  frontAxleX: xMm.optional(),
  overallLengthMm: z.number().int().min(2_000).max(15_000).optional(),
  /** Seats for travel, driver included; defaults to the cab seats plus belted travel-seat modules. */
  seats: z.number().int().min(1).max(12).optional(),
  /** Where the cab occupants sit in bay coordinates (hip point, usually negative). */
  cabSeatX: xMm.optional(),
});
export type VehicleData = z.infer<typeof vehicleSchema>;

export const payloadItemSchema = z.strictObject({
  id,
  label: text(80).pipe(z.string().min(1, 'name the item')),
  massKg: kg(2_000),
  x: xMm,
  y: yMm.optional(),
});
export type PayloadItem = z.infer<typeof payloadItemSchema>;

/** What the van carries on the road beyond its fixed modules. */
export const loadSchema = z.strictObject({
  /** People travelling, driver included; defaults to every seat taken. */
  travellers: z.number().int().min(1).max(12).optional(),
  /** Personal effects; defaults to the EN 1646-2 allowance. */
  personalEffectsKg: kg(2_000).optional(),
  /** Where personal effects are stowed; defaults to the middle of the bay. */
  personalEffectsX: xMm.optional(),
  /** Fresh water fill for the weight case (default 100 %); grey (default 0 %). */
  freshFillPct: pct.optional(),
  greyFillPct: pct.optional(),
  /** Free payload: bikes on a rack, a roof box, tools… */
  items: z.array(payloadItemSchema).max(50).optional(),
});
export type LoadData = z.infer<typeof loadSchema>;

export type BatteryChemistry = (typeof BATTERY_CHEMISTRIES)[number];

export const batterySchema = z.strictObject({
  chemistry: z.enum(BATTERY_CHEMISTRIES),
  /** Capacity at the 20-hour rate (C20). */
  capacityAh: z.number().finite().min(1).max(5_000),
  /** Nominal volts: 12 for lead-acid/AGM, 12.8 for a 4-cell LiFePO4 bank, 24/25.6 for doubled banks. */
  volts: z.number().finite().min(6).max(60),
  /** Overrides the chemistry's usable depth of discharge. */
  usableDodPct: z.number().finite().min(5).max(100).optional(),
  /** Overrides the chemistry's charge efficiency. */
  chargeEfficiencyPct: z.number().finite().min(50).max(100).optional(),
});
export type BatteryData = z.infer<typeof batterySchema>;

export const powerLoadSchema = z
  .strictObject({
    id,
    label: text(80).pipe(z.string().min(1, 'name the load')),
    watts: z.number().finite().min(0).max(10_000),
    /** Hours a day at `watts`… */
    hoursPerDay: z.number().finite().min(0).max(24).optional(),
    /** …or the fraction of the day it runs (a compressor fridge cycles). */
    dutyCycle: z.number().finite().min(0).max(1).optional(),
    /** 'ac' loads run through the inverter and cost its losses. */
    supply: z.enum(['dc', 'ac']).optional(),
  })
  .refine((l) => l.hoursPerDay !== undefined || l.dutyCycle !== undefined, { message: 'give hours a day or a duty cycle', path: ['hoursPerDay'] });
export type PowerLoad = z.infer<typeof powerLoadSchema>;

export const solarSchema = z.strictObject({
  /** The array's rated power as typed; panels drawn on the roof replace it (lib/planning/solar-array.ts), so it may be left out. */
  watts: z.number().finite().min(0).max(10_000).optional(),
  /** Peak sun hours (kWh/m²/day on the panel) by season; for your region (e.g. from PVGIS). */
  peakSunHours: z.strictObject({
    summer: z.number().finite().min(0).max(12),
    shoulder: z.number().finite().min(0).max(12),
    winter: z.number().finite().min(0).max(12),
  }),
  /** System losses; default the PVWatts default, 14.08 %. */
  lossesPct: pct.optional(),
});
export type SolarData = z.infer<typeof solarSchema>;

export const circuitSchema = z.strictObject({
  id,
  label: text(80).pipe(z.string().min(1, 'name the circuit')),
  amps: z.number().finite().min(0).max(1_000),
  /** One-way run from the source to the load; the return doubles it. */
  lengthM: z.number().finite().min(0.05).max(100),
  /** Defaults to the battery's nominal volts. */
  volts: z.number().finite().min(6).max(60).optional(),
  /** Critical circuits (electronics, feeders, navigation) keep within 3 %; others 10 % (ABYC E-11). */
  critical: z.boolean(),
  /** Overrides the drop allowance. */
  maxDropPct: z.number().finite().min(0.5).max(20).optional(),
  /** Insulation temperature rating; default 105 °C. */
  insulationC: z.union([z.literal(60), z.literal(75), z.literal(80), z.literal(90), z.literal(105), z.literal(125), z.literal(200)]).optional(),
  /** Conductors bundled together (derating); default 1. */
  bundled: z.number().int().min(1).max(100).optional(),
  engineSpace: z.boolean().optional(),
  /** The cross-section actually fitted, mm², checked as well when given. */
  fittedMm2: z.number().finite().min(0.1).max(500).optional(),
});
export type CircuitData = z.infer<typeof circuitSchema>;

export const powerSchema = z.strictObject({
  battery: batterySchema.optional(),
  loads: z.array(powerLoadSchema).max(60).optional(),
  /** Count fridges (and other modules with `watts`/`dutyCycle`) as loads; default true. */
  includeModuleLoads: z.boolean().optional(),
  solar: solarSchema.optional(),
  alternator: z.strictObject({ amps: z.number().finite().min(0).max(500), drivingHoursPerDay: z.number().finite().min(0).max(24) }).optional(),
  hookup: z.strictObject({ chargerAmps: z.number().finite().min(0).max(200), hoursPerDay: z.number().finite().min(0).max(24) }).optional(),
  /** 230 V: hook-up socket, inverter or mains circuits fitted. */
  mains: z.strictObject({ present: z.boolean(), rcd: z.boolean().optional(), installedByElectrician: z.boolean().optional() }).optional(),
  inverterEfficiencyPct: z.number().finite().min(50).max(100).optional(),
  /** Days the battery should carry the loads without charging; default 2. */
  autonomyDaysTarget: z.number().finite().min(0.5).max(30).optional(),
  circuits: z.array(circuitSchema).max(60).optional(),
});
export type PowerData = z.infer<typeof powerSchema>;

export const waterSchema = z.strictObject({
  /** People using the water; defaults to the sleepers. */
  persons: z.number().int().min(1).max(12).optional(),
  litresPerPersonPerDay: z.number().finite().min(0.5).max(300).optional(),
});
export type WaterData = z.infer<typeof waterSchema>;

export const gasSchema = z.strictObject({
  locker: z
    .strictObject({
      sealed: z.boolean().optional(),
      /** Free area of the low drop-out vent to outside. */
      ventAreaCm2: z.number().finite().min(0).max(5_000).optional(),
      /** The vent sits at the locker floor, so heavier-than-air gas drains out. */
      ventAtFloor: z.boolean().optional(),
      cylindersSecured: z.boolean().optional(),
    })
    .optional(),
  /** Fixed (unclosable) safety ventilation of the living space. */
  ventilation: z
    .strictObject({
      highVentCm2: z.number().finite().min(0).max(5_000).optional(),
      highVentInRoof: z.boolean().optional(),
      lowVentCm2: z.number().finite().min(0).max(5_000).optional(),
      /** Overrides the bay floor area. */
      floorAreaM2: z.number().finite().min(0.5).max(40).optional(),
    })
    .optional(),
  /** Installed and tightness-tested by a qualified gas engineer, with a certificate. */
  installerCertified: z.boolean().optional(),
  /** Stamped tare of one cylinder; default equal to its gas content (rough). */
  cylinderTareKg: kg(100).optional(),
});
export type GasData = z.infer<typeof gasSchema>;

export const heatingSchema = z.strictObject({
  fuel: z.enum(['diesel', 'petrol', 'gas', 'electric']).optional(),
  /** Exhaust and combustion intake placed as the maker says: away from doors, opening windows and the fuel filler. */
  exhaustClearOfOpenings: z.boolean().optional(),
  intakeClearOfExhaust: z.boolean().optional(),
});
export type HeatingData = z.infer<typeof heatingSchema>;

export const windowSchema = z.strictObject({
  id,
  face: z.enum(['walls', 'roof']),
  areaM2: z.number().finite().min(0.01).max(10),
  uValue: z.number().finite().min(0.1).max(10),
});

export const insulationSchema = z.strictObject({
  /** Inside minus outside design temperature, K; default 20 K. */
  deltaK: z.number().finite().min(1).max(80).optional(),
  /** Air changes per hour through vents and leaks; default 1. */
  airChangesPerHour: z.number().finite().min(0).max(30).optional(),
  /** Declared λ by material name (W/m·K), overriding the built-in table. */
  conductivities: z.record(text(80), z.number().finite().min(0.005).max(500)).optional(),
  windows: z.array(windowSchema).max(20).optional(),
});
export type InsulationData = z.infer<typeof insulationSchema>;

export const systemsSchema = z.strictObject({
  /** A free note, e.g. that these are demo values. */
  note: text(400).optional(),
  vehicle: vehicleSchema.optional(),
  load: loadSchema.optional(),
  power: powerSchema.optional(),
  water: waterSchema.optional(),
  gas: gasSchema.optional(),
  heating: heatingSchema.optional(),
  insulation: insulationSchema.optional(),
  /** Alarms fitted in the living space. */
  alarms: z.strictObject({ co: z.boolean().optional(), lpg: z.boolean().optional() }).optional(),
});
export type Systems = z.infer<typeof systemsSchema>;
