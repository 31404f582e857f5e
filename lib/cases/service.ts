// Case operations as the API and pages call them: access, stage rules, computed fields, history.
import "server-only";
import { z } from "@/lib/validation/zod";
import { addFinding, changeFinding, countFindings, findingCode, insertCase, insertCaseOnce, updateCase } from "@/db/queries/case-write";
import { codeStates, siteKinds } from "@/db/queries/reference-rows";
import { can } from "@/lib/auth/permissions";
import { findReadableCase, getCaseDetail, listCaseHistory, sitePolicy } from "@/db/queries/case-read";
import { readableNumbers } from "@/db/queries/case-scope";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import type { CaseDetail } from "./types";
import { DEFAULT_END_PLAY_POLICY, evaluateEndPlay, type EndPlayPolicy } from "@/lib/field";
import { HttpError, badRequest, forbidden, notFound } from "@/lib/http/errors";
import { serviceMonthsOf, summariseFieldChecks } from "./compute";
import {
  fieldChecksSchema,
  parseNewRemoval,
  fieldReportSchema,
  findingSchema,
  teardownSchema,
  verdictSchema,
  type FieldReportInput,
} from "./schemas";
import { canEditSection, checkTransition, editRefusal, type Section, type WorkflowAction } from "./workflow";
import { stepReplay, writeStep } from "./step-write";
import { linkedNumbers, maskUnreadableLinks } from "./history-view";
import { codeProblem, siteProblem, type CodeUse, type SiteUse } from "./reference-rules";

/** Codes and sites a save names must exist; retired codes only where the case already has them. */
async function checkReferences(
  values: Record<string, unknown>,
  current: Partial<Case> | null,
  findingCode?: { code: string; current: string | null },
) {
  const codes: CodeUse[] = [];
  if (typeof values.trigger === "string")
    codes.push({ list: "trigger", field: "trigger", code: values.trigger, current: current?.trigger ? [current.trigger] : [] });
  const causesNow = [current?.primaryCause, ...(current?.contributingCauses ?? [])].filter((c): c is string => Boolean(c));
  if (typeof values.primaryCause === "string")
    codes.push({ list: "cause", field: "primaryCause", code: values.primaryCause, current: causesNow });
  if (Array.isArray(values.contributingCauses))
    for (const c of values.contributingCauses as string[])
      codes.push({ list: "cause", field: "contributingCauses", code: c, current: causesNow });
  if (findingCode)
    codes.push({
      list: "damage",
      field: "finding.damageCode",
      code: findingCode.code,
      current: findingCode.current ? [findingCode.current] : [],
    });
  const lists = ["trigger", "cause", "damage"] as const;
  const states = Object.fromEntries(
    await Promise.all(
      lists.map(
        async (l) =>
          [
            l,
            await codeStates(
              l,
              codes.filter((c) => c.list === l).map((c) => c.code),
            ),
          ] as const,
      ),
    ),
  ) as Record<(typeof lists)[number], Map<string, boolean>>;
  const sitesNamed: SiteUse[] = (["siteId", "labSiteId"] as const)
    .filter((f) => typeof values[f] === "string")
    .map((f) => ({ field: f, id: values[f] as string }));
  const problem = codeProblem(codes, states) ?? siteProblem(sitesNamed, await siteKinds(sitesNamed.map((u) => u.id)));
  if (problem) throw badRequest(problem.message, { fields: { [problem.field]: problem.message } });
}

/** People who read only their own shop's cases file and keep cases there, and only with a home shop. */
function assertOwnShop(siteId: string | null | undefined, user: CurrentUser, current: Case | null) {
  if (can(user.role, "case:read-all") || siteId === undefined) return;
  if (current && siteId === current.siteId) return;
  if (!user.siteId) throw forbidden("Your account has no home shop, so it cannot file or move removals; ask an admin to set your shop.");
  if (siteId !== user.siteId) throw forbidden("Inspectors file removals for their own shop only.");
}

