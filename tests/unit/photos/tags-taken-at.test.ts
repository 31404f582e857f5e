import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { photoTagsSchema, tagsFromForm } from "@/lib/photos/tags";
import { takenAtFromExif } from "@/lib/photos/taken-at";
import { twoToneJpeg } from "../../support/photo-files";

describe("photo tags", () => {
  it("treat blank form fields as not set and coerce the clock position", () => {
    const form = new FormData();
    form.set("component", "cup");
    form.set("row", "");
    form.set("clockDeg", "90");
    form.set("findingId", "");
    form.set("caption", "  Spall in the load zone  ");
    expect(photoTagsSchema.parse(tagsFromForm(form))).toEqual({
      component: "cup",
      row: null,
      clockDeg: 90,
      findingId: null,
      caption: "Spall in the load zone",
    });
  });

  it("give a part that belongs to one row that row, and refuse the other", () => {
    expect(photoTagsSchema.parse({ component: "cone-outboard" }).row).toBe("outboard");
    const r = photoTagsSchema.safeParse({ component: "cone-inboard", row: "outboard" });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toBe("Cone, inboard is on the inboard row.");
  });

  it("refuse unknown parts and clock positions outside 0–359°", () => {
    expect(photoTagsSchema.safeParse({ component: "flux-capacitor" }).error?.issues[0].message).toBe("Choose a part from the list.");
    expect(photoTagsSchema.safeParse({ clockDeg: 360 }).error?.issues[0].message).toBe("Clock position is 0–359°.");
    expect(photoTagsSchema.safeParse({ clockDeg: "3 o'clock" }).success).toBe(false);
    expect(photoTagsSchema.safeParse({ caption: "x".repeat(501) }).success).toBe(false);
  });
});

describe("takenAtFromExif", () => {
  const exifOf = async (takenAt?: string) => (await sharp(await twoToneJpeg({ takenAt })).metadata()).exif;

  it("reads DateTimeOriginal", async () => {
    expect(takenAtFromExif(await exifOf("2025:11:02 17:05:00"))?.toISOString()).toBe("2025-11-02T17:05:00.000Z");
  });

  it("ignores a camera clock that was never set or runs in the future", async () => {
    expect(takenAtFromExif(await exifOf("2000:01:01 00:00:00"), new Date("2026-01-01"))).not.toBeNull();
    expect(takenAtFromExif(await exifOf("1980:01:01 00:00:00"))).toBeNull();
    expect(takenAtFromExif(await exifOf("2031:05:05 10:00:00"), new Date("2026-06-01"))).toBeNull();
  });

  it("returns null without EXIF or with a broken block", async () => {
    expect(takenAtFromExif(undefined)).toBeNull();
    expect(takenAtFromExif(Buffer.from("Exif\0\0garbage-not-tiff"))).toBeNull();
  });
});
