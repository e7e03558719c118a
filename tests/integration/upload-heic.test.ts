import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { readFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { attachments } from "@/db/schema";
import { env } from "@/env";
import { getObjectBytes, s3 } from "@/server/storage";
import { makeProject, makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";

/** A 160 × 120 HEIC photo made with libheif's heif-enc (x265), as an iPhone would send it. */
const HEIC = new Uint8Array(readFileSync(new URL("../fixtures/tank-160x120.heic", import.meta.url)));

async function storedKeys(projectId: string): Promise<string[]> {
  const res = await s3().send(new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: `projects/${projectId}/` }));
  return (res.Contents ?? []).map((o) => o.Key!);
}

async function rows(projectId: string) {
  return db().select().from(attachments).where(eq(attachments.projectId, projectId));
}

function send(s: Session, projectId: string, bytes: Uint8Array, name: string, type: string, extra: Record<string, string> = {}) {
  const form = new FormData();
  form.set("file", new File([bytes as BlobPart], name, { type }));
  form.set("stage", "aquascape");
  for (const [k, v] of Object.entries(extra)) form.set(k, v);
  return s.request("POST", `/api/projects/${projectId}/uploads`, form);
}

/** The fixture with its image-size box ("ispe") rewritten to claim a far larger picture. */
function claimingSize(width: number, height: number): Uint8Array {
  const copy = Buffer.from(HEIC);
  const at = copy.indexOf(Buffer.from("ispe", "latin1"));
  expect(at).toBeGreaterThan(0);
  copy.writeUInt32BE(width, at + 8); // after the box type come 4 bytes of version and flags
  copy.writeUInt32BE(height, at + 12);
  return new Uint8Array(copy);
}

describe("HEIC photos", () => {
  it("stores a real HEIC photo as a JPEG original with a thumbnail, through either upload path", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    // A phone may label it image/heic, image/heif or not at all.
    const direct = await send(crew, t.project.id, HEIC, "IMG_0001.HEIC", "");
    expect(direct.status).toBe(201);
    expect(direct.json.attachment).toMatchObject({ contentType: "image/jpeg", fileName: "IMG_0001.jpg", status: "ready" });
    expect(direct.json.attachment.thumbUrl).toBeTruthy();

    const started = await crew.post(`/api/projects/${t.project.id}/uploads`, { stage: "aquascape", fileName: "IMG_0002.heic", contentType: "image/heif", sizeBytes: HEIC.byteLength });
    expect(started.status).toBe(201);
    const put = await fetch(started.json.uploadUrl, { method: "PUT", headers: started.json.uploadHeaders, body: HEIC as BodyInit });
    expect(put.status).toBe(200);
    const done = await crew.post(started.json.completeUrl);
    expect(done.status).toBe(200);

    for (const id of [direct.json.attachment.id as string, done.json.id as string]) {
      const [row] = await db().select().from(attachments).where(eq(attachments.id, id));
      expect(row).toMatchObject({ contentType: "image/jpeg", status: "ready" });
      expect(row.fileName).toMatch(/\.jpg$/);
      const original = await getObjectBytes(row.key);
      expect(Array.from(original.subarray(0, 3))).toEqual([0xff, 0xd8, 0xff]);
      expect(row.sizeBytes).toBe(original.byteLength);
      expect(await sharp(original).metadata()).toMatchObject({ format: "jpeg", width: 160, height: 120 });
      const served = await crew.raw(`/api/attachments/${id}?variant=full`);
      expect(served.headers.get("content-type")).toBe("image/jpeg");
      const thumb = await crew.raw(`/api/attachments/${id}?variant=thumb`);
      expect(thumb.status).toBe(200);
      expect(await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).toMatchObject({ format: "webp", width: 160, height: 120 });
      // The picture survives decoding: the fixture's left half is bluish, its right half is not.
      const { data } = await sharp(original).extract({ left: 10, top: 60, width: 1, height: 1 }).raw().toBuffer({ resolveWithObject: true });
      expect(data[2]).toBeGreaterThan(150);
    }
  });

  it("refuses a damaged HEIC, a renamed file and a picture over the pixel cap, storing nothing", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);

    const damaged = new Uint8Array(HEIC.subarray(0, HEIC.byteLength - 50)); // the header whole, the picture cut short
    const cut = await send(crew, t.project.id, damaged, "IMG_0003.HEIC", "image/heic");
    expect(cut.status).toBe(422);
    expect(cut.json.error).toMatch(/couldn't be read; it may be damaged/);

    const garbled = new Uint8Array(HEIC);
    garbled.fill(0x41, 40); // keeps the ftyp box, ruins everything after it
    const bad = await send(crew, t.project.id, garbled, "IMG_0004.HEIC", "image/heic");
    expect(bad.status).toBe(422);
    expect(bad.json.error).toMatch(/couldn't be read/);

    const text = new TextEncoder().encode("not a photo at all, just some words");
    const renamed = await send(crew, t.project.id, text, "IMG_0005.heic", "image/heic");
    expect(renamed.status).toBe(422);
    expect(renamed.json.error).toMatch(/called a HEIC photo but isn't one/);

    const jpeg = await sharp({ create: { width: 20, height: 20, channels: 3, background: "#246" } }).jpeg().toBuffer();
    const jpegCalledHeic = await send(crew, t.project.id, new Uint8Array(jpeg), "IMG_0006.heic", "image/heic");
    expect(jpegCalledHeic.status).toBe(422);

    // 10,000 × 6,000 is 60 million pixels, over the 50 million cap; only the header says so.
    const huge = await send(crew, t.project.id, claimingSize(10_000, 6_000), "IMG_0007.HEIC", "image/heic");
    expect(huge.status).toBe(422);
    expect(huge.json.error).toContain("10000 × 6000 pixels; the limit is 50 million pixels");

    expect(await rows(t.project.id)).toEqual([]);
    expect(await storedKeys(t.project.id)).toEqual([]);
  });
});

