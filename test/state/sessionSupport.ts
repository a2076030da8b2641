import type { SessionKey, SessionStorage } from "../../src/state/session/sessionStore.ts";

/** A session storage over a Map (for tests that are not about IndexedDB itself); `map` shows what is kept. */
export function memoryStorage(): SessionStorage & { readonly map: Map<SessionKey, unknown> } {
  const map = new Map<SessionKey, unknown>();
  return {
    map,
    get: <T>(key: SessionKey) => Promise.resolve(map.get(key) as T | undefined),
    set: (key, value) => Promise.resolve(void map.set(key, structuredClone(value))),
    delete: (key) => Promise.resolve(void map.delete(key)),
    clear: () => Promise.resolve(map.clear()),
    keys: () => Promise.resolve([...map.keys()]),
  };
}
