import { describe, expect, it } from "vitest";
import { holdTick, newPhotoKey, parsePhotoQueue, tickKeyForPhoto, waitingPhotoFor, photoQueueKey, plausibleTakenAt, sendOutcome, shrinkPlan, waitingPhotosLabel, withoutPhoto, type QueuedPhoto } from "@/lib/install/photo-queue";

const photo = (clientKey: string, extra: Partial<QueuedPhoto> = {}): QueuedPhoto & { bytes: string } => ({
  clientKey,
  stage: "aquascape",
  caption: null,
  fileName: "stand.jpg",
  contentType: "image/jpeg",
  takenAt: null,
  queuedAt: "2026-12-02T10:42:00.000Z",
  bytes: "x",
  ...extra,
});

describe("shrinkPlan", () => {
  it("sends HEIC as it is, however the phone labels it", () => {
    expect(shrinkPlan({ type: "image/heic", name: "IMG_1.HEIC" })).toEqual({ shrink: false });
    expect(shrinkPlan({ type: "image/heif", name: "IMG_1.heif" })).toEqual({ shrink: false });
    expect(shrinkPlan({ type: "", name: "IMG_1.heic" })).toEqual({ shrink: false });
  });
  it("shrinks the types a canvas can draw, keeping each type", () => {
    expect(shrinkPlan({ type: "image/jpeg", name: "a.jpg" })).toEqual({ shrink: true, toType: "image/jpeg" });
    expect(shrinkPlan({ type: "image/png", name: "a.png" })).toEqual({ shrink: true, toType: "image/png" });
    expect(shrinkPlan({ type: "image/webp", name: "a.webp" })).toEqual({ shrink: true, toType: "image/webp" });
  });
  it("leaves anything else to the server to refuse", () => {
    expect(shrinkPlan({ type: "application/pdf", name: "a.pdf" })).toEqual({ shrink: false });
    expect(shrinkPlan({ type: "", name: "a.jpg" })).toEqual({ shrink: false });
  });
});

describe("plausibleTakenAt", () => {
  const now = new Date("2026-12-02T12:00:00Z");
  it("keeps a camera time as an ISO instant", () => {
    expect(plausibleTakenAt(new Date("2026-12-02T09:15:00+01:00"), now)).toBe("2026-12-02T08:15:00.000Z");
  });
  it("drops a camera clock that was never set, or one far ahead", () => {
    expect(plausibleTakenAt(new Date("1999-12-31T23:59:59Z"), now)).toBeNull();
    expect(plausibleTakenAt(new Date("2000-01-01T00:00:00Z"), now)).toBe("2000-01-01T00:00:00.000Z");
    expect(plausibleTakenAt(new Date("2026-12-03T12:00:00Z"), now)).toBe("2026-12-03T12:00:00.000Z");
    expect(plausibleTakenAt(new Date("2026-12-03T12:00:01Z"), now)).toBeNull();
  });
  it("drops what isn't a date", () => {
    expect(plausibleTakenAt("2026:12:02 09:15:00", now)).toBeNull();
    expect(plausibleTakenAt(new Date(Number.NaN), now)).toBeNull();
    expect(plausibleTakenAt(undefined, now)).toBeNull();
  });
});

describe("sendOutcome", () => {
  it("counts a new upload and a repeat as sent", () => {
    expect(sendOutcome(201)).toBe("sent");
    expect(sendOutcome(200)).toBe("sent");
  });
  it("waits on no connection, a timeout, throttling or a server fault", () => {
    for (const s of [0, 408, 429, 500, 502, 503]) expect(sendOutcome(s)).toBe("retry");
  });
  it("gives up on an answer about the photo itself", () => {
    for (const s of [400, 401, 403, 404, 409, 413, 415, 422]) expect(sendOutcome(s)).toBe("refused");
  });
});

describe("the stored queue", () => {
  const hasBytes = (p: Record<string, unknown>) => typeof p.bytes === "string";
  it("reads back what was stored, in order", () => {
    const q = [photo("p-aaaaaaaaaaaa"), photo("p-bbbbbbbbbbbb")];
    expect(parsePhotoQueue(q, hasBytes)).toEqual(q);
  });
  it("drops malformed entries and entries without their bytes", () => {
    const q = [photo("p-aaaaaaaaaaaa"), { ...photo("p-cccccccccccc"), bytes: undefined }, photo("bad key!"), null, 7, { clientKey: "p-dddddddddddd" }];
    expect(parsePhotoQueue(q, hasBytes).map((p) => p.clientKey)).toEqual(["p-aaaaaaaaaaaa"]);
    expect(parsePhotoQueue(undefined, hasBytes)).toEqual([]);
    expect(parsePhotoQueue({ clientKey: "p-aaaaaaaaaaaa" }, hasBytes)).toEqual([]);
  });
  it("removes one photo and keeps the rest in order", () => {
    const q = [photo("p-aaaaaaaaaaaa"), photo("p-bbbbbbbbbbbb"), photo("p-cccccccccccc")];
    expect(withoutPhoto(q, "p-bbbbbbbbbbbb").map((p) => p.clientKey)).toEqual(["p-aaaaaaaaaaaa", "p-cccccccccccc"]);
  });
  it("keeps each person's queue apart", () => {
    expect(photoQueueKey("u1", "p1")).toBe("tankwright:photos:u1:p1");
    expect(photoQueueKey("u2", "p1")).not.toBe(photoQueueKey("u1", "p1"));
  });
});

