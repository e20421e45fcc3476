/** A Map that forgets its oldest entries beyond `maxEntries`, so a cache's memory stays bounded. */
export class BoundedMap<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly maxEntries: number) {}

  get(key: string): V | undefined {
    return this.entries.get(key);
  }

  /** The value held under `key`, or the one `make` gives, which is then held. */
  async getOr(key: string, make: () => Promise<V>): Promise<V> {
    const held = this.entries.get(key);
    if (held !== undefined) return held;
    const made = await make();
    this.set(key, made);
    return made;
  }

  set(key: string, value: V): void {
    if (!this.entries.has(key) && this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
    this.entries.set(key, value);
  }
}
