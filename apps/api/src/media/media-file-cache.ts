import { LRUCache } from 'lru-cache';

/**
 * The bytes of recently served small files (thumb and screen derivatives), least recently
 * used first out, bounded in total bytes. An entry is named by storage key and SHA-256, so
 * a re-made derivative (same key, new hash in its row) is never answered from an old entry.
 * It only saves disk work: every request is still authorised against the database first.
 */
export class MediaFileCache {
  /** lru-cache bounded by bytes: each entry weighs its length; null when the budget keeps nothing. */
  private readonly entries: LRUCache<string, Buffer> | null;
  private readonly loading = new Map<string, Promise<Buffer>>();

  constructor(
    private readonly maxBytes: number,
    private readonly maxEntryBytes: number,
  ) {
    this.entries = maxBytes > 0 ? new LRUCache({ maxSize: maxBytes, maxEntrySize: maxEntryBytes, sizeCalculation: (data) => data.length }) : null;
  }

  /** Whether a file of this size is kept at all (a cache of 0 bytes keeps nothing). */
  fits(bytes: number): boolean {
    return bytes <= this.maxEntryBytes && bytes <= this.maxBytes;
  }

  /** The cached bytes, or `read()`'s (kept when they have the expected size); one read per file at a time. */
  async get(key: string, sha256: string, bytes: number, read: () => Promise<Buffer>): Promise<Buffer> {
    const name = `${key}\n${sha256}`;
    const hit = this.entries?.get(name); // a hit becomes the most recently used
    if (hit) return hit;
    const pending = this.loading.get(name);
    if (pending) return pending;
    const load = read().finally(() => this.loading.delete(name));
    this.loading.set(name, load);
    const data = await load;
    if (data.length === bytes && this.fits(bytes)) this.entries?.set(name, data);
    return data;
  }

  /** Drops every entry of a storage key (its file was deleted). */
  forget(key: string): void {
    if (!this.entries) return;
    for (const name of [...this.entries.keys()]) if (name.startsWith(`${key}\n`)) this.entries.delete(name);
  }

  /** Bytes held now (for tests and the benchmark). */
  get heldBytes(): number {
    return this.entries?.calculatedSize ?? 0;
  }
}
