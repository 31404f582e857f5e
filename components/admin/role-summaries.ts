// One line per role saying what it is for, shown where admins pick a role.
import type { Role } from "@/lib/auth/permissions";

export const ROLE_SUMMARIES: Record<Role, string> = {
  inspector: "Files removals from the shop floor; sees their shop's cases.",
  analyst: "Receives bearings, records teardown findings, proposes verdicts.",
  engineer: "Signs or returns verdicts, links related cases, reopens signed ones.",
  manager: "Reads every case, tallies and life statistics; exports.",
  admin: "Everything, plus people, sites, limits and code lists.",
};
