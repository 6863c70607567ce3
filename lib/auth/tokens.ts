// One-time link tokens: 32 random bytes (256 bits) in base64url for the link, and only their
// SHA-256 stored. A fast hash is enough here because the token is random and long, unlike a
// password; it still means a copy of the database holds no working link.
import crypto from "node:crypto";

const TOKEN_BYTES = 32;

export function newToken(): { token: string; hash: string } {
  const token = crypto.randomBytes(TOKEN_BYTES).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token, "utf8").digest("hex");
}
