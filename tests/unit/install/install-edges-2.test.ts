import { describe, expect, it } from "vitest";
import { checkUpload, claimedType, isHeifHead, isImageType, MAX_FILE_NAME_CHARS, MAX_UPLOAD_BYTES, MAX_UPLOAD_PIXELS, pdfRefusal, pixelRefusal, sanitiseFileName, sizeRefusal, sniffType } from "@/lib/install/upload-rules";
import { contentDisposition } from "@/lib/install/disposition";
import { newTickKey, parseQueue, queueStorageKey } from "@/lib/install/tick-queue";
import { parsePhotoQueue, sendOutcome } from "@/lib/install/photo-queue";
import { canUndoOwn } from "@/lib/install/undo-window";
import { checkMeasuredValue, latestTicks } from "@/lib/install/checklist-progress";
import { shiftInstallVisits } from "@/lib/install/install-day-dates";

const bytes = (...b: number[]) => new Uint8Array(b);
const ascii = (s: string) => new TextEncoder().encode(s);

describe("uploads at their edges", () => {
  it("reads a content type with parameters by its first part", () => {
    expect(claimedType("IMAGE/JPEG; charset=binary", "a.jpg")).toBe("image/jpeg");
  });
  it("knows which types are images", () => {
    expect(isImageType("image/png")).toBe(true);
    expect(isImageType("application/pdf")).toBe(false);
    expect(isImageType("text/html")).toBe(false);
  });
  it("names the size of a file over the limit in MB", () => {
    expect(sizeRefusal(MAX_UPLOAD_BYTES)).toBeNull();
    expect(sizeRefusal(MAX_UPLOAD_BYTES + 1)).toBe("The file is 15.0 MB; the limit is 15 MB.");
    expect(sizeRefusal(20 * 1024 * 1024)).toBe("The file is 20.0 MB; the limit is 15 MB.");
  });
  it("cleans a file name: folders, leading dots and runs of spaces go", () => {
    expect(sanitiseFileName("C:\\photos\\..\\ .. stand   front.jpg")).toEqual({ ok: true, name: "stand front.jpg" });
    expect(sanitiseFileName("...hidden")).toEqual({ ok: true, name: "hidden" });
    expect(sanitiseFileName("a\u0007b.jpg")).toEqual({ ok: false, message: "The file name has control characters in it. Rename the file and try again." });
    expect(sanitiseFileName("__.__")).toEqual({ ok: false, message: "The file needs a name with at least one letter or digit." });
    expect(sanitiseFileName("../")).toEqual({ ok: false, message: "The file needs a name with at least one letter or digit." });
    expect(sanitiseFileName("x_")).toEqual({ ok: true, name: "x_" });
  });
  it("shortens a long name to the limit and keeps a short extension, but not a long one", () => {
    const exactly = "a".repeat(MAX_FILE_NAME_CHARS);
    expect(sanitiseFileName(exactly)).toEqual({ ok: true, name: exactly });
    const long = `${"b".repeat(200)}.jpeg`;
    const cut = sanitiseFileName(long);
    expect(cut).toEqual({ ok: true, name: `${"b".repeat(MAX_FILE_NAME_CHARS - 5)}.jpeg` });
    // An "extension" of more than ten characters is just part of the name.
    const odd = `${"c".repeat(150)}.abcdefghijk`;
    expect(sanitiseFileName(odd)).toEqual({ ok: true, name: odd.slice(0, MAX_FILE_NAME_CHARS) });
    // A name that starts with its only dot has no extension to keep.
    expect(sanitiseFileName(`x${"d".repeat(150)}`)).toEqual({ ok: true, name: `x${"d".repeat(MAX_FILE_NAME_CHARS - 1)}` });
  });
  it("says which field is wrong", () => {
    expect(checkUpload({ fileName: "\u0007.jpg", contentType: "image/jpeg", sizeBytes: 10 })).toEqual({ ok: false, field: "fileName", message: "The file name has control characters in it. Rename the file and try again." });
  });
  it("recognises HEIC only from a whole box header", () => {
    const heic = ascii("\u0000\u0000\u0000\u0018ftypheic");
    expect(isHeifHead(heic)).toBe(true);
    expect(isHeifHead(heic.subarray(0, 11))).toBe(false);
    expect(isHeifHead(ascii("\u0000\u0000\u0000\u0018ftypmp42"))).toBe(false);
    expect(isHeifHead(ascii("\u0000\u0000\u0000\u0018moovheic"))).toBe(false);
  });
  it("needs both halves of a WebP signature", () => {
    expect(sniffType(ascii("RIFF\u0000\u0000\u0000\u0000WEBPVP8 "))).toBe("image/webp");
    expect(sniffType(ascii("RIFF\u0000\u0000\u0000\u0000WAVEfmt "))).toBeNull();
    expect(sniffType(ascii("RIFX\u0000\u0000\u0000\u0000WEBPVP8 "))).toBeNull();
    expect(sniffType(bytes(0, 0, 0, 0))).toBeNull();
  });
  it("takes a photo of exactly the pixel limit and refuses a flat or empty one", () => {
    expect(pixelRefusal(10_000, MAX_UPLOAD_PIXELS / 10_000)).toBeNull();
    expect(pixelRefusal(10_000, MAX_UPLOAD_PIXELS / 10_000 + 1)).toBe(`The photo is 10000 × ${MAX_UPLOAD_PIXELS / 10_000 + 1} pixels; the limit is 50 million pixels. Export a smaller copy and upload that.`);
    expect(pixelRefusal(100, 0)).toBe("The photo couldn't be read; it may be damaged. Take it again or export it as JPEG.");
    expect(pixelRefusal(0, 100)).toBe("The photo couldn't be read; it may be damaged. Take it again or export it as JPEG.");
  });
  it("looks for a PDF's end marker in its last kilobyte", () => {
    const refusal = "That PDF isn't complete or isn't a real PDF. Save it again from the program that made it and upload the new copy.";
    const body = "x".repeat(3000);
    expect(pdfRefusal(ascii(`%PDF-1.7\n${body}\n%%EOF\n`))).toBeNull();
    // The marker far from the end doesn't count.
    expect(pdfRefusal(ascii(`%PDF-1.7\n%%EOF\n${body}`))).toBe(refusal);
  });
  it("writes a download header with a plain fallback and the real name encoded", () => {
    expect(contentDisposition("attachment", "stand (front)'s *.jpg")).toBe(`attachment; filename="stand (front)'s *.jpg"; filename*=UTF-8''stand%20%28front%29%27s%20%2A.jpg`);
    expect(contentDisposition("inline", "x".repeat(200))).toBe(`inline; filename="${"x".repeat(150)}"; filename*=UTF-8''${"x".repeat(200)}`);
  });
});

