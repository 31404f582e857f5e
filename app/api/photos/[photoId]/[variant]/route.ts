// GET /api/photos/:photoId/:variant - the bytes of a photo (thumb, screen or original) for someone allowed to see its case
import { z } from "@/lib/validation/zod";
import { notFound } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";
import { openStoredObject } from "@/lib/photos/object-store";
import { loadReadablePhoto } from "@/lib/photos/service";

const variantSchema = z.enum(["thumb", "screen", "original"], { error: "The variant is thumb, screen or original." });

function dispositionName(name: string, fallback: string) {
  const safe = (name || fallback).replace(/[^\w.\- ]+/g, "_");
  return `filename="${safe}"; filename*=UTF-8''${encodeURIComponent(name || fallback)}`;
}

export const GET = withRole<{ photoId: string; variant: string }>("case:read", async ({ req, params, user }) => {
  const variant = variantSchema.parse(params.variant);
  const { photo } = await loadReadablePhoto(params.photoId, user);
  // Content-addressed objects never change, so the digest is the validator.
  const etag = `"${photo.sha256.slice(0, 32)}-${variant}"`;
  const common = { ETag: etag, "Cache-Control": "private, max-age=3600", Vary: "Cookie" };
  if (req.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers: common });

  const key = { thumb: photo.thumbKey, screen: photo.screenKey, original: photo.originalKey }[variant];
  const obj = await openStoredObject(key);
  if (!obj) throw notFound("That photo's image");
  const download = req.nextUrl.searchParams.get("download") === "1";
  const headers: Record<string, string> = {
    ...common,
    "Content-Type": variant === "original" ? photo.contentType : "image/webp",
    "X-Content-Type-Options": "nosniff",
    "Content-Disposition": `${download ? "attachment" : "inline"}; ${dispositionName(variant === "original" ? photo.fileName : `${photo.id}-${variant}.webp`, `${photo.id}`)}`,
  };
  if (obj.length !== undefined) headers["Content-Length"] = String(obj.length);
  return new Response(obj.body, { status: 200, headers });
});