/** A case by number or id if the user may read it, else null (for pages, which answer notFound()). */
export async function findCase(key: string, user: CurrentUser): Promise<Case | null> {
  return findReadableCase(key, user);
}

/** A readable case with its findings, site, people's names and policy, else null. */
export async function caseDetail(key: string, user: CurrentUser): Promise<CaseDetail | null> {
  return getCaseDetail(key, user);
}

export async function loadReadableCase(key: string, user: CurrentUser): Promise<Case> {
  // A case the user may not see answers like one that does not exist.
  const row = await findReadableCase(key, user);
  if (!row) throw notFound("That case");
  return row;
}

/** A case's history as this reader may see it: lines naming a case they may not read are masked. */
export async function readableHistory(caseId: string, user: CurrentUser) {
  const events = await listCaseHistory(caseId);
  return maskUnreadableLinks(events, await readableNumbers(linkedNumbers(events), user));
}

async function policyFor(siteId: string | null | undefined): Promise<EndPlayPolicy> {
  const s = await sitePolicy(siteId);
  return s
    ? { maxIn: s.maxIn, dialSpreadIn: s.dialSpreadIn, tapeSpreadIn: s.tapeSpreadIn, plausibleMaxIn: s.plausibleMaxIn }
    : DEFAULT_END_PLAY_POLICY;
}

/** Field-report values plus what Tearline computes from them. */
async function withComputed(input: FieldReportInput, base: Partial<Case>) {
  const merged = { ...base, ...input };
  const out: Record<string, unknown> = { ...input };
  if (input.fieldChecks || input.siteId !== undefined || input.trigger !== undefined) {
    const checks = fieldChecksSchema.parse(merged.fieldChecks ?? {});
    Object.assign(out, summariseFieldChecks(checks, await policyFor(merged.siteId), merged.trigger));
  }
  if (input.mountedOn !== undefined || input.removedOn !== undefined) {
    out.serviceMonths = serviceMonthsOf(merged.mountedOn, merged.removedOn);
  }
  return out;
}

/** A reading no bearing can show is refused at filing until corrected or confirmed as typed. */
async function refuseImplausible(input: FieldReportInput) {
  const endPlay = input.fieldChecks?.endPlay;
  if (!endPlay || endPlay.trials.length === 0) return;
  const problem = evaluateEndPlay(endPlay, await policyFor(input.siteId)).messages.find((m) => m.code === "implausible-reading");
  if (problem) throw badRequest(problem.text, { fields: { endPlay: problem.text } });
}

/** A device's key for one filing: letters, digits and dashes (a UUID fits). */
export const createKeySchema = z
  .string({ message: "Idempotency-Key must be text." })
  .regex(/^[A-Za-z0-9_-]{16,100}$/, "Idempotency-Key must be 16 to 100 letters, digits, dashes or underscores.");

/** Files a removal. With a key, a repeat of the same filing answers the first case (`replayed`) instead of a new one. */
export async function createFieldReport(body: unknown, user: CurrentUser, createKey?: string | null) {
  const input = parseNewRemoval(body);
  assertOwnShop(input.siteId, user, null);
  await checkReferences(input, null);
  await refuseImplausible(input);
  const values = await withComputed({ fieldChecks: { visual: [], confirmations: {} }, ...input }, {});
  if (createKey == null) return { row: await insertCase(values, user), replayed: false };
  return insertCaseOnce(values, user, createKeySchema.parse(createKey));
}

const sectionSchemas = { field: fieldReportSchema, teardown: teardownSchema, verdict: verdictSchema } as const;
export const saveSectionSchema = z.object({
  version: z.number().int().positive("Send the version of the case you edited."),
  section: z.enum(["field", "teardown", "verdict"], { message: "Section must be field, teardown or verdict." }),
  data: z.record(z.string().max(64), z.unknown()).refine((d) => Object.keys(d).length <= 200, "Too many fields in one save."),
});