describe("the queues on the phone", () => {
  it("reads back a stored tick queue, dropping anything malformed", () => {
    const good = { clientKey: "t-aaaaaaaa", itemId: "i", done: true, note: null, value: null, attachmentId: null, queuedAt: "2026-12-02T10:00:00Z" };
    expect(parseQueue(JSON.stringify([good, { ...good, clientKey: 5 }, { ...good, itemId: null }, { ...good, done: "yes" }, null]))).toEqual([good]);
    expect(parseQueue(null)).toEqual([]);
    expect(parseQueue("")).toEqual([]);
    expect(parseQueue("{}")).toEqual([]);
    expect(parseQueue("not json")).toEqual([]);
  });
  it("keeps each project's ticks apart, under keys the server accepts", () => {
    expect(queueStorageKey("p1")).toBe("tankwright:ticks:p1");
    expect(newTickKey()).toMatch(/^t-[0-9a-f]{32}$/);
    expect(newTickKey()).not.toBe(newTickKey());
  });
  it("drops a stored photo whose fields aren't all there, and a held tick that isn't one", () => {
    const ok = { clientKey: "p-aaaaaaaaaaaa", stage: "aquascape", caption: null, fileName: "a.jpg", contentType: "image/jpeg", takenAt: null, queuedAt: "2026-12-02T10:00:00Z", bytes: "x" };
    const has = (p: Record<string, unknown>) => typeof p.bytes === "string";
    for (const broken of [{ stage: 1 }, { fileName: null }, { contentType: undefined }, { queuedAt: 0 }, { clientKey: 9 }]) {
      expect(parsePhotoQueue([{ ...ok, ...broken }], has)).toEqual([]);
    }
    expect(parsePhotoQueue(["p-aaaaaaaaaaaa"], has)).toEqual([]);
    const held = { itemId: "i", note: null, value: null, heldAt: "2026-12-02T10:00:00Z" };
    for (const bad of ["tick", { ...held, itemId: undefined }, { ...held, heldAt: 5 }, { ...held, note: 3 }, { ...held, value: "2" }]) {
      expect(parsePhotoQueue([{ ...ok, thenTick: bad }], has)[0].thenTick).toBeNull();
    }
  });
  it("counts every 2xx as sent", () => {
    expect(sendOutcome(299)).toBe("sent");
    expect(sendOutcome(300)).toBe("refused");
  });
});

