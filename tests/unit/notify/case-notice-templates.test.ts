import { describe, expect, it } from "vitest";
import { caseReopened, signoffRequested, verdictReturned, verdictSigned } from "@/lib/mail/templates/case-notices";

const url = "https://tearline.example/cases/TL-26-00042";

describe("case notice e-mails", () => {
  it("give every notice a subject with the case number and the link in both parts", () => {
    const mails = [
      signoffRequested({
        caseNumber: "TL-26-00042",
        url,
        analystName: "Priya Raman",
        primaryCauseLabel: "Water ingress",
        trigger: "Hand roll",
      }),
      verdictSigned({
        caseNumber: "TL-26-00042",
        url,
        signerName: "Tomasz Wielgus",
        primaryCauseLabel: "Water ingress",
        confidence: "Confirmed",
      }),
      verdictReturned({
        caseNumber: "TL-26-00042",
        url,
        returnedBy: "Tomasz Wielgus",
        reason: "Photograph the seal lip",
        primaryCauseLabel: "Seal",
      }),
      caseReopened({ caseNumber: "TL-26-00042", url, reopenedBy: "Tomasz Wielgus", reason: "New lab result" }),
    ];
    for (const m of mails) {
      expect(m.subject).toContain("TL-26-00042");
      expect(m.text).toContain(url);
      expect(m.html).toContain(`href="${url}"`);
    }
  });

  it("carries the return reason, escaped in HTML and plain in text", () => {
    const m = verdictReturned({
      caseNumber: "TL-26-00042",
      url,
      returnedBy: "T. W.",
      reason: "Seal <lip> & casing not shown",
      primaryCauseLabel: "Seal",
    });
    expect(m.text).toContain("Seal <lip> & casing not shown");
    expect(m.html).toContain("Seal &lt;lip&gt; &amp; casing not shown");
    expect(m.html).not.toContain("<lip>");
  });
});
