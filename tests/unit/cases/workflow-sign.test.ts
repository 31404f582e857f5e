import { describe, expect, it } from "vitest";
import { checkTransition } from "@/lib/cases/workflow";

const verdict = { primaryCause: "end-of-life", confidence: "confirmed", removalConfirmed: "confirmed", findingCount: 1 } as never;

describe("who may sign", () => {
  it("refuses the person who proposed the verdict, even an admin", () => {
    const r = checkTransition("sign", "signoff", "admin", undefined, verdict, { actorId: "u1", proposedBy: "u1" });
    expect(r).toEqual({ ok: false, status: 403, message: "You proposed this verdict, so another engineer or an admin must sign it." });
  });
  it("lets a second person sign", () => {
    expect(checkTransition("sign", "signoff", "engineer", undefined, verdict, { actorId: "u2", proposedBy: "u1" })).toEqual({
      ok: true,
      to: "signed",
    });
    expect(checkTransition("sign", "signoff", "admin", undefined, verdict, { actorId: "u2", proposedBy: "u1" })).toEqual({
      ok: true,
      to: "signed",
    });
  });
  it("leaves other steps to the proposer", () => {
    expect(checkTransition("return", "signoff", "admin", "Needs cone photos.", verdict, { actorId: "u1", proposedBy: "u1" })).toEqual({
      ok: true,
      to: "bench",
    });
  });
});
