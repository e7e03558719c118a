import { composeEmail, type Email } from "./layout";
import { quote } from "./shared-note-email";

/** Sent when a message arrives on a project: to the lead from a client, to the client from staff. */
export function messageEmail(opts: { companyName: string; recipientName: string; projectTitle: string; authorName: string; body: string; url: string }): Email {
  return composeEmail({
    companyName: opts.companyName,
    subject: `${opts.projectTitle}: message from ${opts.authorName}`,
    greetingName: opts.recipientName,
    paragraphs: [`${opts.authorName} wrote on ${opts.projectTitle}:`, quote(opts.body), "Answer on the project's Messages & notes page, so everyone on the project sees it."],
    link: { label: "Open the conversation", url: opts.url },
  });
}