export async function saveSection(current: Case, body: unknown, user: CurrentUser) {
  const { version, section, data } = saveSectionSchema.parse(body);
  assertEditable(section, current, user);
  const parsed = sectionSchemas[section].strict().parse(data) as Record<string, unknown>;
  if (section === "field") assertOwnShop(parsed.siteId as string | null | undefined, user, current);
  await checkReferences(parsed, current);
  const patch = section === "field" ? await withComputed(parsed as FieldReportInput, current) : parsed;
  return updateCase(current.id, version, patch, user, `${section}-saved`);
}

function assertEditable(section: Section, c: Case, user: CurrentUser) {
  if (!canEditSection(section, c.status, user.role))
    throw new HttpError(c.status === "signed" || c.status === "signoff" ? 409 : 403, "not-editable", editRefusal(section, c.status));
}

const findingBody = z.object({ version: z.number().int().positive(), finding: findingSchema });
const findingPatch = z.object({ version: z.number().int().positive(), finding: findingSchema.partial() });

export async function addCaseFinding(c: Case, body: unknown, user: CurrentUser) {
  const { version, finding } = findingBody.parse(body);
  assertEditable("teardown", c, user);
  await checkReferences({}, c, { code: finding.damageCode, current: null });
  return addFinding(c.id, version, finding, user);
}

export async function editCaseFinding(c: Case, findingId: string, body: unknown, user: CurrentUser) {
  const { version, finding } = findingPatch.parse(body);
  assertEditable("teardown", c, user);
  const id = z.string().uuid("That finding was not found.").parse(findingId);
  if (finding.damageCode) await checkReferences({}, c, { code: finding.damageCode, current: await findingCode(c.id, id) });
  return changeFinding(c.id, id, version, finding, user);
}

export async function removeCaseFinding(c: Case, findingId: string, version: number, user: CurrentUser) {
  assertEditable("teardown", c, user);
  return changeFinding(c.id, z.string().uuid().parse(findingId), version, null, user);
}

export const transitionSchema = z.object({
  version: z.number().int().positive("Send the version of the case you are looking at."),
  action: z.enum(["receive", "propose", "sign", "return", "reopen"], { message: "Unknown step." }),
  reason: z.string().trim().max(2000).optional(),
  labSiteId: z.string().uuid().optional(),
});

export async function transitionCase(c: Case, body: unknown, user: CurrentUser) {
  const { version, action, reason, labSiteId } = transitionSchema.parse(body);
  const done = await stepReplay(c, version, action, user);
  if (done) return done;
  const check = checkTransition(
    action as WorkflowAction,
    c.status,
    user.role,
    reason,
    {
      primaryCause: c.primaryCause,
      confidence: c.confidence,
      removalConfirmed: c.removalConfirmed,
      findingCount: action === "propose" ? await countFindings(c.id) : 0,
    },
    { actorId: user.id, proposedBy: c.proposedBy },
  );
  if (!check.ok)
    throw check.status === 400
      ? badRequest(check.message)
      : new HttpError(check.status, check.status === 403 ? "forbidden" : "conflict", check.message);
  if (labSiteId) await checkReferences({ labSiteId }, c);
  const now = new Date();
  const patch: Partial<Case> = { status: check.to };
  if (action === "receive")
    Object.assign(patch, { receivedAt: now, receivedBy: user.id, labSiteId: labSiteId ?? c.labSiteId ?? user.siteId });
  if (action === "propose") Object.assign(patch, { proposedAt: now, proposedBy: user.id, returnReason: null });
  if (action === "sign") Object.assign(patch, { signedAt: now, signedBy: user.id });
  if (action === "return") Object.assign(patch, { returnReason: reason });
  if (action === "reopen") Object.assign(patch, { signedAt: null, signedBy: null });
  return writeStep(c, version, action, patch, user, reason);
}
