/**
 * Properties computed on first reading. A result or a displayed point of a
 * large Grassmannian carries some long lists (every label, every exact
 * coordinate as text) that most readers never look at: a lens or a hover shows
 * the first few, and the editor's worker drops the exact JSON before sending a
 * result on. Defining them this way makes only the readers that want them pay.
 */

/**
 * Defines `key` on `target` as an enumerable property whose value `make`
 * computes on first reading. That reading replaces it with an ordinary data
 * property holding the value, so the object looks the same to every later
 * reader, to `JSON.stringify`, to structured cloning and to deep equality.
 * The property keeps its place in the order of keys.
 */
export function defineLazy<T extends object>(target: T, key: string, make: () => unknown): void {
  Object.defineProperty(target, key, {
    enumerable: true,
    configurable: true,
    get(): unknown {
      const value = make();
      Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
      return value;
    },
    set(value: unknown): void {
      Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
    },
  });
}
