import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { crc32 } from "node:zlib";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { attachments } from "@/db/schema";
import { env } from "@/env";
import { getObjectBytes, s3 } from "@/server/storage";
import { makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";

async function storedKeys(projectId: string): Promise<string[]> {
  const res = await s3().send(new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: `projects/${projectId}/` }));
  return (res.Contents ?? []).map((o) => o.Key!);
}

const HTML = "<!doctype html><html><body><script>document.title='owned'</script></body></html>";

/** A real JPEG with a web page appended after its end marker: both a picture and a page. */
async function jpegWithHtml(): Promise<Uint8Array> {
  const jpeg = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#3a7" } }).jpeg().toBuffer();
  return new Uint8Array(Buffer.concat([jpeg, Buffer.from(HTML)]));
}

/**
 * A PNG whose header says 8900 × 8900 pixels (79 million, about 300 MB decoded) with no real image
 * data: the cap must refuse it from the header, before anything is decoded.
 */
function hugePngHeader(width = 8900, height = 8900): Uint8Array {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, "latin1"), data]);
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, no interlace
  const sig = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return new Uint8Array(Buffer.concat([sig, chunk("IHDR", ihdr), chunk("IDAT", Buffer.from([0x78, 0x9c, 0x03, 0x00, 0x00, 0x00, 0x00, 0x01])), chunk("IEND", Buffer.alloc(0))]));
}

function formUpload(s: Session, projectId: string, bytes: Uint8Array, name: string, type: string) {
  const form = new FormData();
  form.set("file", new File([bytes as BlobPart], name, { type }));
  form.set("stage", "aquascape");
  return s.request("POST", `/api/projects/${projectId}/uploads`, form);
}

async function presigned(s: Session, projectId: string, bytes: Uint8Array, name: string, type: string, announced = bytes.byteLength) {
  const started = await s.post(`/api/projects/${projectId}/uploads`, { stage: "aquascape", fileName: name, contentType: type, sizeBytes: announced });
  expect(started.status).toBe(201);
  const put = await fetch(started.json.uploadUrl, { method: "PUT", headers: started.json.uploadHeaders, body: bytes as BodyInit });
  expect(put.status).toBe(200);
  return { id: started.json.attachment.id as string, done: await s.post(started.json.completeUrl) };
}

describe("uploads that could be read as something else", () => {
  it("stores a JPEG with HTML appended as a clean JPEG and serves it with nosniff", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const bytes = await jpegWithHtml();
    for (const res of [await formUpload(crew, t.project.id, bytes, "photo.jpg", "image/jpeg"), (await presigned(crew, t.project.id, bytes, "photo.jpg", "image/jpeg")).done]) {
      expect(res.status).toBeLessThan(300);
      const id = (res.json.attachment?.id ?? res.json.id) as string;
      const [row] = await db().select().from(attachments).where(eq(attachments.id, id));
      const stored = Buffer.from(await getObjectBytes(row.key));
      expect(stored.includes(Buffer.from("<script"))).toBe(false);
      expect(row.sizeBytes).toBe(stored.byteLength);
      const served = await crew.raw(`/api/attachments/${id}?variant=full`);
      expect(served.status).toBe(200);
      expect(served.headers.get("content-type")).toBe("image/jpeg");
      expect(served.headers.get("x-content-type-options")).toBe("nosniff");
      expect(served.headers.get("content-security-policy")).toContain("sandbox");
      const body = Buffer.from(await served.arrayBuffer());
      expect(body.includes(Buffer.from("<script"))).toBe(false);
      expect((await sharp(body).metadata()).format).toBe("jpeg");
    }
  });

  it("refuses a %PDF- file whose body is a web page, and serves a real PDF as a download", async () => {
    const t = await makeTeam("aquascape");
    const lead = await signedIn(t.lead);
    const fake = new TextEncoder().encode(`%PDF-1.7\n${HTML}\n`);
    const refused = await formUpload(lead, t.project.id, fake, "certificate.pdf", "application/pdf");
    expect(refused.status).toBe(422);
    const viaLink = await presigned(lead, t.project.id, fake, "certificate.pdf", "application/pdf");
    expect(viaLink.done.status).toBe(422);
    expect(await storedKeys(t.project.id)).toEqual([]);

    const real = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
    const ok = await formUpload(lead, t.project.id, real, "Glass \"test\" certificate.pdf", "application/pdf");
    expect(ok.status).toBe(201);
    const served = await lead.raw(`/api/attachments/${ok.json.attachment.id}?variant=full`);
    expect(served.headers.get("content-type")).toBe("application/pdf");
    expect(served.headers.get("x-content-type-options")).toBe("nosniff");
    expect(served.headers.get("content-disposition")).toBe(`attachment; filename="Glass _test_ certificate.pdf"; filename*=UTF-8''Glass%20_test_%20certificate.pdf`);
  });

  it("refuses a photo over the pixel cap from its header, by either route, and keeps nothing", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const huge = hugePngHeader();
    expect((await sharp(Buffer.from(huge)).metadata()).width).toBe(8900);
    const direct = await formUpload(crew, t.project.id, huge, "panorama.png", "image/png");
    expect(direct.status).toBe(422);
    expect(direct.json.error).toMatch(/8900 × 8900 pixels/);
    const viaLink = await presigned(crew, t.project.id, huge, "panorama.png", "image/png");
    expect(viaLink.done.status).toBe(422);
    const [row] = await db().select().from(attachments).where(eq(attachments.id, viaLink.id));
    expect(row.status).toBe("pending");
    expect(await storedKeys(t.project.id)).toEqual([]);
  });

  it("deletes from the bucket a file larger than announced when the finish step refuses it", async () => {
    const t = await makeTeam("aquascape");
    const crew = await signedIn(t.crew);
    const bytes = await jpegWithHtml();
    const { done } = await presigned(crew, t.project.id, bytes, "photo.jpg", "image/jpeg", 100);
    expect(done.status).toBe(422);
    expect(done.json.error).toMatch(/not the 100 bytes announced/);
    expect(await storedKeys(t.project.id)).toEqual([]);
  });
});
