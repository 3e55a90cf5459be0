import { createHash, randomBytes } from "node:crypto";

/** A secret for a link in an e-mail or a share link: 256 random bits, base64url (43 characters). */
export function newLinkToken(): string {
  return randomBytes(32).toString("base64url");
}

/**
 * What the database keeps instead of a token: its SHA-256 in hex. A plain hash is enough
 * because the token is 256 random bits (nothing to guess); passwords use argon2id instead.
 */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
