/** A small key-value store: localStorage on the web, memory elsewhere or when storage is blocked. */
export interface KeyValueStore {
  read(key: string): string | null;
  write(key: string, value: string): void;
}

export function memoryStore(): KeyValueStore {
  const values = new Map<string, string>();
  return {
    read: (key) => values.get(key) ?? null,
    write: (key, value) => {
      values.set(key, value);
    },
  };
}

export function deviceStore(): KeyValueStore {
  const fallback = memoryStore();
  const storage = typeof globalThis.localStorage === 'undefined' ? null : globalThis.localStorage;
  if (!storage) return fallback;
  return {
    read: (key) => {
      try {
        return storage.getItem(key);
      } catch {
        return fallback.read(key);
      }
    },
    write: (key, value) => {
      try {
        storage.setItem(key, value);
      } catch {
        // Private browsing or a full quota: keep it in memory for this visit rather than lose it.
        fallback.write(key, value);
      }
    },
  };
}
