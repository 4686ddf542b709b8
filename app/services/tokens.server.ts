import { createHash, randomBytes } from "node:crypto";

/** The hash stored for a link's token: a copy of the database alone cannot be used to follow the link. */
export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

/** A token for a single-use link (256 random bits, URL-safe) and the hash to store. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}
