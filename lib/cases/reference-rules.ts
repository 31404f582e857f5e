// Pure rules for the codes and sites a save names. Codes come from the admin-kept lists: a code not
// in its list is refused, and a retired code is refused on new data but kept where a case already has it.
import type { CodeListName } from "@/db/schema";

export type CodeUse = { list: CodeListName; field: string; code: string; current: readonly string[] };
export type SiteUse = { field: "siteId" | "labSiteId"; id: string };

const LIST_WORDS: Record<CodeListName, string> = { trigger: "removal triggers", cause: "root causes", damage: "damage codes" };

/** The first problem with the codes, given each list's states (code -> retired?), or null. */
export function codeProblem(
  uses: readonly CodeUse[],
  states: Record<CodeListName, Map<string, boolean>>,
): { field: string; message: string } | null {
  for (const u of uses) {
    const retired = states[u.list].get(u.code);
    if (retired === undefined)
      return { field: u.field, message: `“${u.code}” is not in the list of ${LIST_WORDS[u.list]}; choose one from the list.` };
    if (retired && !u.current.includes(u.code))
      return { field: u.field, message: `“${u.code}” is retired from the list of ${LIST_WORDS[u.list]}; choose a current one.` };
  }
  return null;
}

/** The first site id that names no site, or null. */
export function siteProblem(uses: readonly SiteUse[], kinds: Map<string, string>): { field: string; message: string } | null {
  for (const u of uses) {
    if (!kinds.has(u.id))
      return {
        field: u.field,
        message:
          u.field === "siteId"
            ? "That removal site does not exist; choose one from the list."
            : "That lab does not exist; choose one from the list.",
      };
  }
  return null;
}
