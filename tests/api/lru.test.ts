// The bounded cache behind the session-claims and document caches.
import { describe, expect, it } from 'vitest';
import { Lru } from '@/lib/cache/lru';

describe('Lru', () => {
  it('drops the least recently used entry once over its budget', () => {
    const cache = new Lru<string, number>(2);
    cache.set('a', 1);
    cache.set('b', 2);
    expect(cache.get('a')).toBe(1); // a is now the most recent
    cache.set('c', 3);
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBe(1);
    expect(cache.get('c')).toBe(3);
    expect(cache.size).toBe(2);
  });

  it('weighs entries, and never holds one heavier than the whole budget', () => {
    const cache = new Lru<string, string>(10, (s) => s.length);
    cache.set('x', 'aaaa');
    cache.set('y', 'bbbb');
    expect(cache.weight).toBe(8);
    cache.set('z', 'cccc'); // 12 > 10: x goes
    expect(cache.get('x')).toBeUndefined();
    expect(cache.weight).toBe(8);
    cache.set('huge', 'd'.repeat(11));
    expect(cache.get('huge')).toBeUndefined();
    expect(cache.weight).toBe(8);
  });

  it('replaces an entry under the same key without counting it twice', () => {
    const cache = new Lru<string, string>(10, (s) => s.length);
    cache.set('k', 'aaaa');
    cache.set('k', 'bbbbbb');
    expect(cache.weight).toBe(6);
    expect(cache.get('k')).toBe('bbbbbb');
    cache.delete('k');
    expect(cache.size).toBe(0);
    expect(cache.weight).toBe(0);
  });
});
