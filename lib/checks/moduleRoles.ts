/**
 * What a module is to the check rules beyond its geometry (which lives in lib/layout/bay.ts):
 * whether it blocks the floor a person stands on, whether it is worked from its front, and a
 * door in words. Pure: must never import UI, framework or database code.
 */
import { kindSpec } from '../layout/kinds';
import type { Door, Module } from '../layout/schema';
import { RULE_CONSTANTS } from './settings';

/** Underside below 1000 mm above the finished floor (common practice, RULE_CONSTANTS.floorBlockBelow). */
export function blocksFloor(m: Module): boolean {
  return m.elevation < RULE_CONSTANTS.floorBlockBelow;
}

export function usedFromFront(m: Module): boolean {
  return kindSpec(m.kind)?.usedFromFront ?? false;
}

/** A door in words, by its wall, width and place — never its id. */
export function describeDoor(door: Door): string {
  if (door.wall === 'rear') return `rear door (${door.width} mm wide)`;
  return `${door.wall}-hand door (${door.width} mm wide, ${door.offset} mm from the front)`;
}
