// A classification entry as the reference page shows it.
export type { CodeEntryView as RefEntry } from "@/lib/classification/code-entry-view";
