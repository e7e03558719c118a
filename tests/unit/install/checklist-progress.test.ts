import { describe, expect, it } from "vitest";
import { checkMeasuredValue, latestTicks, percent, stageProgress } from "@/lib/install/checklist-progress";

const items = [
  { id: "a", stage: "aquascape" as const, retiredAt: null },
  { id: "b", stage: "aquascape" as const, retiredAt: null },
  { id: "c", stage: "aquascape" as const, retiredAt: new Date() },
  { id: "d", stage: "fill_leak_test" as const, retiredAt: null },
];

describe("latestTicks", () => {
  it("takes the highest seq per item, whatever the order", () => {
    const m = latestTicks([
      { itemId: "a", done: true, seq: 5 },
      { itemId: "a", done: false, seq: 9 },
      { itemId: "a", done: true, seq: 7 },
    ]);
    expect(m.get("a")!.seq).toBe(9);
    expect(m.get("a")!.done).toBe(false);
  });
});

describe("stageProgress", () => {
  it("counts items whose newest tick is done, ignoring retired items", () => {
    const p = stageProgress(["aquascape", "fill_leak_test"], items, [
      { itemId: "a", done: true, seq: 1 },
      { itemId: "b", done: true, seq: 2 },
      { itemId: "b", done: false, seq: 3 },
      { itemId: "c", done: true, seq: 4 },
    ]);
    expect(p).toEqual([
      { stage: "aquascape", done: 1, total: 2, complete: false },
      { stage: "fill_leak_test", done: 0, total: 1, complete: false },
    ]);
  });
  it("is complete when every live item is done", () => {
    const [p] = stageProgress(["aquascape"], items, [
      { itemId: "a", done: true, seq: 1 },
      { itemId: "b", done: true, seq: 2 },
    ]);
    expect(p.complete).toBe(true);
  });
  it("never calls an empty stage complete", () => {
    expect(stageProgress(["cycling"], items, [])[0]).toEqual({ stage: "cycling", done: 0, total: 0, complete: false });
  });
});

describe("percent", () => {
  it("rounds and handles an empty stage", () => {
    expect(percent(1, 3)).toBe(33);
    expect(percent(0, 0)).toBe(0);
    expect(percent(2, 2)).toBe(100);
  });
});

describe("checkMeasuredValue", () => {
  const spec = { unit: "mm per m", min: 0, max: 1 };
  it("accepts the range's ends", () => {
    expect(checkMeasuredValue(spec, 0)).toBeNull();
    expect(checkMeasuredValue(spec, 1)).toBeNull();
  });
  it("names the range and unit when outside", () => {
    expect(checkMeasuredValue(spec, 1.5)).toMatch(/outside the allowed 0–1 mm per m/);
    expect(checkMeasuredValue(spec, -0.1)).toMatch(/outside/);
  });
  it("asks for a value when none is given", () => {
    expect(checkMeasuredValue(spec, null)).toMatch(/Enter the measured value in mm per m/);
    expect(checkMeasuredValue(spec, Number.NaN)).toMatch(/Enter/);
  });
});

describe("tick queue helpers", async () => {
  const { isRetryable, parseQueue, pendingLabel, retryDelayMs } = await import("@/lib/install/tick-queue");
  it("backs off 1, 2, 4, 8 s and stays at 8", () => {
    expect([0, 1, 2, 3, 4, 10].map(retryDelayMs)).toEqual([1000, 2000, 4000, 8000, 8000, 8000]);
  });
  it("retries only when there was no real answer", () => {
    expect([0, 503, 500, 429].every(isRetryable)).toBe(true);
    expect([400, 403, 404, 409, 422].some(isRetryable)).toBe(false);
  });
  it("says how many ticks wait", () => {
    expect(pendingLabel(1)).toBe("Waiting to save — 1 tick");
    expect(pendingLabel(2)).toBe("Waiting to save — 2 ticks");
  });
  it("drops a damaged stored queue instead of failing", () => {
    expect(parseQueue("{not json")).toEqual([]);
    expect(parseQueue(JSON.stringify([{ clientKey: "k1234567", itemId: "i", done: true }, { nope: 1 }]))).toHaveLength(1);
  });
});
