/** A small least-recently-used cache: the sweep reuses geometry-only work across many points. */
export function createMemo<V>(limit: number): { get(key: string, make: () => V): V; clear(): void } {
  const map = new Map<string, V>();
  return {
    get(key, make) {
      const hit = map.get(key);
      if (hit !== undefined) {
        map.delete(key);
        map.set(key, hit);
        return hit;
      }
      const value = make();
      map.set(key, value);
      if (map.size > limit) map.delete(map.keys().next().value as string);
      return value;
    },
    clear() {
      map.clear();
    },
  };
}
