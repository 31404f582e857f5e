// PATCH /api/admin/codes/:list/:code - edit label, description, shop words, or retire/restore; DELETE - only if unused
import { NextResponse } from "next/server";
import { casesUsingCode, deleteUnusedCodeEntry, getCodeEntry, updateCodeEntry } from "@/db/queries/code-entries";
import { conflict, notFound } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { CODE_LIST_LABELS, codePatchSchema, listSchema } from "@/lib/validation/code-entry";

type Params = { list: string; code: string };

async function existing(params: Params) {
  const list = listSchema.parse(params.list);
  const code = params.code;
  const row = await getCodeEntry(list, code);
  if (!row) throw notFound(`The ${CODE_LIST_LABELS[list].one} ${code}`);
  return row;
}

export const PATCH = withRole<Params>("admin:codes", async ({ req, params, user }) => {
  const row = await existing(params);
  const { retired, ...rest } = await parseJson(req, codePatchSchema);
  if (rest.isoMode && row.list !== "damage") throw conflict("Only damage codes carry an ISO 15243 mode.");
  const retiredAt = retired === undefined ? undefined : retired ? (row.retiredAt ?? new Date()) : null;
  const updated = await updateCodeEntry(row.list, row.code, { ...rest, ...(retiredAt !== undefined ? { retiredAt } : {}) });
  await audit("code-list", user, { subject: `${row.list} ${row.code}`, headers: req.headers, detail: { action: "edit", changed: Object.keys({ ...rest, ...(retired !== undefined ? { retired } : {}) }) } });
  return NextResponse.json({ code: updated });
});

export const DELETE = withRole<Params>("admin:codes", async ({ req, params, user }) => {
  const row = await existing(params);
  if (!(await deleteUnusedCodeEntry(row.list, row.code))) {
    const n = await casesUsingCode(row.list, row.code);
    throw conflict(
      `${row.code} is used by ${n} ${n === 1 ? "case" : "cases"}, so it cannot be deleted; retire it instead so those cases keep their meaning.`,
      { cases: n },
    );
  }
  await audit("code-list", user, { subject: `${row.list} ${row.code}`, headers: req.headers, detail: { action: "delete" } });
  return NextResponse.json({ ok: true });
});
