// A classification entry as the reference page shows it (any list, admin-added ones included).
export type RefEntry = {
  list: "damage" | "cause" | "trigger";
  code: string;
  label: string;
  description: string;
  family: string | null;
  isoMode: string | null;
  synonyms: string[];
  retired: boolean;
};
