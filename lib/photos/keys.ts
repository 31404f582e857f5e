// Where a photo's objects live in the bucket. Content-addressed: the same file in the same case
// always maps to the same keys, so a repeated upload can never store a second copy.
export type PhotoVariant = "original" | "screen" | "thumb";
export const PHOTO_VARIANTS: readonly PhotoVariant[] = ["thumb", "screen", "original"];

export const PHOTO_KEY_PREFIX = "cases/";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const SHA256 = /^[0-9a-f]{64}$/;

export type PhotoKeys = Record<PhotoVariant, string>;

export function photoFolder(caseId: string, sha256: string): string {
  if (!UUID.test(caseId)) throw new Error(`not a case id: ${caseId}`);
  if (!SHA256.test(sha256)) throw new Error(`not a SHA-256 hex digest: ${sha256}`);
  return `${PHOTO_KEY_PREFIX}${caseId.toLowerCase()}/${sha256}/`;
}

export function photoKeys(caseId: string, sha256: string): PhotoKeys {
  const folder = photoFolder(caseId, sha256);
  return { original: `${folder}original`, screen: `${folder}screen.webp`, thumb: `${folder}thumb.webp` };
}

/** The case and digest a key belongs to, or null for anything that is not a photo object. */
export function parsePhotoKey(key: string): { caseId: string; sha256: string; name: string } | null {
  const parts = key.split("/");
  if (parts.length !== 4 || `${parts[0]}/` !== PHOTO_KEY_PREFIX) return null;
  const [, caseId, sha256, name] = parts;
  if (!UUID.test(caseId) || !SHA256.test(sha256) || !name) return null;
  return { caseId, sha256, name };
}