describe("sending one photo twice", () => {
  it("keeps one attachment per device key, however often the phone retries", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const jpeg = new Uint8Array(await sharp({ create: { width: 40, height: 30, channels: 3, background: "#3a7" } }).jpeg().toBuffer());
    const key = "p-0123456789abcdef0123456789abcdef";
    const takenAt = "2026-11-30T09:15:00.000+01:00";

    const first = await send(crew, t.project.id, jpeg, "stand.jpg", "image/jpeg", { clientKey: key, takenAt });
    expect(first.status).toBe(201);
    // The answer was lost; the phone sends the same photo again, twice at once for good measure.
    const [again, racing] = await Promise.all([
      send(crew, t.project.id, jpeg, "stand.jpg", "image/jpeg", { clientKey: key, takenAt }),
      send(crew, t.project.id, jpeg, "stand.jpg", "image/jpeg", { clientKey: key, takenAt }),
    ]);
    for (const r of [again, racing]) {
      expect(r.status).toBe(200);
      expect(r.json.attachment.id).toBe(first.json.attachment.id);
    }
    const stored = await rows(t.project.id);
    expect(stored).toHaveLength(1);
    expect(stored[0].takenAt?.toISOString()).toBe("2026-11-30T08:15:00.000Z");
    expect(stored[0].clientKey).toBe(key);
    expect((await storedKeys(t.project.id)).sort()).toEqual([stored[0].key, `${stored[0].key}-thumb`].sort());

    // Without a key every upload is its own.
    expect((await send(crew, t.project.id, jpeg, "stand.jpg", "image/jpeg")).status).toBe(201);
    expect(await rows(t.project.id)).toHaveLength(2);

    // The same key on another project is a mistake, not a repeat.
    const other = await makeProject({ client: t.client, lead: t.lead, crew: [t.crew], stage: "aquascape" });
    const elsewhere = await send(crew, other.id, jpeg, "stand.jpg", "image/jpeg", { clientKey: key });
    expect(elsewhere.status).toBe(409);
    expect(await rows(other.id)).toEqual([]);
  });

  it("refuses a malformed key or time with a 400", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const jpeg = new Uint8Array(await sharp({ create: { width: 8, height: 8, channels: 3, background: "#000" } }).jpeg().toBuffer());
    const badKey = await send(crew, t.project.id, jpeg, "a.jpg", "image/jpeg", { clientKey: "short" });
    expect(badKey.status).toBe(400);
    const badTime = await send(crew, t.project.id, jpeg, "a.jpg", "image/jpeg", { takenAt: "yesterday" });
    expect(badTime.status).toBe(400);
    expect(await rows(t.project.id)).toEqual([]);
  });
});
