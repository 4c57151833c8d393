import { createHash, randomBytes } from "node:crypto";

// Single-use link tokens (invitations, password resets): 32 random bytes in the link,
// only their SHA-256 in the database, so a leaked table cannot be turned into links.
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;
