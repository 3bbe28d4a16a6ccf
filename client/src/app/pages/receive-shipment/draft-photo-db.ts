// Keeps a draft's photos in IndexedDB on the phone (too large for localStorage), so they survive a reload.
export interface DraftPhoto {
  id: string;
  name: string;
  blob: Blob;
}

const dbName = 'vialyard-drafts';
const storeName = 'photos';

function open(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const request = indexedDB.open(dbName, 1);
    request.onupgradeneeded = () => request.result.createObjectStore(storeName);
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error);
  });
}

async function run<T>(mode: IDBTransactionMode, work: (store: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  const db = await open();
  try {
    return await new Promise<T>((resolve, reject) => {
      const request = work(db.transaction(storeName, mode).objectStore(storeName));
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error);
    });
  } finally {
    db.close();
  }
}

export async function readDraftPhotos(key: string): Promise<DraftPhoto[]> {
  try {
    return ((await run('readonly', (store) => store.get(key))) as DraftPhoto[] | undefined) ?? [];
  } catch {
    return [];
  }
}

export async function writeDraftPhotos(key: string, photos: DraftPhoto[]): Promise<void> {
  await run('readwrite', (store) => store.put(photos, key));
}

export async function deleteDraftPhotos(key: string): Promise<void> {
  try {
    await run('readwrite', (store) => store.delete(key));
  } catch {
    // Nothing kept, nothing to remove.
  }
}
