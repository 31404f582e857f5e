// The tag values a form edits, and their conversion to what the API takes.
import type { PhotoView } from "@/lib/photos/view";

export type TagValues = { component: string; row: string; clockDeg: string; findingId: string; caption: string };
export type FindingOption = { id: string; label: string };

export const EMPTY_TAGS: TagValues = { component: "", row: "", clockDeg: "", findingId: "", caption: "" };

export function tagsOf(p: PhotoView): TagValues {
  return {
    component: p.component ?? "",
    row: p.row ?? "",
    clockDeg: p.clockDeg === null ? "" : String(p.clockDeg),
    findingId: p.findingId ?? "",
    caption: p.caption,
  };
}

/** JSON for PATCH: empty means "clear". */
export function tagsForApi(t: TagValues) {
  return {
    component: t.component || null,
    row: t.row || null,
    clockDeg: t.clockDeg === "" ? null : Number(t.clockDeg),
    findingId: t.findingId || null,
    caption: t.caption,
  };
}

export function appendTags(form: FormData, t: TagValues) {
  for (const [k, v] of Object.entries(t)) form.set(k, v);
}
