import bcrypt from "bcryptjs";

/** bcrypt cost: 12 rounds is about 0.25 s here, slow for guessing, quick enough to sign in. */
export const BCRYPT_COST = 12;

export const hashPassword = (plain: string) => bcrypt.hash(plain, BCRYPT_COST);
export const checkPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);
