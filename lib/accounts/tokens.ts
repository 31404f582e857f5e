// Invitation tokens: random, sent once by e-mail; only the SHA-256 is stored.
import { createHash, randomBytes } from "node:crypto";

export const INVITATION_DAYS = 7;

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
