// Tables in memory, values kept as JSON text so a reader never shares objects with a writer
// (as with the real store). A "reload" in tests is a new LocalStore over the same MemoryDisk.
import type { Collection, Tables } from './tables';

export type MemoryDisk = Map<Collection, Map<string, string>>;
export const memoryDisk = (): MemoryDisk => new Map();

export function memoryTables(disk: MemoryDisk = memoryDisk()): Tables {
  const table = (c: Collection) => {
    let t = disk.get(c);
    if (!t) disk.set(c, (t = new Map()));
    return t;
  };
  const sortedKeys = (c: Collection, prefix: string) => [...table(c).keys()].filter((k) => k.startsWith(prefix)).sort();
  const tables: Tables = {
    async get<T>(c: Collection, key: string) {
      const v = table(c).get(key);
      return v === undefined ? undefined : (JSON.parse(v) as T);
    },
    async put(c, key, value) {
      table(c).set(key, JSON.stringify(value));
    },
    async remove(c, key) {
      table(c).delete(key);
    },
    async list<T>(c: Collection, prefix = '', limit = Infinity) {
      return sortedKeys(c, prefix)
        .slice(0, limit)
        .map((k) => JSON.parse(table(c).get(k)!) as T);
    },
    async count(c, prefix = '') {
      return sortedKeys(c, prefix).length;
    },
    async transaction(work) {
      const before = new Map([...disk].map(([c, t]) => [c, new Map(t)]));
      try {
        return await work(tables);
      } catch (e) {
        disk.clear();
        for (const [c, t] of before) disk.set(c, t);
        throw e;
      }
    },
  };
  return tables;
}
