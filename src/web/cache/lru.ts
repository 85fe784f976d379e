// A bounded least-recently-used map: at most `maxEntries` entries and `maxBytes` of approximate size (the size each
// entry is given when stored). Storing past either bound drops the least recently used entries first; an entry larger
// than `maxBytes` on its own is not kept at all.

export interface LruLimits {
  maxEntries: number;
  maxBytes: number;
}

export class Lru<V> {
  // a Map iterates in insertion order: re-inserting on use keeps the least recently used first
  private readonly map = new Map<string, { value: V; bytes: number }>();
  private bytesHeld = 0;

  constructor(readonly limits: LruLimits) {
    if (!(limits.maxEntries >= 1) || !(limits.maxBytes >= 1))
      throw new Error('Lru: maxEntries and maxBytes must be at least 1');
  }

  get(key: string): V | undefined {
    const e = this.map.get(key);
    if (!e) return undefined;
    this.map.delete(key);
    this.map.set(key, e);
    return e.value;
  }

  set(key: string, value: V, bytes: number): void {
    this.delete(key);
    if (!(bytes <= this.limits.maxBytes)) return;
    this.map.set(key, { value, bytes });
    this.bytesHeld += bytes;
    for (const [k, e] of this.map) {
      if (this.map.size <= this.limits.maxEntries && this.bytesHeld <= this.limits.maxBytes) break;
      this.map.delete(k);
      this.bytesHeld -= e.bytes;
    }
  }

  delete(key: string): void {
    const e = this.map.get(key);
    if (!e) return;
    this.map.delete(key);
    this.bytesHeld -= e.bytes;
  }

  clear(): void {
    this.map.clear();
    this.bytesHeld = 0;
  }

  get size(): number {
    return this.map.size;
  }

  get bytes(): number {
    return this.bytesHeld;
  }
}
