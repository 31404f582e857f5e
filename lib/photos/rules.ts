// Who may change which photo; the routes enforce it and the screens use it to show buttons.
import { can } from "@/lib/auth/permissions";

type Person = { id: string; role: string };

export function mayTagPhotos(person: Person, caseStatus: string): boolean {
  return caseStatus !== "signed" && can(person.role, "photo:upload");
}

/** Shop inspectors remove only what they uploaded; the lab may tidy any case's photos. */
export function mayDeletePhoto(person: Person, photo: { uploadedBy: string | null }, caseStatus: string): boolean {
  if (caseStatus === "signed" || !can(person.role, "photo:delete")) return false;
  return can(person.role, "case:edit-teardown") || photo.uploadedBy === person.id;
}

// Pages that decide what to show often need the limits too.
export { photoLimits } from "./limits";
