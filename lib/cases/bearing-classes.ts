// The bearing classes a case may name. Kept apart from the zod schemas so screens in the browser
// (the new-removal form on a phone) can list them without loading the validation library.
export const BEARING_CLASSES = ["D", "E", "F", "G", "K", "other"] as const;

/** "Class K"; `short` gives "Other" rather than "Other class" where the heading already says class. No code reads as a dash. */
export function bearingClassLabel(code: string | number | null | undefined, short = false): string {
  if (code === null || code === undefined || code === "") return "—";
  if (code === "other") return short ? "Other" : "Other class";
  return `Class ${code}`;
}
