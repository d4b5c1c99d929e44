import { describe, expect, it } from 'vitest';
import { matchKinds } from '@/components/editor/panels/partsSearch';
import { formValuesOf, moduleFormSchema, patchFrom, readModuleForm } from '@/components/editor/panels/moduleForm';
import { countByStatus, failingModuleIds, groupFindings } from '@/components/editor/panels/findingGroups';
import { KIND_LIST } from '@/lib/layout';
import type { Finding } from '@/lib/checks/types';
import { mod } from './harness';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { ChecksReportView } from '@/components/editor/panels/ChecksReportView';

describe('Parts shelf', () => {
  it('offers at least the 18 kinds the brief lists, each with a size and mass', () => {
    const needed = ['bed-platform', 'bench-seat', 'bed-infill', 'table', 'kitchen-counter', 'sink-unit', 'hob', 'fridge', 'wardrobe', 'drawer-unit', 'overhead-locker', 'fresh-water-tank', 'grey-water-tank', 'gas-locker', 'electrics-bay', 'heater', 'toilet-cabinet', 'shower-tray', 'step'];
    const kinds = KIND_LIST.map((k) => k.kind);
    for (const k of needed) expect(kinds).toContain(k);
    for (const k of KIND_LIST) expect(k.length > 0 && k.width > 0 && k.massKg > 0).toBe(true);
  });

  it('searches titles and trade words; every word must match', () => {
    expect(matchKinds('tank').map((k) => k.kind).sort()).toEqual(['fresh-water-tank', 'grey-water-tank']);
    expect(matchKinds('grey tank').map((k) => k.kind)).toEqual(['grey-water-tank']);
    expect(matchKinds('cylinder').map((k) => k.kind)).toEqual(['gas-locker']);
    expect(matchKinds('  ').length).toBe(KIND_LIST.length);
    expect(matchKinds('spaceship')).toEqual([]);
  });
});

describe('Details form model', () => {
  const m = mod('a', { x: 1000, y: 36, length: 1100, width: 550, massKg: 22 });

  it('shows lengths in the person’s units and reads any unit back as whole mm', () => {
    const v = formValuesOf(m, 'cm');
    expect(v.x).toBe('100');
    const parsed = moduleFormSchema('cm').safeParse({ ...v, x: '1205 mm', length: '43.3 in', width: '55' });
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    // 43.3 in is 1099.8 mm -> 1100 (unchanged); 55 cm is 550 mm (unchanged): only x moves.
    expect(patchFrom(m, parsed.data)).toEqual({ x: 1205 });
  });

  it('only changed fields go into the patch', () => {
    const v = formValuesOf(m, 'mm');
    const parsed = moduleFormSchema('mm').parse({ ...v, x: '1010', label: 'Lounge bench' });
    expect(patchFrom(m, parsed)).toEqual({ x: 1010, label: 'Lounge bench' });
  });

  it('refuses text that is not a length, a zero height, no arrangement, a silly mass', () => {
    const v = formValuesOf(m, 'mm');
    const bad = moduleFormSchema('mm').safeParse({ ...v, x: 'twelve', height: '0', arrangements: [], massKg: '-3' });
    expect(bad.success).toBe(false);
    if (bad.success) return;
    const paths = bad.error.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['x', 'height', 'arrangements', 'massKg']));
  });

  it('numeric props stay numbers, text props text, an emptied mass clears it', () => {
    const fridge = mod('f', { kind: 'fridge', props: { litres: 49, watts: 45, dutyCycle: 0.33 }, massKg: 18 });
    const v = formValuesOf(fridge, 'mm');
    const out = moduleFormSchema('mm').parse({ ...v, props: { ...v.props, litres: '40' }, massKg: '' });
    expect(patchFrom(fridge, out)).toEqual({ props: { litres: 40, watts: 45, dutyCycle: 0.33 }, massKg: undefined });
  });
});

