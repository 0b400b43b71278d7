/**
 * The bytes of recently served small files (thumb and screen derivatives), least recently
 * used first out, bounded in total bytes. An entry is named by storage key and SHA-256, so
 * a re-made derivative (same key, new hash in its row) is never answered from an old entry.
 * It only saves disk work: every request is still authorised against the database first.
 */
export class MediaFileCache {
  private readonly entries = new Map<string, Buffer>();
  private readonly loading = new Map<string, Promise<Buffer>>();
  private total = 0;

  constructor(
    private readonly maxBytes: number,
    private readonly maxEntryBytes: number,
  ) {}

  /** Whether a file of this size is kept at all (a cache of 0 bytes keeps nothing). */
  fits(bytes: number): boolean {
    return bytes <= this.maxEntryBytes && bytes <= this.maxBytes;
  }

  /** The cached bytes, or `read()`'s (kept when they have the expected size); one read per file at a time. */
  async get(key: string, sha256: string, bytes: number, read: () => Promise<Buffer>): Promise<Buffer> {
    const name = `${key}\n${sha256}`;
    const hit = this.entries.get(name);
    if (hit) {
      // Map order is insertion order: moving the entry to the end marks it most recently used.
      this.entries.delete(name);
      this.entries.set(name, hit);
      return hit;
    }
    const pending = this.loading.get(name);
    if (pending) return pending;
    const load = read().finally(() => this.loading.delete(name));
    this.loading.set(name, load);
    const data = await load;
    if (data.length === bytes) this.add(name, data);
    return data;
  }

  /** Drops every entry of a storage key (its file was deleted). */
  forget(key: string): void {
    for (const [name, data] of this.entries) {
      if (name.startsWith(`${key}\n`)) {
        this.entries.delete(name);
        this.total -= data.length;
      }
    }
  }

  private add(name: string, data: Buffer): void {
    if (!this.fits(data.length) || this.entries.has(name)) return;
    this.entries.set(name, data);
    this.total += data.length;
    for (const [oldest, old] of this.entries) {
      if (this.total <= this.maxBytes) break;
      this.entries.delete(oldest);
      this.total -= old.length;
    }
  }
}
