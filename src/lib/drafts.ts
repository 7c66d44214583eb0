// Form drafts kept on the phone (IndexedDB, so photos taken with the camera are kept too): a
// reload, a dropped tab or a trip to another screen loses nothing of a half-logged repair.
import { createStore, del, get, set, type UseStore } from 'idb-keyval';

const hasIndexedDb = typeof indexedDB !== 'undefined';
let store: UseStore | null = null;
const draftStore = () => (store ??= createStore('gridkeep-drafts', 'drafts'));

export async function loadDraft<T>(key: string): Promise<T | undefined> {
  if (!hasIndexedDb) return undefined;
  try {
    return await get<T>(key, draftStore());
  } catch {
    return undefined;
  }
}

export async function saveDraft<T>(key: string, value: T): Promise<void> {
  if (hasIndexedDb) await set(key, value, draftStore());
}

export async function clearDraft(key: string): Promise<void> {
  if (hasIndexedDb) await del(key, draftStore());
}
