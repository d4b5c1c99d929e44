// Cautions live in one module and always defer to local codes and qualified, licensed people;
// every kind whose fitting can hurt someone has one, and every finding family about gas, 230 V,
// heating, belted seats or weight maps to its topic. (Standards named in the texts: from memory.)
import { describe, expect, it } from 'vitest';
import { findingTopic, kindCaution, ONE_LINE_CAUTION, QUOTE_CAUTION, SIGN_OFF_CAUTION, TOPIC_CAUTION, BUILD_PLAN_CAUTION } from '@/lib/layout/cautions';
import { KINDS } from '@/lib/layout/kinds';

const DEFERS = /qualified|licensed|competent|weighbridge|local (codes|rules)|vehicle rules/i;

describe('cautions', () => {
  it('covers hob, gas locker, heater, electrics bay and the travel seat, and nothing harmless', () => {
    expect(kindCaution('hob')?.topic).toBe('gas');
    expect(kindCaution('gas-locker')?.topic).toBe('gas');
    expect(kindCaution('heater')?.topic).toBe('heating');
    expect(kindCaution('electrics-bay')?.topic).toBe('power');
    expect(kindCaution('seat')?.topic).toBe('seats');
    expect(KINDS.seat.props?.belted).toBe(true); // the travel seat is the belted seat
    for (const k of ['wardrobe', 'drawer-unit', 'table', 'bed-platform'] as const) expect(kindCaution(k)).toBeNull();
  });

  it('defers to local codes or qualified people in every text', () => {
    for (const t of Object.values(TOPIC_CAUTION)) {
      expect(t.text).toMatch(DEFERS);
      expect(t.brief.length).toBeLessThan(t.text.length);
    }
    for (const t of [ONE_LINE_CAUTION, QUOTE_CAUTION, SIGN_OFF_CAUTION, BUILD_PLAN_CAUTION]) expect(t).toMatch(DEFERS);
    expect(BUILD_PLAN_CAUTION).toMatch(/seats/);
    expect(BUILD_PLAN_CAUTION).toMatch(/anchorages/);
  });

  it('maps finding ids to their hazard, and comfort or fit findings to none', () => {
    expect(findingTopic('gas.locker-vent')).toBe('gas');
    expect(findingTopic('power.cable')).toBe('power');
    expect(findingTopic('heat.heater-size')).toBe('heating');
    expect(findingTopic('mass.rear-axle')).toBe('weight');
    expect(findingTopic('travel.seats')).toBe('seats');
    expect(findingTopic('heat.u-value')).toBeNull();
    expect(findingTopic('walkway.width')).toBeNull();
    expect(findingTopic('sleep.length')).toBeNull();
  });
});
