import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { attachments } from "@/db/schema";
import { env } from "@/env";
import { getObjectBytes, s3 } from "@/server/storage";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn, type Session } from "../support/http";

const png = () => sharp({ create: { width: 64, height: 48, channels: 3, background: "#2f82c4" } }).png().toBuffer();

async function storedKeys(projectId: string): Promise<string[]> {
  const res = await s3().send(new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: `projects/${projectId}/` }));
  return (res.Contents ?? []).map((o) => o.Key!);
}

async function start(s: Session, projectId: string, body: Record<string, unknown>) {
  return s.post(`/api/projects/${projectId}/uploads`, { stage: "aquascape", ...body });
}

describe("uploads", () => {
  it("refuses a disallowed type, an oversized file and a crafted name, storing nothing", async () => {
    const t = await makeTeam("aquascape");
    const s = await signedIn(t.crew);
    const exe = await start(s, t.project.id, { fileName: "setup.exe", contentType: "application/x-msdownload", sizeBytes: 2000 });
    expect(exe.status).toBe(400);
    expect(exe.json.fields.contentType).toMatch(/JPEG, PNG, WebP or HEIC photos and PDF/);
    const big = await start(s, t.project.id, { fileName: "huge.jpg", contentType: "image/jpeg", sizeBytes: 40 * 1024 * 1024 });
    expect(big.status).toBe(400);
    expect(big.json.fields.sizeBytes).toMatch(/limit is 15 MB/);
    const crafted = await start(s, t.project.id, { fileName: "photo\u0000.jpg\r\n", contentType: "image/jpeg", sizeBytes: 2000 });
    expect(crafted.status).toBe(400);
    expect(crafted.json.fields.fileName).toMatch(/control characters/);

    const form = new FormData();
    form.set("file", new File([new TextEncoder().encode("MZ not really a picture")], "holiday.png", { type: "image/png" }));
    form.set("stage", "aquascape");
    const fake = await s.request("POST", `/api/projects/${t.project.id}/uploads`, form);
    expect(fake.status).toBe(422);
    expect(fake.json.error).toMatch(/don't match its type/);

    expect(await db().select().from(attachments).where(eq(attachments.projectId, t.project.id))).toHaveLength(0);
    expect(await storedKeys(t.project.id)).toEqual([]);
  });

  it("stores a photo through a presigned upload, and shows it only to the project's people", async () => {
    const t = await makeTeam("aquascape");
    const bytes = await png();
    const crew = await signedIn(t.crew);
    const started = await start(crew, t.project.id, { fileName: "../../etc/scape final.png", contentType: "image/png", sizeBytes: bytes.byteLength, caption: "Left rock pile" });
    expect(started.status).toBe(201);
    expect(started.json.attachment.fileName).toBe("scape final.png");
    expect(started.json.attachment.status).toBe("pending");

    const put = await fetch(started.json.uploadUrl, { method: "PUT", headers: started.json.uploadHeaders, body: new Uint8Array(bytes) });
    expect(put.status).toBe(200);
    const done = await crew.post(started.json.completeUrl);
    expect(done.status).toBe(200);
    expect(done.json.status).toBe("ready");

    const [row] = await db().select().from(attachments).where(eq(attachments.id, started.json.attachment.id));
    expect(row.key).toMatch(new RegExp(`^projects/${t.project.id}/[0-9a-f-]{36}$`));
    // Photos are stored re-encoded: the same picture, without anything appended or its metadata.
    const stored = await sharp(Buffer.from(await getObjectBytes(row.key))).metadata();
    expect([stored.format, stored.width, stored.height]).toEqual(["png", 64, 48]);
    const thumb = await sharp(Buffer.from(await getObjectBytes(row.thumbKey!))).metadata();
    expect(thumb.format).toBe("webp");

    for (const who of [t.lead, t.crew, t.client]) {
      const res = await (await signedIn(who)).get(`/api/attachments/${row.id}?variant=full`);
      expect(res.status, who.role).toBe(200);
      expect(res.headers.get("content-type")).toBe("image/png");
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("content-disposition")).toMatch(/^inline; filename="scape final.png"/);
      const served = await sharp(Buffer.from(await (await (await signedIn(who)).raw(`/api/attachments/${row.id}?variant=full`)).arrayBuffer())).metadata();
      expect([served.format, served.width, served.height]).toEqual(["png", 64, 48]);
    }
    for (const who of [t.otherCrew, t.otherClient]) {
      expect((await (await signedIn(who)).get(`/api/attachments/${row.id}?variant=thumb`)).status, who.role).toBe(404);
    }
    expect((await anonymous().get(`/api/attachments/${row.id}`)).status).toBe(401);

    // The gallery page: the project's people see the photo; others get the not-found page.
    for (const who of [t.lead, t.crew, t.client]) {
      const page = await (await signedIn(who)).get(`/projects/${t.project.id}/photos`);
      expect(page.status, who.role).toBe(200);
      expect(page.text).toContain("Left rock pile");
    }
    for (const who of [t.otherCrew, t.otherClient]) {
      const page = await (await signedIn(who)).get(`/projects/${t.project.id}/photos`);
      expect(page.status, who.role).toBe(404);
      expect(page.text).not.toContain("Left rock pile");
    }
    // The install day is for the lead and crew only.
    expect((await (await signedIn(t.client)).get(`/projects/${t.project.id}/install`)).status).toBe(404);
    expect((await (await signedIn(t.crew)).get(`/projects/${t.project.id}/install`)).status).toBe(200);
  });

  it("refuses to finish an upload whose bytes never arrived or don't match", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const started = await start(crew, t.project.id, { fileName: "a.jpg", contentType: "image/jpeg", sizeBytes: 24 });
    expect((await crew.post(started.json.completeUrl)).status).toBe(409);
    await fetch(started.json.uploadUrl, { method: "PUT", headers: started.json.uploadHeaders, body: new TextEncoder().encode("this is text, not a JPEG") });
    const res = await crew.post(started.json.completeUrl);
    expect(res.status).toBe(422);
    const [row] = await db().select().from(attachments).where(eq(attachments.id, started.json.attachment.id));
    expect(row.status).toBe("pending");
    // The refused object is gone from the bucket at once.
    expect(await storedKeys(t.project.id)).toEqual([]);
    expect((await crew.get(`/api/attachments/${row.id}`)).status).toBe(404);
  });

  it("takes a client's problem photo on the project's current stage, and refuses other clients", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    const form = new FormData();
    form.set("file", new File([new Uint8Array(await png())], "cloudy water.png", { type: "image/png" }));
    form.set("stage", "cycling");
    form.set("caption", "Water looks cloudy");
    const res = await client.request("POST", `/api/projects/${t.project.id}/uploads`, form);
    expect(res.status).toBe(201);
    expect(res.json.attachment.isProblem).toBe(true);
    expect(res.json.attachment.stage).toBe("cycling");
    const other = await (await signedIn(t.otherClient)).post(`/api/projects/${t.project.id}/uploads`, { fileName: "x.png", contentType: "image/png", sizeBytes: 10, stage: "cycling", isProblem: true });
    expect(other.status).toBe(404);
  });
});
