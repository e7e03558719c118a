import { composeEmail, type Email } from "./layout";

export function invitationEmail(opts: { companyName: string; name: string; roleLabel: string; url: string; expiresInDays: number }): Email {
  return composeEmail({
    companyName: opts.companyName,
    subject: `${opts.companyName} invited you to Tankwright`,
    greetingName: opts.name,
    paragraphs: [
      `${opts.companyName} added you to Tankwright as ${opts.roleLabel.toLowerCase()}. Tankwright is where your aquarium project's progress, water tests and photos live.`,
      `Choose a password to get started. The link works once and expires in ${opts.expiresInDays} days.`,
    ],
    link: { label: "Set your password", url: opts.url },
  });
}
