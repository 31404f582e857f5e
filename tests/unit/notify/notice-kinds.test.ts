import { describe, expect, it } from "vitest";
import { mergeNoticePrefs, noticeKindsFor, pickRecipients, wantsNotice, type NoticeCandidate } from "@/lib/notify/notice-kinds";

const person = (id: string, role: string, noticePrefs: Record<string, boolean> = {}, banned = false): NoticeCandidate => ({
  id,
  email: `${id}@example.test`,
  role,
  noticePrefs,
  banned,
});

describe("notice kinds", () => {
  it("offers the sign-off notice to engineers only and the digest not to inspectors", () => {
    expect(noticeKindsFor("engineer").map((k) => k.kind)).toContain("signoff-requested");
    expect(noticeKindsFor("analyst").map((k) => k.kind)).not.toContain("signoff-requested");
    expect(noticeKindsFor("inspector").map((k) => k.kind)).not.toContain("digest");
    expect(noticeKindsFor("manager").map((k) => k.kind)).toEqual(["digest"]);
  });

  it("treats a missing switch as on and false as off", () => {
    expect(wantsNotice(person("a", "analyst"), "verdict-signed")).toBe(true);
    expect(wantsNotice(person("a", "analyst", { "verdict-signed": false }), "verdict-signed")).toBe(false);
    expect(wantsNotice(person("a", "analyst", { "verdict-signed": true }), "verdict-signed")).toBe(true);
    // A kind not meant for the role is never sent, whatever the stored switch says.
    expect(wantsNotice(person("m", "manager", { "signoff-requested": true }), "signoff-requested")).toBe(false);
  });
});

describe("pickRecipients", () => {
  it("drops people who switched the notice off, banned people and the person who acted", () => {
    const people = [
      person("e1", "engineer"),
      person("e2", "engineer", { "signoff-requested": false }),
      person("e3", "engineer", {}, true),
      person("e4", "engineer"),
    ];
    expect(pickRecipients(people, "signoff-requested", "e4")).toEqual(["e1@example.test"]);
  });

  it("lists an address once when the same person filed and proposed", () => {
    const admin = person("ad", "admin");
    expect(pickRecipients([admin, admin], "verdict-signed", "someone-else")).toEqual(["ad@example.test"]);
  });
});

describe("mergeNoticePrefs", () => {
  it("keeps earlier switches, applies the change and forgets unknown kinds", () => {
    const merged = mergeNoticePrefs({ digest: false, "old-kind": false }, { "verdict-signed": false, digest: true });
    expect(merged).toEqual({ digest: true, "verdict-signed": false });
  });
});
