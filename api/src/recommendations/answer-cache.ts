/**
 * A small least-recently-used cache of computed answers. The mix engine is deterministic, so the
 * same request over the same catalogue version always gives the same answer; keys include the
 * catalogue version, so a curator's edit makes every older entry unreachable.
 */
export class AnswerCache<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity = 200) {}

  getOrCompute(key: string, compute: () => V): V {
    const hit = this.entries.get(key);
    if (hit !== undefined) {
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit;
    }
    const value = compute();
    if (this.entries.size >= this.capacity) this.entries.delete(this.entries.keys().next().value!);
    this.entries.set(key, value);
    return value;
  }
}
