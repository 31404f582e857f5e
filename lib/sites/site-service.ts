// Sites (shops and labs) with their end-play policy: the pickers' short list, the forms' options,
// and the admin's add, edit and delete (a site in use is never deleted; it is marked inactive).
import "server-only";
import {
  deleteSite,
  findSiteByCode,
  getSite,
  insertSite,
  listSiteChoices,
  listSites,
  siteUsage,
  siteUsageCounts,
  updateSite,
} from "@/db/queries/sites";
import { siteNameOf } from "@/db/queries/profile";
import { siteOptions } from "@/db/queries/site-options";
import type { CurrentUser } from "@/lib/auth/session";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";
import { DEFAULT_PLAUSIBLE_MAX_IN } from "@/lib/field/plausibility";
import { badRequest, conflict, notFound } from "@/lib/http/errors";
import { audit } from "@/lib/security/audit";
import { policyOrderProblems, type SiteCreateInput, type SitePatchInput } from "@/lib/validation/site";

/** Every site, for pickers: id, code, name, kind, no policy details. */
export async function siteChoices() {
  return listSiteChoices();
}

export type SiteChoice = Awaited<ReturnType<typeof siteChoices>>[number];

/** Active sites with their end-play policy, for the removal form. */
export async function siteFormOptions() {
  return siteOptions();
}

/** The name of a person's home site, or null without one. */
export async function siteName(siteId: string | null): Promise<string | null> {
  return siteNameOf(siteId);
}

/** Every site with its policy and how many cases and people use it (for admins). */
export async function sitesWithUsage() {
  const [rows, usage] = await Promise.all([listSites(), siteUsageCounts()]);
  return rows.map((s) => ({ ...s, usage: usage.get(s.id) ?? { cases: 0, users: 0 } }));
}

export async function addSite(input: SiteCreateInput, user: CurrentUser, headers: Headers) {
  if (await findSiteByCode(input.code))
    throw conflict(`A site with the code ${input.code} already exists.`, { fields: { code: "This code is taken." } });
  const order = policyOrderProblems({
    endPlayMaxIn: input.endPlayMaxIn ?? DEFAULT_END_PLAY_POLICY.maxIn,
    plausibleMaxIn: input.plausibleMaxIn ?? DEFAULT_PLAUSIBLE_MAX_IN,
  });
  if (order.plausibleMaxIn) throw badRequest(order.plausibleMaxIn, { fields: order });
  const site = await insertSite(input);
  await audit("site-policy", user, { subject: input.code, headers, detail: { action: "add" } });
  return site;
}

export async function editSite(id: string, input: SitePatchInput, user: CurrentUser, headers: Headers) {
  const site = await getSite(id);
  if (!site) throw notFound("That site");
  if (input.code && input.code !== site.code && (await findSiteByCode(input.code))) {
    throw conflict(`A site with the code ${input.code} already exists.`, { fields: { code: "This code is taken." } });
  }
  const order = policyOrderProblems({
    endPlayMaxIn: input.endPlayMaxIn ?? site.endPlayMaxIn,
    plausibleMaxIn: input.plausibleMaxIn ?? site.plausibleMaxIn,
  });
  if (order.plausibleMaxIn) throw badRequest(order.plausibleMaxIn, { fields: order });
  const updated = await updateSite(id, input);
  await audit("site-policy", user, { subject: site.code, headers, detail: { changed: Object.keys(input) } });
  return updated;
}

/** Only a site no case, person or invitation names; otherwise 409 saying what uses it. */
export async function removeSite(id: string) {
  const site = await getSite(id);
  if (!site) throw notFound("That site");
  const usage = await siteUsage(id);
  const uses = [
    usage.cases && `${usage.cases} ${usage.cases === 1 ? "case" : "cases"}`,
    usage.users && `${usage.users} ${usage.users === 1 ? "person" : "people"}`,
    usage.invitations && `${usage.invitations} ${usage.invitations === 1 ? "invitation" : "invitations"}`,
  ].filter(Boolean);
  if (uses.length) {
    throw conflict(`${site.code} is used by ${uses.join(", ")}, so it cannot be deleted. Mark it inactive instead.`, { usage });
  }
  try {
    await deleteSite(id);
  } catch (err) {
    // A case filed between the check and the delete still holds the site (foreign key).
    const pgCode = (err as { code?: string; cause?: { code?: string } }).cause?.code ?? (err as { code?: string }).code;
    if (pgCode === "23503") throw conflict(`${site.code} came into use just now; mark it inactive instead.`);
    throw err;
  }
}
