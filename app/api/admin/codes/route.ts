// GET /api/admin/codes?list= - a classification list with retired codes and usage; POST - add a code
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { codeUsageCounts, getCodeEntry, insertCodeEntry, listCodeEntries } from "@/db/queries/code-entries";
import { familyOfCode } from "@/lib/classification/damage-families";
import { conflict } from "@/lib/http/errors";
import { parseJson, parseQuery, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { CODE_LIST_LABELS, codeCreateSchema, listSchema } from "@/lib/validation/code-entry";

export const GET = withRole("admin:codes", async ({ req }) => {
  const { list } = parseQuery(req, z.object({ list: listSchema }));
  const [rows, usage] = await Promise.all([listCodeEntries(list, { includeRetired: true }), codeUsageCounts(list)]);
  return NextResponse.json({ codes: rows.map((r) => ({ ...r, cases: usage.get(r.code) ?? 0 })) });
});

export const POST = withRole("admin:codes", async ({ req, user }) => {
  const input = await parseJson(req, codeCreateSchema);
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
  await audit("code-list", user, { subject: `${input.list} ${input.code}`, headers: req.headers, detail: { action: "add" } });
  return NextResponse.json({ code: row }, { status: 201 });
});
