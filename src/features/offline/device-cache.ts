import type { DehydratedState } from "@tanstack/react-query";

/**
 * The copy of the app's data kept on the device for offline use: one record, the dehydrated
 * query cache of one signed-in person. Plain IndexedDB (one key, one value) rather than a
 * library: it is read before the first screen, and every kilobyte on that path counts.
 */
export interface KeptData {
  /** Whose data it is: never shown to anyone else (persist-queries.ts). */
  userId: string;
  /** The build that wrote it: another build's screens may read other shapes. */
  build: string;
  savedAt: number;
  state: DehydratedState;
}

const DATABASE = "satura-device-cache";
const STORE = "kept";
const KEY = "queries";

function openDatabase(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const request = indexedDB.open(DATABASE, 1);
    request.onupgradeneeded = () => request.result.createObjectStore(STORE);
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error ?? new Error("IndexedDB could not be opened"));
  });
}

let database: Promise<IDBDatabase> | undefined;

async function run<T>(mode: IDBTransactionMode, work: (store: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  database ??= openDatabase();
  const store = (await database).transaction(STORE, mode).objectStore(STORE);
  return new Promise((resolve, reject) => {
    const request = work(store);
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error ?? new Error("IndexedDB request failed"));
  });
}

export const readKeptData = (): Promise<KeptData | undefined> =>
  run("readonly", (store) => store.get(KEY) as IDBRequest<KeptData | undefined>);
export const writeKeptData = (data: KeptData): Promise<unknown> => run("readwrite", (store) => store.put(data, KEY));
export const deleteKeptData = (): Promise<unknown> => run("readwrite", (store) => store.delete(KEY));
