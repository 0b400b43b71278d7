import { MediaFileCache } from './media-file-cache';

const bytes = (n: number, fill: number) => Buffer.alloc(n, fill);

describe('MediaFileCache', () => {
  it('reads a file once and answers later requests from memory', async () => {
    const cache = new MediaFileCache(100, 50);
    const read = vi.fn(() => Promise.resolve(bytes(10, 1)));
    await cache.get('k', 'h1', 10, read);
    const again = await cache.get('k', 'h1', 10, read);
    expect(read).toHaveBeenCalledTimes(1);
    expect(again.equals(bytes(10, 1))).toBe(true);
  });

  it('reads again when the row names a new SHA-256 for the same key (a re-made derivative)', async () => {
    const cache = new MediaFileCache(100, 50);
    await cache.get('k', 'old', 10, () => Promise.resolve(bytes(10, 1)));
    const fresh = await cache.get('k', 'new', 10, () => Promise.resolve(bytes(10, 2)));
    expect(fresh[0]).toBe(2);
  });

  it('keeps no more than its byte budget, dropping the least recently used file first', async () => {
    const cache = new MediaFileCache(25, 50);
    const reads: string[] = [];
    const get = (key: string) =>
      cache.get(key, 'h', 10, () => {
        reads.push(key);
        return Promise.resolve(bytes(10, 0));
      });
    await get('a');
    await get('b');
    await get('a'); // a is now the most recently used
    await get('c'); // 30 bytes > 25: b goes
    await get('a');
    await get('b');
    expect(reads).toEqual(['a', 'b', 'c', 'b']);
  });

  it('weighs entries by their bytes, not their number: one large file pushes out as many small ones as it needs', async () => {
    const cache = new MediaFileCache(100, 80);
    const reads: string[] = [];
    const get = (key: string, size: number) =>
      cache.get(key, 'h', size, () => {
        reads.push(key);
        return Promise.resolve(bytes(size, 0));
      });
    for (let i = 0; i < 20; i++) await get(`small${i}`, 5); // 20 × 5 = 100 bytes: all kept
    expect(cache.heldBytes).toBe(100);
    await get('large', 60); // needs 60 bytes: the 12 least recently used small files go, 8 stay
    expect(cache.heldBytes).toBe(100);
    reads.length = 0;
    await get('small12', 5); // the oldest small file still held
    await get('large', 60);
    expect(reads).toEqual([]);
    await get('small11', 5); // the newest of the twelve that went
    expect(reads).toEqual(['small11']);
    expect(cache.heldBytes).toBeLessThanOrEqual(100);
  });

  it('does not keep a read whose size differs from the row (file changed under it), nor a forgotten key', async () => {
    const cache = new MediaFileCache(100, 50);
    const read = vi.fn(() => Promise.resolve(bytes(9, 1)));
    await cache.get('k', 'h', 10, read);
    await cache.get('k', 'h', 10, read);
    expect(read).toHaveBeenCalledTimes(2);
    const ok = vi.fn(() => Promise.resolve(bytes(10, 1)));
    await cache.get('j', 'h', 10, ok);
    cache.forget('j');
    await cache.get('j', 'h', 10, ok);
    expect(ok).toHaveBeenCalledTimes(2);
  });

  it('refuses files over the entry limit and keeps nothing with a budget of 0', () => {
    expect(new MediaFileCache(100, 50).fits(51)).toBe(false);
    expect(new MediaFileCache(0, 50).fits(1)).toBe(false);
  });
});
