import { describe, expect, it } from "vitest";
import { evaluateCycle } from "@/lib/cycling/evaluate-cycle";
import { describeCycleForClient, describeTrend } from "@/lib/cycling/summary";
import { at, reading, wholeCycle } from "./cycle-fixtures";

const cycle = wholeCycle();
const upTo = (day: number) => cycle.slice(0, day + 1);
const clientText = (day: number) => describeCycleForClient(evaluateCycle(upTo(day), { now: at(day, 1) }), upTo(day));

describe("describeTrend", () => {
  it("reads the week before the newest test", () => {
    expect(describeTrend(upTo(10), "ammonia")).toBe("falling"); // 2 on day 3 → 0.5 on day 10
    expect(describeTrend(upTo(10), "nitrite")).toBe("rising"); // 0.25 on day 3 → 2 on day 10
    expect(describeTrend(upTo(30), "nitrite")).toBe("falling");
    expect(describeTrend(upTo(30), "ammonia")).toBe("steady");
    expect(describeTrend(upTo(30), "nitrate")).toBe("rising");
  });

  it("is unknown with a single test or none", () => {
    expect(describeTrend(upTo(0), "ammonia")).toBe("unknown");
    expect(describeTrend([reading(at(0), { nitrateMgL: 5 })], "ammonia")).toBe("unknown");
  });
});

describe("describeCycleForClient", () => {
  it("describes each stage of the invented cycle", () => {
    expect(describeCycleForClient(evaluateCycle([], { now: at(0) }), [])).toBe(
      "No water tests have been recorded yet; progress will show here once testing starts.",
    );
    expect(clientText(0)).toBe("The tank's cycle hasn't started yet: no ammonia has shown up in the water tests so far.");
    expect(clientText(10)).toBe(
      "Ammonia is falling, nitrite is rising: the bacteria are establishing. About two to four more weeks is common.",
    );
    expect(clientText(25)).toBe(
      "Ammonia has cleared and nitrite is falling: the second group of bacteria is catching up. About one to two more weeks is common.",
    );
    expect(clientText(33)).toBe(
      "Ammonia and nitrite now read zero; we're confirming with further tests before any fish go in.",
    );
    expect(clientText(34)).toMatch(/^The tank has finished cycling/);
  });

  it("names the trend when the first stage isn't textbook", () => {
    expect(clientText(2)).toBe(
      "Ammonia is rising and nitrite hasn't appeared yet: the first bacteria are still establishing. About two to four more weeks is common.",
    );
    const steadyNitrite = [2, 1, 0.5].map((a, d) => reading(at(d), { ammoniaMgL: a, nitriteMgL: 1, nitrateMgL: 0 }));
    expect(describeCycleForClient(evaluateCycle(steadyNitrite, { now: at(2, 1) }), steadyNitrite)).toBe(
      "Ammonia is falling and nitrite is holding steady: the first bacteria are still establishing. About two to four more weeks is common.",
    );
  });

  it("explains a stall", () => {
    const flat = Array.from({ length: 12 }, (_, d) => reading(at(d), { ammoniaMgL: 0, nitriteMgL: 5, nitrateMgL: 20 }));
    expect(describeCycleForClient(evaluateCycle(flat, { now: at(11, 1) }), flat)).toBe(
      "Progress has paused: ammonia and nitrite haven't changed in ten days. We're checking the water chemistry to get it moving again.",
    );
  });
});

describe("describeCycleForClient: the textbook sentence needs both trends", () => {
  it("ammonia steady while nitrite rises is not called 'ammonia is falling'", () => {
    const readings = [0, 1, 2].map((d) => reading(at(d), { ammoniaMgL: 2, nitriteMgL: [0.25, 0.5, 1][d], nitrateMgL: 0 }));
    const evaluation = evaluateCycle(readings, { now: at(2, 1) });
    expect(evaluation.phase).toBe("ammonia-falling");
    expect(describeCycleForClient(evaluation, readings)).toBe(
      "Ammonia is holding steady and nitrite is rising: the first bacteria are still establishing. About two to four more weeks is common.",
    );
  });
});
