/**
 * What an id looks like: the one place. Every id a caller sends (layout, revision, mark-up, file,
 * link, invitation, member, message) is a UUID the database made; anything else names nothing,
 * so it is refused before a query is built. Pure; must never touch the database.
 */
import { z } from 'zod';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether `value` is shaped like an id this database could have made. */
export function isId(value: string): boolean {
  return UUID.test(value);
}

/** A request-body field that holds an id: the same test, as a zod field with the caller's message. */
export function idField(message: string) {
  return z.string(message).refine(isId, message);
}
