import { describe, expect, it } from "vitest";
import { cycleReadyEmail } from "@/lib/mail/cycle-ready-email";
import { escapeHtml } from "@/lib/mail/escape";
import { invitationEmail } from "@/lib/mail/invitation-email";
import { composeEmail } from "@/lib/mail/layout";

describe("e-mail layout", () => {
  it("the plain-text part reads greeting, paragraphs, link, company and footer in that order", () => {
    const mail = composeEmail({
      companyName: "Invented Reefworks",
      subject: "A subject",
      greetingName: "Ada",
      paragraphs: ["First.", "Second."],
      link: { label: "Open it", url: "https://app.invalid/x" },
    });
    expect(mail.subject).toBe("A subject");
    expect(mail.text).toBe(
      [
        "Hello Ada,",
        "",
        "First.",
        "",
        "Second.",
        "",
        "Open it: https://app.invalid/x",
        "",
        "— Invented Reefworks",
        "",
        "You get this e-mail because you work with Invented Reefworks on an aquarium project.",
      ].join("\n"),
    );
    expect(mail.html).toContain("<p>Hello Ada,</p>");
    expect(mail.html).toContain('<p style="line-height:1.5">First.</p>\n<p style="line-height:1.5">Second.</p>');
    expect(mail.html).toContain('<a href="https://app.invalid/x"');
  });

  it("uses a given footer and escapes every piece of the HTML part", () => {
    const mail = composeEmail({
      companyName: "A&B <Tanks>",
      subject: "s",
      greetingName: '"Jo"',
      paragraphs: ["1 < 2 & it's fine"],
      link: { label: "<b>go</b>", url: "https://app.invalid/?a=1&b=2" },
      footer: "Footer <here>",
    });
    expect(mail.text.endsWith("\nFooter <here>")).toBe(true);
    expect(mail.html).toContain("A&amp;B &lt;Tanks&gt;");
    expect(mail.html).toContain("<p>Hello &quot;Jo&quot;,</p>");
    expect(mail.html).toContain("1 &lt; 2 &amp; it&#39;s fine");
    expect(mail.html).toContain('href="https://app.invalid/?a=1&amp;b=2"');
    expect(mail.html).toContain("&lt;b&gt;go&lt;/b&gt;");
    expect(mail.html).toContain("Footer &lt;here&gt;");
  });

  it("escapes the five HTML-special characters and nothing else", () => {
    expect(escapeHtml(`&<>"'a/`)).toBe("&amp;&lt;&gt;&quot;&#39;a/");
  });
});

describe("invitation and cycle-ready e-mails", () => {
  it("an invitation names the company, the role and how long the link lasts", () => {
    const mail = invitationEmail({ companyName: "Invented Reefworks", name: "Ada", roleLabel: "Crew", url: "https://app.invalid/i", expiresInDays: 7 });
    expect(mail.subject).toBe("Invented Reefworks invited you to Tankwright");
    expect(mail.text).toContain(
      "Invented Reefworks added you to Tankwright as crew. Tankwright is where your aquarium project's progress, water tests and photos live.",
    );
    expect(mail.text).toContain("Choose a password to get started. The link works once and expires in 7 days.");
    expect(mail.text).toContain("Set your password: https://app.invalid/i");
  });

  it("the client's cycle-ready e-mail speaks plainly; the team's names the gate", () => {
    const base = { companyName: "Invented Reefworks", name: "Ada", projectTitle: "Lounge reef", url: "https://app.invalid/p" };
    const client = cycleReadyEmail({ ...base, forClient: true });
    expect(client.subject).toBe("Lounge reef: the tank has cycled");
    expect(client.text).toContain(
      "Good news about Lounge reef: the tank has finished cycling. Ammonia and nitrite have read zero on repeat tests, so the filter's bacteria are established.",
    );
    expect(client.text).toContain("Fish can now go in, a few at a time, with a water test after each batch. We'll be in touch to plan the first batch.");
    expect(client.text).toContain("See the water tests: https://app.invalid/p");
    const team = cycleReadyEmail({ ...base, forClient: false });
    expect(team.text).toContain(
      "Lounge reef has passed the cycle gate: ammonia and nitrite read zero on repeat tests under the company's cycle rules.",
    );
    expect(team.text).toContain("The project can move into first stocking. Add fish in small batches and re-test before each new batch.");
  });
});
