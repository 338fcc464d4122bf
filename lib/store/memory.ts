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
      // An undo log of the keys this transaction wrote, replayed backwards on failure.
      const undo: [Collection, string, string | undefined][] = [];
      const inTx: Tables = {
        ...tables,
        put: async (c, key, value) => {
          undo.push([c, key, table(c).get(key)]);
          await tables.put(c, key, value);
        },
        remove: async (c, key) => {
          undo.push([c, key, table(c).get(key)]);
          await tables.remove(c, key);
        },
      };
      try {
        return await work(inTx);
      } catch (e) {
        for (const [c, key, old] of undo.reverse()) {
          if (old === undefined) table(c).delete(key);
          else table(c).set(key, old);
        }
        throw e;
      }
    },
  };
  return tables;
}
