/** Largest photo the server takes (the phone checks it before keeping one). */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