describe("small rules of the day", () => {
  const now = new Date("2026-12-02T10:00:00Z");
  it("lets a person take back their own entry for ten minutes, allowing a phone clock a minute fast", () => {
    const at = (ms: number) => ({ byUserId: "u", at: new Date(now.getTime() + ms) });
    expect(canUndoOwn(at(-10 * 60_000), "u", now)).toBe(true);
    expect(canUndoOwn(at(-10 * 60_000 - 1), "u", now)).toBe(false);
    expect(canUndoOwn(at(60_000), "u", now)).toBe(true);
    expect(canUndoOwn(at(60_001), "u", now)).toBe(false);
  });
  it("on a tie in number, the first tick seen stays", () => {
    const a = { itemId: "i", seq: 2, done: true, id: "a" };
    const b = { itemId: "i", seq: 2, done: false, id: "b" };
    expect(latestTicks([a, b]).get("i")).toBe(a);
  });
  it("asks for a value that is missing or not a number", () => {
    const spec = { unit: "mm", min: 0, max: 2 };
    for (const v of [null, undefined, Number.NaN, Number.POSITIVE_INFINITY]) expect(checkMeasuredValue(spec, v)).toBe("Enter the measured value in mm.");
    expect(checkMeasuredValue(spec, 2)).toBeNull();
  });
  it("moves a multi-day install from its earliest visit, even when that one is listed last", () => {
    const v = (id: string, iso: string) => ({ id, startsAt: new Date(iso) });
    expect(shiftInstallVisits([v("b", "2031-03-11T09:00:00Z"), v("a", "2031-03-10T09:00:00Z")], "2031-03-11", "UTC")).toEqual([v("b", "2031-03-12T09:00:00Z"), v("a", "2031-03-11T09:00:00Z")]);
    expect(shiftInstallVisits([v("a", "2031-03-10T09:00:00Z"), v("b", "2031-03-11T09:00:00Z")], "2031-03-11", "UTC")).toEqual([v("a", "2031-03-11T09:00:00Z"), v("b", "2031-03-12T09:00:00Z")]);
    // Two visits at the same time: either is the first, and both move alike.
    expect(shiftInstallVisits([v("a", "2031-03-10T09:00:00Z"), v("b", "2031-03-10T09:00:00Z")], "2031-03-12", "UTC")).toEqual([v("a", "2031-03-12T09:00:00Z"), v("b", "2031-03-12T09:00:00Z")]);
  });
});
