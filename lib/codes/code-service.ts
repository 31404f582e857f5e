// The classification lists (damage codes, root causes, triggers): read for pickers and pages,
// and kept by admins. Adding, editing and deleting check the code first and are audited.
import "server-only";
import {
  casesUsingCode,
  codeUsageCounts,
  deleteUnusedCodeEntry,
  getCodeEntry,
  insertCodeEntry,
  listCodeEntries,
  updateCodeEntry,
} from "@/db/queries/code-entries";
import type { CodeListName } from "@/db/schema/code-lists";
import type { CurrentUser } from "@/lib/auth/session";
import { familyOfCode } from "@/lib/classification/damage-families";
import { conflict, notFound } from "@/lib/http/errors";
import { audit } from "@/lib/security/audit";
import { CODE_LIST_LABELS, type CodeCreateInput, type CodePatchInput } from "@/lib/validation/code-entry";

/** One list (or every list) in its order; retired codes only when asked for. */
export async function codeEntries(list?: CodeListName, opts: { includeRetired?: boolean } = {}) {
  return listCodeEntries(list, opts);
}

export type CodeEntryRow = Awaited<ReturnType<typeof codeEntries>>[number];

/** A list with retired codes and, for each code, how many cases use it (for admins). */
export async function codesWithUsage(list: CodeListName) {
  const [rows, usage] = await Promise.all([listCodeEntries(list, { includeRetired: true }), codeUsageCounts(list)]);
  return rows.map((r) => ({ ...r, cases: usage.get(r.code) ?? 0 }));
}

/** The code as stored, or 404 naming it. */
export async function existingCode(list: CodeListName, code: string) {
  const row = await getCodeEntry(list, code);
  if (!row) throw notFound(`The ${CODE_LIST_LABELS[list].one} ${code}`);
  return row;
}

export async function addCode(input: CodeCreateInput, user: CurrentUser, headers: Headers) {
  const taken = `The ${CODE_LIST_LABELS[input.list].one} ${input.code} already exists; edit or restore it instead.`;
  if (await getCodeEntry(input.list, input.code)) throw conflict(taken, { fields: { code: "This code is taken." } });
  const row = await insertCodeEntry({
    list: input.list,
    code: input.code,
    label: input.label,
    description: input.description,
    synonyms: input.synonyms,
    family: input.list === "damage" ? familyOfCode(input.code) : null,
    isoMode: input.list === "damage" ? (input.isoMode ?? null) : null,
  });
  if (!row) throw conflict(taken, { fields: { code: "This code is taken." } });
  await audit("code-list", user, { subject: `${input.list} ${input.code}`, headers, detail: { action: "add" } });
  return row;
}

type CodeRow = Awaited<ReturnType<typeof existingCode>>;

/** Takes the row from existingCode, so a missing code is a 404 before its change is read. */
export async function editCode(row: CodeRow, patch: CodePatchInput, user: CurrentUser, headers: Headers) {
  const { retired, ...rest } = patch;
  if (rest.isoMode && row.list !== "damage") throw conflict("Only damage codes carry an ISO 15243 mode.");
  const retiredAt = retired === undefined ? undefined : retired ? (row.retiredAt ?? new Date()) : null;
  const updated = await updateCodeEntry(row.list, row.code, { ...rest, ...(retiredAt !== undefined ? { retiredAt } : {}) });
  await audit("code-list", user, {
    subject: `${row.list} ${row.code}`,
    headers,
    detail: { action: "edit", changed: Object.keys({ ...rest, ...(retired !== undefined ? { retired } : {}) }) },
  });
  return updated;
}

/** Only a code no case uses is deleted; otherwise 409 with the count, so it can be retired instead. */
export async function deleteCode(row: CodeRow, user: CurrentUser, headers: Headers) {
  if (!(await deleteUnusedCodeEntry(row.list, row.code))) {
    const n = await casesUsingCode(row.list, row.code);
    throw conflict(
      `${row.code} is used by ${n} ${n === 1 ? "case" : "cases"}, so it cannot be deleted; retire it instead so those cases keep their meaning.`,
      { cases: n },
    );
  }
  await audit("code-list", user, { subject: `${row.list} ${row.code}`, headers, detail: { action: "delete" } });
}
