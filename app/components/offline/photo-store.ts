import { createStore, del, get, set, type UseStore } from "idb-keyval";

/** Photos taken with no signal wait here (IndexedDB: localStorage cannot hold pictures) until they are sent. */
let photos: UseStore | null = null;
const db = () => (photos ??= createStore("tankside-photos", "photos"));

export const keepPhotoBytes = (id: string, blob: Blob) => set(id, blob, db());
export const keptPhotoBytes = (id: string) => get<Blob>(id, db());
export const dropPhotoBytes = (id: string) => del(id, db());
