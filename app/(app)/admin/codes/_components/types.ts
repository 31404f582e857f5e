// A code as the Code lists page hands it to its client pieces.
import type { CodeListName } from "@/db/schema/code-lists";

export type CodeView = {
  list: CodeListName;
  code: string;
  label: string;
  description: string;
  family: string | null;
  isoMode: string | null;
  synonyms: string[];
  retired: boolean;
  cases: number;
};
