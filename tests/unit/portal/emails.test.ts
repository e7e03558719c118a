import { describe, expect, it } from "vitest";
import { stageChangeEmail } from "@/lib/mail/stage-change-email";
import { sharedNoteEmail, quote } from "@/lib/mail/shared-note-email";
import { messageEmail } from "@/lib/mail/message-email";

const base = { companyName: "Fixture Aquaria", recipientName: "Nell", projectTitle: "Hall <reef>", url: "http://app.test/projects/p1" };

describe("stage-change e-mail", () => {
  it("names the project and new stage, links to the project, and escapes HTML", () => {
    const mail = stageChangeEmail({ ...base, forClient: true, fromStage: "cycling", toStage: "first_stocking", byName: "Maren", override: false, reason: null });
    expect(mail.subject).toBe("Hall <reef>: now in First stocking");
    expect(mail.text).toContain("has moved on from Cycling to First stocking");
    expect(mail.text).toContain("What this stage means: Fish go in");
    expect(mail.text).toContain("Open the project: http://app.test/projects/p1");
    expect(mail.html).toContain("Hall &lt;reef&gt;");
    expect(mail.html).not.toContain("<reef>");
    expect(mail.text).toContain("Fixture Aquaria");
  });

  it("says when the card went back, and gives the lead's override reason", () => {
    const back = stageChangeEmail({ ...base, forClient: false, fromStage: "cycling", toStage: "fill_leak_test", byName: "Teo", override: false, reason: "Slow drip at the bulkhead." });
    expect(back.text).toContain("moved back from Cycling to Fill & leak test");
    expect(back.text).toContain("Reason given: Slow drip at the bulkhead.");
    expect(back.text).not.toContain("What this stage means");
    const pass = stageChangeEmail({ ...base, forClient: true, fromStage: "stand_load_check", toStage: "aquascape", byName: "Maren", override: true, reason: "Letter on file." });
    expect(pass.text).toContain("passed this step's check by decision: Letter on file.");
  });
});

describe("note and message e-mail", () => {
  it("quotes the text, cutting very long ones", () => {
    expect(quote("  hi  ")).toBe("“hi”");
    expect(quote("x".repeat(2000), 10)).toBe(`“${"x".repeat(9)}…”`);
    const note = sharedNoteEmail({ ...base, authorName: "Maren", body: "Rock is in." });
    expect(note.subject).toBe("Hall <reef>: a new note from Maren");
    expect(note.text).toContain("“Rock is in.”");
    const msg = messageEmail({ ...base, authorName: "Nell", body: "Is cloudy water normal?" });
    expect(msg.subject).toBe("Hall <reef>: message from Nell");
    expect(msg.text).toContain("http://app.test/projects/p1");
  });
});
