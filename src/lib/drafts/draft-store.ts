/**
 * Values typed but not yet saved, kept on this device per form (visit, section, circuit), so a
 * switch of tab, circuit or page, or a reload, never throws them away. localStorage: it
 * survives a reload and a closed tab on the roof. Signing out clears them (the next person on a
 * shared tablet must not see them), after asking.
 */
const PREFIX = "satura:draft:";

interface StoredDraft<T> {
  value: T;
  /** When it was last typed into, ISO 8601. */
  at: string;
}

function storage(): Storage | null {
  try {
    return typeof localStorage === "undefined" ? null : localStorage;
  } catch {
    // Private modes may refuse storage: drafts then live only as long as the page.
    return null;
  }
}

export function readDraft<T>(key: string): T | null {
  const raw = storage()?.getItem(PREFIX + key);
  if (!raw) return null;
  try {
    return (JSON.parse(raw) as StoredDraft<T>).value;
  } catch {
    return null;
  }
}

export function writeDraft<T>(key: string, value: T): void {
  try {
    storage()?.setItem(PREFIX + key, JSON.stringify({ value, at: new Date().toISOString() } satisfies StoredDraft<T>));
  } catch {
    // A full storage keeps the draft in memory only; nothing else to do.
  }
}

export function clearDraft(key: string): void {
  storage()?.removeItem(PREFIX + key);
}

/** How many forms hold unsaved values on this device. */
export function countDrafts(): number {
  const store = storage();
  if (!store) return 0;
  let count = 0;
  for (let index = 0; index < store.length; index += 1) if (store.key(index)?.startsWith(PREFIX)) count += 1;
  return count;
}

export function clearAllDrafts(): void {
  const store = storage();
  if (!store) return;
  const keys: string[] = [];
  for (let index = 0; index < store.length; index += 1) {
    const key = store.key(index);
    if (key?.startsWith(PREFIX)) keys.push(key);
  }
  for (const key of keys) store.removeItem(key);
}
