// egress.sleep: every bed has a way out — a door borders it, or a corridor at least 400 mm wide
// (common practice, no source) leads from its edge to a door. Hand-worked in a plain box.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { boxDoc, findings, l2h2Doc, mod, only } from './helpers';

const bedPlatform = (y1: number) => mod({ id: 'bed', kind: 'bed-platform', x: 0, y: 0, length: 2000, width: y1, elevation: 600, height: 200, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front' });
const screen = (y1: number) => mod({ id: 'screen', kind: 'wardrobe', x: 2000, y: 0, length: 1000, width: y1, height: 1750, facing: 'right', arrangements: ['sleep'] });
const sideDoorOnly = { doors: [{ id: 'side', wall: 'right' as const, offset: 2200, width: 600 }] };

describe('egress.sleep', () => {
  it('passes through a corridor exactly 400 mm wide beside the bed to the side door', () => {
    const f = only(boxDoc({ modules: [bedPlatform(1400), screen(1400)], bay: sideDoorOnly }), 'egress.sleep', 'sleep');
    expect(f).toMatchObject({ status: 'pass', measured: 1, required: 1, unit: 'doors', moduleIds: ['bed'] });
    expect(f.message).toMatch(/corridor at least 400 mm wide leads to the right-hand door \(600 mm wide, 2200 mm from the front\)/);
  });
  it('fails when that corridor is 399 mm', () => {
    const f = only(boxDoc({ modules: [bedPlatform(1401), screen(1401)], bay: sideDoorOnly }), 'egress.sleep', 'sleep');
    expect(f).toMatchObject({ status: 'fail', measured: 0 });
    expect(f.message).toMatch(/no way out/);
  });
  it('passes when a door opening borders the bed, however narrow the floor', () => {
    // Bed against the right wall under the side door: 1 mm of overlap with the door span is enough.
    const bed = mod({ id: 'bed', kind: 'bed-platform', x: 1201, y: 400, length: 1000, width: 1400, elevation: 600, height: 200, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front' });
    const f = only(boxDoc({ modules: [bed, mod({ id: 'wall', kind: 'wardrobe', x: 0, y: 0, length: 3000, width: 400, height: 1750 })], bay: { doors: [{ id: 'side', wall: 'right', offset: 0, width: 1202 }] } }), 'egress.sleep', 'sleep');
    expect(f.status).toBe('pass');
    expect(f.message).toMatch(/borders it/);
    const touchingOnly = boxDoc({ modules: [{ ...bed, x: 1202 }, mod({ id: 'wall', kind: 'wardrobe', x: 0, y: 0, length: 3000, width: 400, height: 1750 })], bay: { doors: [{ id: 'side', wall: 'right', offset: 0, width: 1202 }] } });
    expect(only(touchingOnly, 'egress.sleep', 'sleep').message).not.toMatch(/borders it/);
  });
  it('the rear door borders a rear bed in our L2H2 bay', () => {
    const bed = mod({ id: 'bed', kind: 'bed-platform', x: 1600, y: 36, length: 1500, width: 1698, elevation: 900, height: 100, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front' });
    const f = only(l2h2Doc({ modules: [bed], bay: { doors: [{ id: 'rear', wall: 'rear', offset: 150, width: 1500 }] } }), 'egress.sleep', 'sleep');
    expect(f.message).toMatch(/rear door \(1500 mm wide\) borders it/);
  });
  it('one finding per bed; no doors gives a clear warning', () => {
    const two = boxDoc({ modules: [mod({ id: 'a', kind: 'bed-platform', x: 0, y: 0, length: 1900, width: 700, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front', elevation: 600, height: 200 }), mod({ id: 'b', kind: 'bed-platform', x: 0, y: 1100, length: 1900, width: 700, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front', elevation: 600, height: 200 })] });
    expect(findings(runChecks(two), 'egress.sleep')).toHaveLength(2);
    const f = only(boxDoc({ modules: [bedPlatform(1400)], bay: { doors: [] } }), 'egress.sleep', 'sleep');
    expect(f).toMatchObject({ status: 'warn', measured: 0 });
    expect(f.message).toMatch(/No door/);
  });
  it('no beds, no egress finding (the sleep rules warn instead)', () => {
    expect(findings(runChecks(boxDoc()), 'egress.sleep')).toHaveLength(0);
  });
});
