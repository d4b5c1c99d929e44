/**
 * Build planning: pure computations on a LayoutDoc for the Weight, Power, Water, Gas and Heat
 * panels, the plan sheet, the parts list and the cut list. Data in, data out: must never import
 * React, Konva, zustand, Next or the database.
 */
export * from './lever';
export * from './payload';
export * from './module-facts';
export * from './axle-loads';
export * from './solar-yield';
export * from './solar-array';
export * from './battery-sizing';
export * from './load-presets';
export * from './power-budget';
export * from './conductors';
export * from './cable-size';
export * from './water-plan';
export * from './gas-ventilation';
export * from './conductivity';
export * from './heat-loss';
export * from './sheet-nesting';
export * from './cut-list';
export * from './parts-list';
export * from './parts-csv';
export * from './inputs';
export * from './mass-balance';
export * from './lining-panels';
