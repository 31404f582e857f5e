// The bearing classes a case may name. Kept apart from the zod schemas so screens in the browser
// (the new-removal form on a phone) can list them without loading the validation library.
export const BEARING_CLASSES = ["D", "E", "F", "G", "K", "other"] as const;
