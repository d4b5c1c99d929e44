// travel.seats: belted seats (cab seats + belted travel seats) against the sleepers, always with
// the caution that seats used while driving must be approved and anchored as local rules require.
import { describe, expect, it } from 'vitest';
import { boxDoc, mod, only } from './helpers';

const seat = (id: string, belted: boolean, arrangements: Array<'travel' | 'lounge' | 'sleep'> = ['travel', 'lounge', 'sleep']) =>
  mod({ id, kind: 'seat', x: 1000, y: id === 's2' ? 1200 : 0, length: 600, width: 550, height: 1150, facing: 'front', arrangements, props: { belted } });

describe('travel.seats', () => {
  it('two sleepers in two cab seats: pass, and the caution is always there', () => {
    const f = only(boxDoc({ occupants: { sleepers: [1800, 1650] } }), 'travel.seats', 'travel');
    expect(f).toMatchObject({ status: 'pass', measured: 2, required: 2, unit: 'seats' });
    expect(f.message).toMatch(/must be approved and anchored as local vehicle rules require/);
    expect(f.source).toMatch(/UN ECE Regulations 14/);
  });
  it('three sleepers: warn; a belted travel seat makes it a pass', () => {
    expect(only(boxDoc({ occupants: { sleepers: [1800, 1650, 1200] } }), 'travel.seats', 'travel')).toMatchObject({ status: 'warn', measured: 2, required: 3 });
    const f = only(boxDoc({ occupants: { sleepers: [1800, 1650, 1200] }, modules: [seat('s1', true)] }), 'travel.seats', 'travel');
    expect(f).toMatchObject({ status: 'pass', measured: 3, required: 3, moduleIds: ['s1'] });
  });
  it('an unbelted seat, or one not there in travel, does not count', () => {
    const f = only(boxDoc({ occupants: { sleepers: [1800, 1650, 1200] }, modules: [seat('s1', false), seat('s2', true, ['lounge'])] }), 'travel.seats', 'travel');
    expect(f).toMatchObject({ status: 'warn', measured: 2 });
    expect(f.message).toMatch(/not marked belted and not counted/);
  });
  it('a travel seat that does not say otherwise is belted, as its kind is (the same reading as the weight plan)', () => {
    const plain = mod({ id: 's1', kind: 'seat', x: 1000, y: 0, length: 600, width: 550, height: 1150, facing: 'front' });
    expect(only(boxDoc({ occupants: { sleepers: [1800, 1650, 1200] }, modules: [plain] }), 'travel.seats', 'travel')).toMatchObject({ status: 'pass', measured: 3 });
  });
  it('counts the cab seats the bay has, and says when no sleepers are listed', () => {
    expect(only(boxDoc({ bay: { cabSeats: 3 }, occupants: { sleepers: [1, 2, 3].map(() => 1700) } }), 'travel.seats', 'travel').status).toBe('pass');
    expect(only(boxDoc({ bay: { cabSeats: 0 }, occupants: { sleepers: [1700] } }), 'travel.seats', 'travel')).toMatchObject({ status: 'warn', measured: 0, required: 1 });
    expect(only(boxDoc({ occupants: { sleepers: [] } }), 'travel.seats', 'travel').message).toMatch(/No sleepers are listed/);
  });
});
