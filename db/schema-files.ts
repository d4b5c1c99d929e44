/**
 * Tables for reference uploads attached to layouts.
 * Re-exported by db/schema.ts so one drizzle schema covers them.
 */
export {};
