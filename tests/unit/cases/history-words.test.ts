import { describe, expect, it } from "vitest";
import { actionWords, fieldWords } from "@/components/case/history-list";

describe("history in plain words", () => {
  it("names every step, photos included, and never shows a raw event name", () => {
    expect(actionWords("photo-added")).toBe("added a photo");
    expect(actionWords("photo-tagged")).toBe("tagged a photo");
    expect(actionWords("sign")).toBe("signed the verdict");
    expect(actionWords("something-new")).toBe("something new");
  });

  it("names the fields people read", () => {
    expect(fieldWords("primaryCause")).toBe("primary cause");
    expect(fieldWords("signedContentHash")).toBe("signed content (SHA-256)");
    expect(fieldWords("teardownNotes")).toBe("teardown notes");
    expect(fieldWords("finding cone-inboard")).toBe("finding on cone, inboard");
  });
});
