import { afterAll, describe, expect, it } from "vitest";
import { eq, inArray, sql } from "drizzle-orm";
import type { Runner } from "graphile-worker";
import { db } from "@/db";
import { notices } from "@/db/schema";
import { enqueueNotice } from "@/db/queries/outbox";
import { composeEmail } from "@/lib/mail/layout";
import { startWorker } from "@/server/worker/run";
import { makeTeam, makeUser } from "../support/fixtures";
import { signedIn } from "../support/http";
import { mailTo, setSmtp, waitForMail } from "../support/mail";

async function waitFor<T>(what: string, read: () => Promise<T>, ok: (v: T) => boolean, ms = 30_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await read();
    if (ok(v)) return v;
    if (Date.now() > end) throw new Error(`Gave up waiting for ${what}: ${JSON.stringify(v)}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

const runners: Runner[] = [];
afterAll(async () => {
  await setSmtp(true);
  await Promise.all(runners.map((r) => r.stop()));
});

describe("the outbox", () => {
  it("keeps a notice waiting while SMTP is down, shows it to the lead, and sends it when SMTP returns", async () => {
    const t = await makeTeam("cycling");
    await setSmtp(false);
    try {
      const client = await signedIn(t.client);
      expect((await client.post(`/api/projects/${t.project.id}/messages`, { body: "Is anyone there?" })).status).toBe(201);
      const [row] = await waitFor(
        "a failed attempt",
        () => db().select().from(notices).where(eq(notices.recipientId, t.lead.id)),
        (rows) => rows.length === 1 && rows[0].attempts >= 1,
      );
      expect(row.status).toBe("waiting");
      expect(row.lastError).toBeTruthy();
      const outbox = await (await signedIn(t.lead)).get("/outbox");
      expect(outbox.status).toBe(200);
      expect(outbox.text).toContain(row.subject);
      expect(await mailTo(t.lead.email)).toHaveLength(0);
    } finally {
      await setSmtp(true);
    }
    const mails = await waitForMail(t.lead.email, 1, 45_000);
    expect(mails).toHaveLength(1);
    const [after] = await db().select().from(notices).where(eq(notices.recipientId, t.lead.id));
    expect(after.status).toBe("sent");
    expect(after.sentAt).toBeTruthy();
  }, 90_000);

  it("shows the lead when a held notice will leave", async () => {
    const t = await makeTeam("cycling");
    const email = composeEmail({ companyName: "Fixture Aquaria", subject: "Held for tomorrow", greetingName: t.client.name, paragraphs: ["Later."], link: { label: "Open", url: "http://example.test" } });
    const leaves = new Date(Date.now() + 86_400_000);
    const id = await enqueueNotice(db(), { kind: "stage_change", projectId: t.project.id, recipientId: t.client.id, toEmail: t.client.email, email, sendAfter: leaves });
    try {
      const outbox = await (await signedIn(t.lead)).get("/outbox");
      expect(outbox.status).toBe(200);
      expect(outbox.text).toContain("Held for tomorrow");
      expect(outbox.text).toMatch(/held until \d{1,2} [A-Z][a-z]{2}, \d{2}:\d{2}/);
    } finally {
      await db().update(notices).set({ status: "withdrawn" }).where(eq(notices.id, id!));
    }
  });

  it("never sends a notice twice, even with several workers and duplicate jobs", async () => {
    runners.push(await startWorker({ concurrency: 4, pollInterval: 200 }), await startWorker({ concurrency: 4, pollInterval: 200 }));
    const people = await Promise.all(Array.from({ length: 20 }, () => makeUser("client")));
    const ids = await db().transaction(async (tx) => {
      const out: string[] = [];
      for (const p of people) {
        const email = composeEmail({ companyName: "Fixture Aquaria", subject: "Race check", greetingName: p.name, paragraphs: ["One copy only."], link: { label: "Open", url: "http://example.test" } });
        const id = await enqueueNotice(tx, { kind: "stage_change", recipientId: p.id, toEmail: p.email, email });
        out.push(id!);
        // A second job for the same notice, as a redelivered or duplicated job would be.
        await tx.execute(sql`select graphile_worker.add_job('send_notice', json_build_object('noticeId', ${id}::text))`);
      }
      return out;
    });
    await waitFor(
      "every notice sent",
      () => db().select({ status: notices.status }).from(notices).where(inArray(notices.id, ids)),
      (rows) => rows.every((r) => r.status === "sent"),
    );
    // Let any duplicate job finish before counting.
    await waitFor(
      "the queue to drain",
      async () => (await db().execute(sql`select count(*)::int as n from graphile_worker._private_jobs where payload->>'noticeId' in ${ids}`)).rows[0] as { n: number },
      (r) => r.n === 0,
    );
    for (const p of people) expect(await mailTo(p.email), p.email).toHaveLength(1);
    const rows = await db().select({ attempts: notices.attempts }).from(notices).where(inArray(notices.id, ids));
    expect(rows.every((r) => r.attempts === 1)).toBe(true);
  }, 90_000);
});
