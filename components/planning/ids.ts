/** Ids for rows a designer adds (payload items, loads, circuits, windows): `prefix-xxxxxx`, matching the schema's id rule. */
export function newRowId(prefix: string): string {
  const random = typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID().slice(0, 8) : Math.random().toString(36).slice(2, 10);
  return `${prefix}-${random}`;
}