describe("labels and keys", () => {
  it("says how many photos wait", () => {
    expect(waitingPhotosLabel(1)).toBe("Waiting to send — 1 photo");
    expect(waitingPhotosLabel(3)).toBe("Waiting to send — 3 photos");
  });
  it("makes keys the server accepts, different each time", () => {
    const a = newPhotoKey();
    expect(a).toMatch(/^p-[0-9a-f]{32}$/);
    expect(newPhotoKey()).not.toBe(a);
  });
});

describe("a checklist item's photo and the tick that waits for it", () => {
  const held = { itemId: "item-1", note: "level both ways", value: null, heldAt: "2026-12-02T10:45:00.000Z" };
  const hasBytes = (p: Record<string, unknown>) => typeof p.bytes === "string";

  it("holds the tick on the photo it needs, leaving the others alone", () => {
    const q = [photo("p-aaaaaaaaaaaa"), photo("p-bbbbbbbbbbbb", { forItemId: "item-1" })];
    const next = holdTick(q, "p-bbbbbbbbbbbb", held);
    expect(next?.[1]).toMatchObject({ clientKey: "p-bbbbbbbbbbbb", forItemId: "item-1", thenTick: held });
    expect(next?.[0]).toEqual(q[0]);
    expect(q[1].thenTick).toBeUndefined();
  });
  it("can't hold a tick on a photo that has left the queue", () => {
    expect(holdTick([photo("p-aaaaaaaaaaaa")], "p-bbbbbbbbbbbb", held)).toBeNull();
    expect(holdTick([], "p-bbbbbbbbbbbb", held)).toBeNull();
  });
  it("finds the newest photo still waiting for an item, and none for another item", () => {
    const q = [photo("p-aaaaaaaaaaaa", { forItemId: "item-1" }), photo("p-bbbbbbbbbbbb"), photo("p-cccccccccccc", { forItemId: "item-1" })];
    expect(waitingPhotoFor(q, "item-1")?.clientKey).toBe("p-cccccccccccc");
    expect(waitingPhotoFor(q, "item-2")).toBeNull();
    expect(waitingPhotoFor([photo("p-aaaaaaaaaaaa")], "item-1")).toBeNull();
  });
  it("gives the following tick one key per photo, so a photo sent twice ticks once", () => {
    expect(tickKeyForPhoto("p-aaaaaaaaaaaa")).toBe("t-p-aaaaaaaaaaaa");
    expect(tickKeyForPhoto("p-aaaaaaaaaaaa")).toBe(tickKeyForPhoto("p-aaaaaaaaaaaa"));
    expect(tickKeyForPhoto("p-bbbbbbbbbbbb")).not.toBe(tickKeyForPhoto("p-aaaaaaaaaaaa"));
    // The tick route wants 8–100 characters.
    expect(tickKeyForPhoto(newPhotoKey()).length).toBeLessThanOrEqual(100);
  });
  it("reads a held tick back from storage, and drops a malformed one without losing the photo", () => {
    const good = photo("p-aaaaaaaaaaaa", { forItemId: "item-1", thenTick: held });
    const badTick = { ...photo("p-bbbbbbbbbbbb", { forItemId: "item-2" }), thenTick: { itemId: 4 } };
    const badValue = { ...photo("p-cccccccccccc", { forItemId: "item-3" }), thenTick: { ...held, value: Number.NaN } };
    const badItem = { ...photo("p-dddddddddddd"), forItemId: 12 };
    const read = parsePhotoQueue([good, badTick, badValue, badItem], hasBytes);
    expect(read.map((p) => p.clientKey)).toEqual(["p-aaaaaaaaaaaa", "p-bbbbbbbbbbbb", "p-cccccccccccc"]);
    expect(read[0].thenTick).toEqual(held);
    expect(read[1].thenTick).toBeNull();
    expect(read[2].thenTick).toBeNull();
    expect(parsePhotoQueue([{ ...good, thenTick: { ...held, value: 2.5, note: null } }], hasBytes)[0].thenTick).toEqual({ ...held, value: 2.5, note: null });
  });
});
