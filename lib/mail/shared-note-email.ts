import { composeEmail, type Email } from "./layout";

/** Sent to the client when the lead shares a note on their project. */
export function sharedNoteEmail(opts: { companyName: string; recipientName: string; projectTitle: string; authorName: string; body: string; url: string }): Email {
  return composeEmail({
    companyName: opts.companyName,
    subject: `${opts.projectTitle}: a new note from ${opts.authorName}`,
    greetingName: opts.recipientName,
    paragraphs: [`${opts.authorName} shared a note on ${opts.projectTitle}:`, quote(opts.body)],
    link: { label: "Read it on your project", url: opts.url },
  });
}

/** Long notes are cut in the e-mail; the whole text is one click away. */
export function quote(body: string, max = 1200): string {
  const t = body.trim();
  return `“${t.length > max ? t.slice(0, max - 1) + "…" : t}”`;
}
