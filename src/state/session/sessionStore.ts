import { createStore, del, delMany, get, keys, set, type UseStore } from "idb-keyval";

/**
 * Where the workbench keeps its session: a few keys in this browser's IndexedDB for this page's
 * origin (database "shoal-session", object store "kept"). Nothing leaves the machine. The
 * interface is tiny so tests can run it over fake-indexeddb, or over a Map.
 */
export interface SessionStorage {
  get<T>(key: SessionKey): Promise<T | undefined>;
  set(key: SessionKey, value: unknown): Promise<void>;
  delete(key: SessionKey): Promise<void>;
  /** Deletes every key this module ever writes. */
  clear(): Promise<void>;
  /** The keys that hold something now. */
  keys(): Promise<SessionKey[]>;
}

/** The session record (recipe, selection, layout, file name and fingerprint), and the table's bytes when the user chose to keep them. */
export const sessionKeys = ["session", "table-bytes"] as const;
export type SessionKey = (typeof sessionKeys)[number];

export const sessionDatabase = { name: "shoal-session", store: "kept" } as const;

/** The IndexedDB-backed storage (needs `indexedDB` on the global object: the page, or fake-indexeddb in tests). */
export function idbSessionStorage(database: { readonly name: string; readonly store: string } = sessionDatabase): SessionStorage {
  let kept: UseStore | null = null;
  // opened on first use: a page without IndexedDB (a private window may refuse it) fails then, not at import
  const store = (): UseStore => (kept ??= createStore(database.name, database.store));
  return {
    get: <T>(key: SessionKey) => get<T>(key, store()),
    set: (key, value) => set(key, value, store()),
    delete: (key) => del(key, store()),
    clear: () => delMany([...sessionKeys], store()),
    keys: async () => (await keys(store())).filter((k): k is SessionKey => (sessionKeys as readonly unknown[]).includes(k)),
  };
}
