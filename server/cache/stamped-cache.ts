/**
 * Values kept in memory while the database's stamp for them is unchanged. Each read passes the
 * stamp it just read, so another instance's write (which bumps the stamp) empties this cache
 * before anything stale is served.
 */
export class StampedCache<V> {
  private stamp: number | null = null;
  private readonly values = new Map<string, V>();

  constructor(private readonly maxEntries = 5000) {}

  async get(stamp: number, key: string, load: () => Promise<V>): Promise<V> {
    if (stamp !== this.stamp) {
      this.values.clear();
      this.stamp = stamp;
    }
    if (this.values.has(key)) return this.values.get(key)!;
    const value = await load();
    // A write may have landed while loading; keep the value only under the stamp it was loaded for.
    if (this.stamp === stamp) {
      if (this.values.size >= this.maxEntries) this.values.delete(this.values.keys().next().value!);
      this.values.set(key, value);
    }
    return value;
  }

  /** Several keys at once; `loadMissing` is called once with the keys not held. */
  async getMany(stamp: number, keys: string[], loadMissing: (keys: string[]) => Promise<Map<string, V>>): Promise<Map<string, V>> {
    if (stamp !== this.stamp) {
      this.values.clear();
      this.stamp = stamp;
    }
    const found = new Map<string, V>();
    const missing: string[] = [];
    for (const key of keys) {
      if (this.values.has(key)) found.set(key, this.values.get(key)!);
      else missing.push(key);
    }
    if (missing.length === 0) return found;
    const loaded = await loadMissing(missing);
    for (const [key, value] of loaded) {
      found.set(key, value);
      if (this.stamp !== stamp) continue;
      if (this.values.size >= this.maxEntries) this.values.delete(this.values.keys().next().value!);
      this.values.set(key, value);
    }
    return found;
  }
}
