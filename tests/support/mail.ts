/** Reads what the local mail catcher received. */
export type CaughtMail = { id: number; to: string[]; subject: string; text: string; html: string };

const url = () => {
  const u = process.env.MAIL_CATCHER_URL;
  if (!u) throw new Error("MAIL_CATCHER_URL is not set; run the tests with npm test.");
  return u;
};

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const res = await fetch(`${url()}/api/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as CaughtMail[];
}

/** Waits until `address` has at least `count` messages, or fails after `ms`. */
export async function waitForMail(address: string, count = 1, ms = 20_000): Promise<CaughtMail[]> {
  const end = Date.now() + ms;
  for (;;) {
    const mails = await mailTo(address);
    if (mails.length >= count) return mails;
    if (Date.now() > end) throw new Error(`Expected ${count} e-mail(s) to ${address}; got ${mails.length}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export async function setSmtp(running: boolean) {
  await fetch(`${url()}/api/smtp/${running ? "start" : "stop"}`, { method: "POST" });
}
