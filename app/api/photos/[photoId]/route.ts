// PATCH /api/photos/:photoId - change a photo's tags; DELETE - remove a photo (never from a signed case)
import { NextResponse } from "next/server";
import { badRequest } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
import { removePhoto, retagPhoto } from "@/lib/photos/service";
import { photoTagsSchema } from "@/lib/photos/tags";
import { toPhotoView } from "@/lib/photos/view";

export const PATCH = withRole<{ photoId: string }>("photo:upload", async ({ req, params, user }) => {
  const tags = await parseJson(req, photoTagsSchema);
  if (Object.keys(tags).length === 0) throw badRequest("Send at least one tag to change: component, row, clockDeg, findingId or caption.");
  const photo = await retagPhoto(params.photoId, tags, user);
  return NextResponse.json({ photo: toPhotoView(photo) });
});

export const DELETE = withRole<{ photoId: string }>("photo:delete", async ({ params, user }) => {
  const removed = await removePhoto(params.photoId, user);
  return NextResponse.json({ deleted: removed.id, message: `Photo “${removed.fileName || removed.id}” deleted.` });
});
