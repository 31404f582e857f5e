// One classification entry as screens show it (any list, admin-added codes included).
export type CodeEntryView = {
  list: "damage" | "cause" | "trigger";
  code: string;
  label: string;
  description: string;
  family: string | null;
  isoMode: string | null;
  synonyms: string[];
  retired: boolean;
};
