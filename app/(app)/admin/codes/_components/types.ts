// A code as the Code lists page hands it to its client pieces: the entry plus how many cases use it.
import type { CodeEntryView } from "@/lib/classification/code-entry-view";

export type CodeView = CodeEntryView & { cases: number };
