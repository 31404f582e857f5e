import { describe, expect, test } from "vitest";
import { HIDDEN_CASE, linkedNumbers, maskUnreadableLinks } from "../../../lib/cases/history-view";

const events = [
  { action: "linked", changes: [{ field: "related", from: null, to: "TL-26-00001" }], reason: "Same lot as the other case" },
  { action: "unlinked", changes: [{ field: "related", from: "TL-26-00002", to: null }], reason: null },
  { action: "field-saved", changes: [{ field: "fieldNotes", from: "TL-26-00003", to: "x" }], reason: null },
];

describe("history lines that name another case", () => {
  test("only link lines are searched for case numbers", () => {
    expect(linkedNumbers(events).sort()).toEqual(["TL-26-00001", "TL-26-00002"]);
  });

  test("a number the reader may not read is masked with its note; others stay as they are", () => {
    const out = maskUnreadableLinks(events, new Set(["TL-26-00002"]));
    expect(out[0]).toEqual({ action: "linked", changes: [{ field: "related", from: null, to: HIDDEN_CASE }], reason: null });
    expect(out[1]).toBe(events[1]);
    expect(out[2]).toBe(events[2]);
    expect(JSON.stringify(out)).not.toContain("TL-26-00001");
    expect(JSON.stringify(out)).not.toContain("Same lot");
  });
});
