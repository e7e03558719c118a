import { composeEmail, type Email } from "./layout";

/** What Tankwright is for, in the words of the person invited. */
const PURPOSE: Record<string, string> = {
  client: "Tankwright is where your aquarium project's progress, water tests and photos live.",
  crew: "Tankwright holds the installs you are assigned to: the board, each day's checklists, fill and leak checks, water tests and photos, on your phone or a desktop.",
  lead: "Tankwright is where the company runs its installs: the board, surveys and load checks, crew checklists, cycling and the client portal.",
};

export function invitationEmail(opts: { companyName: string; name: string; roleLabel: string; url: string; expiresInDays: number; role?: string }): Email {
  const role = opts.role ?? opts.roleLabel.toLowerCase();
  return composeEmail({
    companyName: opts.companyName,
    subject: role === "crew" ? `${opts.companyName} added you to its install crew on Tankwright` : `${opts.companyName} invited you to Tankwright`,
    greetingName: opts.name,
    paragraphs: [
      `${opts.companyName} added you to Tankwright as ${opts.roleLabel.toLowerCase()}. ${PURPOSE[role] ?? PURPOSE.client}`,
      `Choose a password to get started. The link works once and expires in ${opts.expiresInDays} days.`,
    ],
    link: { label: "Set your password", url: opts.url },
  });
}