describe('Details form read as a field is left', () => {
  const m = mod('a', { x: 1000, y: 36, length: 1100, width: 550, massKg: 22 });

  it('a length that does not read goes back to the last valid value, says why, and lets the good fields apply', () => {
    const v = formValuesOf(m, 'mm');
    const r = readModuleForm(m, { ...v, length: '11000000', x: '1010' }, 'mm');
    // x 1000 → 1010 applies; the length is past the schema's limit and is put back to 1100.
    expect(r.patch).toEqual({ x: 1010 });
    expect(r.reverted).toHaveLength(1);
    expect(r.reverted[0].field).toBe('length');
    expect(r.reverted[0].restored).toBe('1100');
    expect(r.reverted[0].message).toMatch(/^Length must be between \d+ and \d+ mm$/);
    expect(r.values.length).toBe('1100');
    expect(r.values.x).toBe('1010');
  });

  it('text that is not a length, in cm, is put back in cm', () => {
    const v = formValuesOf(m, 'cm');
    const r = readModuleForm(m, { ...v, width: '55abc' }, 'cm');
    expect(r.patch).toEqual({});
    // 550 mm shown in cm is 55.
    expect(r.reverted).toEqual([{ field: 'width', message: 'Width: type a length, e.g. 1200, 120 cm or 47 in', restored: '55' }]);
  });

  it('several bad fields are each put back; a clean form gives no reverts', () => {
    const v = formValuesOf(m, 'mm');
    const r = readModuleForm(m, { ...v, height: '0', massKg: '-3', arrangements: [] }, 'mm');
    expect(r.reverted.map((f) => f.field).sort()).toEqual(['arrangements', 'height', 'massKg']);
    expect(r.patch).toEqual({});
    expect(readModuleForm(m, v, 'mm')).toEqual({ patch: {}, reverted: [], values: v });
  });
});

describe('Checks grouping', () => {
  const f = (id: string, status: Finding['status'], arrangement?: Finding['arrangement'], moduleIds?: string[]): Finding => ({ id, status, arrangement, moduleIds, message: id });
  const findings = [f('fit.inside', 'fail', undefined, ['a']), f('sleep.length', 'fail', 'sleep', ['bed']), f('walkway.width', 'warn', 'lounge'), f('headroom.standing', 'pass')];

  it('groups by arrangement (whole layout first) then status, fail before warn before pass', () => {
    const g = groupFindings(findings);
    expect(g.map((x) => x.arrangement)).toEqual(['all', 'lounge', 'sleep']);
    expect(g[0].byStatus.map((b) => b.status)).toEqual(['fail', 'pass']);
    expect(countByStatus(findings)).toEqual({ fail: 2, warn: 1, pass: 1 });
  });

  it('outlines only modules failing in the arrangement on show or layout-wide', () => {
    expect(failingModuleIds(findings, 'lounge')).toEqual(['a']);
    expect(failingModuleIds(findings, 'sleep').sort()).toEqual(['a', 'bed']);
  });
});

describe('Checks list', () => {
  const finding = (id: string, status: Finding['status'], arrangement?: Finding['arrangement']): Finding => ({ id, status, arrangement, message: `${id} is ${status}`, source: 'common practice, no source' });

  it('says a group meets everything rather than showing a bare heading when what meets is hidden', () => {
    const report = { ok: true, findings: [finding('layout.payload', 'warn'), finding('travel.seat-belts', 'pass', 'travel'), finding('travel.walkway', 'pass', 'travel'), finding('lounge.headroom', 'pass', 'lounge')] };
    const html = renderToStaticMarkup(createElement(ChecksReportView, { checks: { report, status: 'ready', stale: false }, units: 'mm' }));
    const section = (label: string) => html.match(new RegExp(`<section[^>]*aria-label="${label}"[^>]*>(.*?)</section>`))?.[1] ?? '';
    expect(section('travel arrangement')).toContain('All 2 checks here meet.');
    expect(section('lounge arrangement')).toContain('The one check here meets.');
    expect(section('travel arrangement')).not.toContain('travel.walkway is pass');
    // A group with something to look at lists it, with no "meets" line.
    expect(section('Whole layout')).toContain('layout.payload is warn');
    expect(section('Whole layout')).not.toContain('group-all-meet');
  });
});
