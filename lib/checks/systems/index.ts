/**
 * Build-planning rules for the check engine: `systemChecks(doc)` returns the `mass.*`, `power.*`,
 * `water.*`, `gas.*` and `heat.*` findings; `runChecks` in lib/checks appends them to the geometry
 * findings.
 *
 * Conventions (documented for the Checks list):
 * - Every finding carries measured, required (where the rule has a threshold; the U-value and
 *   heat-loss findings report a measurement only), unit, message and source.
 * - Missing data never crashes a rule: it yields a `warn` saying which `systems.…` fields to
 *   enter, measured/required counting the inputs given and needed. Rules that do not apply
 *   (no tanks → no water findings, no gas → no gas caution or locker findings) are skipped.
 * - Safety cautions (gas, 230 V, heater, travel seats, licence) are `warn` until the document
 *   confirms each precaution, then `pass` with the caution text kept; measured/required count the
 *   precautions confirmed and needed. They always defer to local codes and licensed practice.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import type { Finding } from '../types';
import { gasChecks } from './gas';
import { heatChecks } from './heat';
import { massChecks } from './mass';
import { powerChecks } from './power';
import { waterChecks } from './water';

export { gasChecks, heatChecks, massChecks, powerChecks, waterChecks };

export function systemChecks(doc: LayoutDoc): Finding[] {
  const rules: [string, (d: LayoutDoc) => Finding[]][] = [
    ['mass', massChecks],
    ['power', powerChecks],
    ['water', waterChecks],
    ['gas', gasChecks],
    ['heat', heatChecks],
  ];
  const out: Finding[] = [];
  for (const [group, rule] of rules) {
    try {
      out.push(...rule(doc));
    } catch (err) {
      // A rule bug must not take the whole report down; say so as a finding.
      out.push({ id: `${group}.error`, status: 'warn', message: `This group of checks could not run: ${err instanceof Error ? err.message : String(err)}. Please report it.`, source: 'Baywright check engine' });
    }
  }
  return out;
}
