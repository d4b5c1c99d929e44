/**
 * Tables for build planning: price lists, quotes and deposits.
 * Re-exported by db/schema.ts so one drizzle schema covers them.
 */
export {};
