// Settings: the built-in defaults (each with its source), layered studio defaults under
// doc.settings, and clear errors for bad studio defaults.
import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS, resolveSettings, runChecks, SOURCES } from '@/lib/checks';
import { checkLayoutInput } from '@/lib/checks';
import { l2h2Doc } from './helpers';

describe('check settings', () => {
  it('defaults: 450 mm walkway (EN 1646-1 for motor caravans, from memory), 100 mm bed allowance, 600 mm per sleeper, 20 mm level and head margins, UK mattresses', () => {
    expect(DEFAULT_SETTINGS).toEqual({ walkwayMin: 450, bedAllowance: 100, bedWidthPerSleeper: 600, levelTolerance: 20, headMargin: 20, mattressRegion: 'uk', floorAboveRoad: 550 }); // floor above the road: common practice, no source
    expect(SOURCES.walkwayMin.cite).toMatch(/^EN 1646-1 .*from memory/);
    expect(SOURCES.bedWidth.cite).toMatch(/common practice/i);
  });
  it('layers built-in < studio < layout', () => {
    const doc = l2h2Doc({ settings: { walkwayMin: 500 } });
    expect(resolveSettings(doc)).toMatchObject({ walkwayMin: 500, bedAllowance: 100 });
    expect(resolveSettings(doc, { walkwayMin: 600, bedAllowance: 150, mattressRegion: 'eu' })).toMatchObject({ walkwayMin: 500, bedAllowance: 150, mattressRegion: 'eu' });
    expect(resolveSettings(l2h2Doc(), { headMargin: 50 })).toMatchObject({ headMargin: 50, walkwayMin: 450 });
  });
  it('a studio default changes the outcome of a run', () => {
    // Clear height 2000 − 24 − 26 = 1950 mm: 1920 + 20 mm margin = 1940 passes, 1920 + 40 = 1960 does not.
    const doc = l2h2Doc({ occupants: { standingHeight: 1920 } });
    expect(runChecks(doc).findings.find((f) => f.id === 'headroom.standing')!.status).toBe('pass');
    expect(runChecks(doc, { studioDefaults: { headMargin: 40 } }).findings.find((f) => f.id === 'headroom.standing')!.status).toBe('warn');
  });
  it('bad studio defaults give a clear error naming the field', () => {
    expect(() => resolveSettings(l2h2Doc(), { walkwayMin: -5 } as never)).toThrow(/Studio check defaults are not valid: walkwayMin/);
    expect(() => resolveSettings(l2h2Doc(), { colour: 'red' } as never)).toThrow(RangeError);
    const viaInput = checkLayoutInput(l2h2Doc(), { studioDefaults: { mattressRegion: 'mars' } as never });
    expect(viaInput.ok).toBe(false);
  });
});
