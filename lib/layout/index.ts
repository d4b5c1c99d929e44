export * from './schema';
export * from './parse';
export * from './kinds';
export * from './units';
export * from './templates';
export * from './systems';
export * from './drawing-issue';
export * from './cautions';
