import type { UseStore } from "idb-keyval";

/**
 * Photos taken with no signal wait here (IndexedDB: localStorage cannot hold pictures) until they
 * are sent. The IndexedDB helper loads on first use: most walks take no photo.
 */
let photos: Promise<{ db: UseStore; lib: typeof import("idb-keyval") }> | null = null;
const store = () => (photos ??= import("idb-keyval").then((lib) => ({ lib, db: lib.createStore("tankside-photos", "photos") })));

export const keepPhotoBytes = async (id: string, blob: Blob) => {
  const { lib, db } = await store();
  await lib.set(id, blob, db);
};
export const keptPhotoBytes = async (id: string) => {
  const { lib, db } = await store();
  return lib.get<Blob>(id, db);
};
export const dropPhotoBytes = async (id: string) => {
  const { lib, db } = await store();
  await lib.del(id, db);
};
