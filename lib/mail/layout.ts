import { escapeHtml } from "./escape";

export type Email = { subject: string; text: string; html: string };

/**
 * Every e-mail has the same shape: a greeting, a few plain paragraphs, one link into the app, and
 * the company's name. Built from that, the plain-text and HTML parts always say the same thing.
 */
export function composeEmail(opts: {
  companyName: string;
  subject: string;
  greetingName: string;
  paragraphs: string[];
  link: { label: string; url: string };
  footer?: string;
}): Email {
  const { companyName, subject, greetingName, paragraphs, link } = opts;
  const footer = opts.footer ?? `You get this e-mail because you work with ${companyName} on an aquarium project.`;
  const text = [`Hello ${greetingName},`, "", ...paragraphs.flatMap((p) => [p, ""]), `${link.label}: ${link.url}`, "", `— ${companyName}`, "", footer].join("\n");
  const html = `<!doctype html><html><body style="margin:0;background:#f4f1ea;font-family:system-ui,sans-serif;color:#1d2b2a">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#0f5e5a;margin:0 0 16px">${escapeHtml(companyName)}</p>
<div style="background:#fff;border-radius:12px;padding:24px">
<p>Hello ${escapeHtml(greetingName)},</p>
${paragraphs.map((p) => `<p style="line-height:1.5">${escapeHtml(p)}</p>`).join("\n")}
<p style="margin:24px 0"><a href="${escapeHtml(link.url)}" style="background:#0f5e5a;color:#fff;padding:10px 16px;border-radius:8px;text-decoration:none">${escapeHtml(link.label)}</a></p>
</div>
<p style="font-size:12px;color:#5b6766">${escapeHtml(footer)}</p>
</div></body></html>`;
  return { subject, text, html };
}
