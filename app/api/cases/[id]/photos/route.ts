// POST /api/cases/:id/photos - upload one photo (multipart: file + tags); GET - the case's photos with tags
import { NextResponse } from "next/server";
import { HttpError, badRequest } from "@/lib/http/errors";
import { withCase } from "@/lib/http/with-case";
import { FORM_OVERHEAD_BYTES, photoLimits } from "@/lib/photos/limits";
import { readFormLimited } from "@/lib/http/body";
import { PhotoRefusal, refuse } from "@/lib/photos/refusal";
import { mayDeletePhoto } from "@/lib/photos/rules";
import { assertPhotosOpen, photosOfCase, uploadPhoto } from "@/lib/photos/service";
import { photoTagsSchema, tagsFromForm } from "@/lib/photos/tags";
import { toPhotoView } from "@/lib/photos/view";

export const GET = withCase("case:read", async ({ case: c, user }) => {
  const rows = await photosOfCase(c);
  const photos = rows.map((p) => ({ ...toPhotoView(p), canDelete: mayDeletePhoto(user, p, c.status) }));
  return NextResponse.json({ caseId: c.id, caseNumber: c.number, readOnly: c.status === "signed", photos });
});

async function readForm(req: Request): Promise<FormData> {
  if (!(req.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    throw badRequest("Send the photo as multipart/form-data with the image in a field named “file”.");
  }
  const limit = photoLimits().maxBytes;
  return readFormLimited(req, limit + FORM_OVERHEAD_BYTES, "The photo");
}

export const POST = withCase("photo:upload", async ({ req, case: c, user }) => {
  // Who may add to which case is settled before a byte of the file is read.
  assertPhotosOpen(c);
  const limits = photoLimits();
  const declared = Number(req.headers.get("content-length") ?? 0);
  try {
    if (declared > limits.maxBytes + FORM_OVERHEAD_BYTES) throw refuse.tooLarge("", declared, limits.maxBytes);
    const form = await readForm(req);
    const file = form.get("file");
    if (!(file instanceof File)) throw badRequest("Attach the photo in a field named “file”.");
    const tags = photoTagsSchema.parse(tagsFromForm(form));
    if (file.size > limits.maxBytes) throw refuse.tooLarge(file.name, file.size, limits.maxBytes);
    const bytes = Buffer.from(await file.arrayBuffer());
    const { photo, duplicate } = await uploadPhoto(c, { bytes, name: file.name }, tags, user);
    const message = duplicate
      ? `This photo is already in ${c.number}${photo.fileName ? ` as “${photo.fileName}”` : ""}; it was not stored twice.`
      : `Photo added to ${c.number}.`;
    return NextResponse.json(
      { photo: { ...toPhotoView(photo), canDelete: mayDeletePhoto(user, photo, c.status) }, duplicate, message },
      { status: duplicate ? 200 : 201 },
    );
  } catch (err) {
    if (err instanceof PhotoRefusal) throw new HttpError(err.status, err.code, err.message);
    throw err;
  }
});
