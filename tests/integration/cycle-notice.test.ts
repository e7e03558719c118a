import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { notices, projects } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { hoursAgo, nearlyCycled } from "./water-support";
import { mailTo, waitForMail } from "../support/mail";

const zero = (h: number) => ({ takenAt: hoursAgo(h).toISOString(), ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL: 40, pH: 7.6, temperature: 25, temperatureUnit: "C" });

describe("the cycle-ready notice", () => {
  it("e-mails the lead and the client once, when the gate first opens", async () => {
    const t = await makeTeam("cycling");
    await nearlyCycled(t.project.id, t.crew.id, 30);
    const crew = await signedIn(t.crew);
    const url = `/api/projects/${t.project.id}/water-tests`;

    // Six hours after the first zero: not yet far enough apart.
    const early = await crew.post(url, zero(24));
    expect(early.status).toBe(201);
    expect(early.json.cycleReadyNotified).toBe(false);

    const opening = await crew.post(url, zero(1));
    expect(opening.status).toBe(201);
    expect(opening.json.cycleReadyNotified).toBe(true);

    const [leadMail] = await waitForMail(t.lead.email);
    const [clientMail] = await waitForMail(t.client.email);
    expect(leadMail.subject).toContain(t.project.title);
    expect(leadMail.text).toContain(`/projects/${t.project.id}/water`);
    expect(leadMail.html).toContain(`/projects/${t.project.id}/water`);
    expect(clientMail.text).toMatch(/finished cycling/);

    // More zero readings later, from anyone, send nothing more.
    const later = await (await signedIn(t.client)).post(url, zero(0.5));
    expect(later.json.cycleReadyNotified).toBe(false);
    await crew.post(url, zero(0.1));

    const queued = await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.kind, "cycle_ready")));
    expect(queued.map((n) => n.toEmail).sort()).toEqual([t.lead.email, t.client.email].sort());
    const [p] = await db().select().from(projects).where(eq(projects.id, t.project.id));
    expect(p.cycleReadyNotifiedAt).not.toBeNull();
    // Give the worker time to send anything a second notice might have queued.
    await waitForAllSent(t.project.id);
    expect(await mailTo(t.lead.email)).toHaveLength(1);
    expect(await mailTo(t.client.email)).toHaveLength(1);
    expect(await mailTo(t.crew.email)).toHaveLength(0);
  });

  it("lets a project that goes back into cycling be announced again", async () => {
    const t = await makeTeam("cycling");
    await db().update(projects).set({ cycleReadyNotifiedAt: new Date() }).where(eq(projects.id, t.project.id));
    const lead = await signedIn(t.lead);
    const back = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "fill_leak_test", version: t.project.version, reason: "Refilling after a seal repair" });
    expect(back.status).toBe(200);
    const again = await lead.post(`/api/projects/${t.project.id}/move`, {
      toStage: "cycling",
      version: back.json.version,
      overrideReason: "Leak re-checked on site after the repair",
    });
    expect(again.status).toBe(200);
    const [p] = await db().select().from(projects).where(eq(projects.id, t.project.id));
    expect(p.stage).toBe("cycling");
    expect(p.cycleReadyNotifiedAt).toBeNull();
  });

  it("sends nothing while the gate is still shut", async () => {
    const t = await makeTeam("cycling");
    const res = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/water-tests`, { ...zero(1), ammoniaMgL: 2 });
    expect(res.json.cycleReadyNotified).toBe(false);
    const [p] = await db().select().from(projects).where(eq(projects.id, t.project.id));
    expect(p.cycleReadyNotifiedAt).toBeNull();
  });
});

async function waitForAllSent(projectId: string) {
  for (let i = 0; i < 80; i++) {
    const rows = await db().select({ status: notices.status }).from(notices).where(eq(notices.projectId, projectId));
    if (rows.every((r) => r.status === "sent")) return;
    await new Promise((r) => setTimeout(r, 250));
  }
}
