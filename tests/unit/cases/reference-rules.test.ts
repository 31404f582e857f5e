import { describe, expect, test } from "vitest";
import { codeProblem, siteProblem } from "../../../lib/cases/reference-rules";

const states = {
  trigger: new Map([
    ["hand-roll", false],
    ["old-alarm", true],
  ]),
  cause: new Map([["water-ingress", false]]),
  damage: new Map<string, boolean>(),
};

describe("codes a save names", () => {
  test("a current code passes; an unknown one is named with its list", () => {
    expect(codeProblem([{ list: "trigger", field: "trigger", code: "hand-roll", current: [] }], states)).toBeNull();
    expect(codeProblem([{ list: "cause", field: "primaryCause", code: "gremlins", current: [] }], states)).toEqual({
      field: "primaryCause",
      message: "“gremlins” is not in the list of root causes; choose one from the list.",
    });
  });

  test("a retired code is refused on new data and kept where the case already has it", () => {
    expect(codeProblem([{ list: "trigger", field: "trigger", code: "old-alarm", current: [] }], states)?.message).toMatch(/retired/);
    expect(codeProblem([{ list: "trigger", field: "trigger", code: "old-alarm", current: ["old-alarm"] }], states)).toBeNull();
  });

  test("the first problem wins, in the order the fields were given", () => {
    const p = codeProblem(
      [
        { list: "trigger", field: "trigger", code: "hand-roll", current: [] },
        { list: "damage", field: "finding.damageCode", code: "x", current: [] },
        { list: "cause", field: "primaryCause", code: "y", current: [] },
      ],
      states,
    );
    expect(p?.field).toBe("finding.damageCode");
  });
});

describe("sites a save names", () => {
  test("an id with no site is refused in the words of its field", () => {
    const kinds = new Map([["a", "car-shop"]]);
    expect(siteProblem([{ field: "siteId", id: "a" }], kinds)).toBeNull();
    expect(siteProblem([{ field: "siteId", id: "b" }], kinds)?.message).toBe("That removal site does not exist; choose one from the list.");
    expect(siteProblem([{ field: "labSiteId", id: "b" }], kinds)?.message).toBe("That lab does not exist; choose one from the list.");
  });
});
