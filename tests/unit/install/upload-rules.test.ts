import { describe, expect, it } from "vitest";
import { checkUpload, claimedType, convertedFileName, isHeifHead, MAX_UPLOAD_BYTES, sanitiseFileName, sniffType } from "@/lib/install/upload-rules";

describe("sanitiseFileName", () => {
  it("keeps an ordinary name", () => {
    expect(sanitiseFileName("Stand level 2.jpg")).toEqual({ ok: true, name: "Stand level 2.jpg" });
  });
  it("drops folders on either kind of slash", () => {
    expect(sanitiseFileName("../../etc/passwd.png")).toEqual({ ok: true, name: "passwd.png" });
    expect(sanitiseFileName("C:\\Users\\crew\\scape.jpg")).toEqual({ ok: true, name: "scape.jpg" });
  });
  it("refuses control characters and extension-hiding overrides", () => {
    expect(sanitiseFileName("a\u0000.jpg").ok).toBe(false);
    expect(sanitiseFileName("photo\r\n.jpg").ok).toBe(false);
    expect(sanitiseFileName("invoice\u202Egpj.exe").ok).toBe(false);
  });
  it("replaces odd symbols and strips leading dots", () => {
    expect(sanitiseFileName(".hidden<script>.png")).toEqual({ ok: true, name: "hidden_script_.png" });
  });
  it("refuses a name with nothing left", () => {
    expect(sanitiseFileName("../..").ok).toBe(false);
    expect(sanitiseFileName("   ").ok).toBe(false);
  });
  it("shortens very long names and keeps the extension", () => {
    const r = sanitiseFileName(`${"a".repeat(400)}.jpeg`);
    expect(r.ok && r.name.length).toBe(120);
    expect(r.ok && r.name.endsWith(".jpeg")).toBe(true);
  });
  it("keeps letters outside ASCII", () => {
    expect(sanitiseFileName("Aufbau Größe.jpg")).toEqual({ ok: true, name: "Aufbau Größe.jpg" });
  });
});

describe("checkUpload", () => {
  it("accepts a JPEG within the limit", () => {
    expect(checkUpload({ fileName: "a.jpg", contentType: "image/JPEG", sizeBytes: 1000 })).toEqual({ ok: true, fileName: "a.jpg", contentType: "image/jpeg" });
  });
  it("refuses other types, naming what is accepted", () => {
    const gif = checkUpload({ fileName: "a.gif", contentType: "image/gif", sizeBytes: 10 });
    expect(gif).toMatchObject({ ok: false, field: "contentType", message: "Only JPEG, PNG, WebP or HEIC photos and PDF documents can be uploaded." });
  });
  it("takes every HEIC label, or an unlabelled .heic name, as one HEIC claim", () => {
    for (const type of ["image/heic", "image/HEIF", "image/heic-sequence", "image/heif-sequence; x=1"]) {
      expect(checkUpload({ fileName: "IMG_0001.HEIC", contentType: type, sizeBytes: 10 })).toEqual({ ok: true, fileName: "IMG_0001.HEIC", contentType: "image/heic" });
    }
    expect(claimedType("", "IMG_0002.heif")).toBe("image/heic");
    expect(claimedType("application/octet-stream", "IMG_0002.heic")).toBe("image/heic");
    // A name alone never overrides a type the device did declare.
    expect(claimedType("image/jpeg", "IMG_0002.heic")).toBe("image/jpeg");
    expect(claimedType("", "notes.txt")).toBe("");
  });
  it("refuses empty and oversized files", () => {
    expect(checkUpload({ fileName: "a.pdf", contentType: "application/pdf", sizeBytes: 0 })).toMatchObject({ ok: false, field: "sizeBytes" });
    expect(checkUpload({ fileName: "a.pdf", contentType: "application/pdf", sizeBytes: MAX_UPLOAD_BYTES })).toMatchObject({ ok: true });
    expect(checkUpload({ fileName: "a.pdf", contentType: "application/pdf", sizeBytes: MAX_UPLOAD_BYTES + 1 })).toMatchObject({ ok: false, field: "sizeBytes" });
  });
});

describe("sniffType", () => {
  const b = (...xs: number[]) => new Uint8Array(xs);
  it("recognises each format by its signature", () => {
    expect(sniffType(b(0xff, 0xd8, 0xff, 0xe0))).toBe("image/jpeg");
    expect(sniffType(b(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a))).toBe("image/png");
    expect(sniffType(new TextEncoder().encode("RIFF\u0000\u0000\u0000\u0000WEBPVP8 "))).toBe("image/webp");
    expect(sniffType(new TextEncoder().encode("%PDF-1.7"))).toBe("application/pdf");
  });
  it("recognises HEIF by its ftyp box and a still-image brand", () => {
    const box = (brand: string) => new Uint8Array([0, 0, 0, 0x1c, ...new TextEncoder().encode(`ftyp${brand}`), 0, 0, 0, 0]);
    for (const brand of ["heic", "heix", "mif1", "msf1", "heif", "hevc"]) expect(sniffType(box(brand))).toBe("image/heic");
    // An MP4 or QuickTime video is also an ftyp file, with other brands.
    expect(sniffType(box("isom"))).toBeNull();
    expect(sniffType(box("qt  "))).toBeNull();
    expect(isHeifHead(new TextEncoder().encode("xxxxftyphei"))).toBe(false);
  });
  it("names a converted HEIC photo .jpg", () => {
    expect(convertedFileName("IMG_0001.HEIC")).toBe("IMG_0001.jpg");
    expect(convertedFileName("stand.heif")).toBe("stand.jpg");
    expect(convertedFileName(".heic")).toBe("photo.jpg");
  });
  it("finds nothing in text or a program", () => {
    expect(sniffType(new TextEncoder().encode("hello"))).toBeNull();
    expect(sniffType(b(0x4d, 0x5a, 0x90, 0x00))).toBeNull();
    expect(sniffType(new Uint8Array())).toBeNull();
  });
});
