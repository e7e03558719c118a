// The floor screening's verdicts at their edges and its sentences word for word. Slab figures use
// BS 8004's 75 kPa (en-uk, from memory) so the ratios come out exact; "far over" above twice the
// allowance is our own threshold.
import { describe, expect, it } from "vitest";
import { screenFloor, type FloorScreenInput } from "@/lib/tank/floor";

const stand = { lengthMm: 1200, widthMm: 500, footprint: { kind: "solid" as const, lengthMm: 1200, widthMm: 500 } };
const slab = (pressureKPa: number): FloorScreenInput => ({
  totalWeightKN: 10,
  pressureKPa,
  stand,
  roomUse: "living",
  floorType: "concrete slab",
  floorLevel: "ground",
  code: "en-uk",
});
const STILL_LOOK =
  "Still look at: cracks, settlement or damp in the slab; pipes, drains or cables under it; how thick it is and what it sits on (made or soft ground isn't covered).";

describe("screenFloor: a ground-bearing slab", () => {
  it("exactly at the bearing value is under it, in full", () => {
    const r = screenFloor(slab(75));
    expect(r).toMatchObject({ method: "slab", verdict: "under", ratio: 1, needsEngineer: false, slab: { pressureKPa: 75, bearingKPa: 75 } });
    expect(r.messages).toEqual([
      "The stand's footprint pressure is within the lowest bearing value the code lists for the ground under a slab.",
      STILL_LOOK,
    ]);
    expect(r.sources).toEqual([
      "Lowest presumptive bearing value 75 kN/m²: BS 8004, presumed allowable bearing value, firm clay lower limit (from memory)",
      "Pressure = total weight / footprint area",
    ]);
  });

  it("exactly twice the bearing value is over, not far over; above it is far over", () => {
    const over = screenFloor(slab(150));
    expect(over).toMatchObject({ verdict: "over", ratio: 2, needsEngineer: true });
    expect(over.messages[0]).toBe(
      "The stand's footprint pressure is more than the lowest bearing value the code lists for the ground: have a structural engineer look at the slab and the ground.",
    );
    expect(screenFloor(slab(151)).verdict).toBe("far over");
  });
});

describe("screenFloor: floors it doesn't screen say why", () => {
  const engineer = "A structural engineer decides before the tank is filled.";
  it("a slab above the ground", () => {
    const r = screenFloor({ ...slab(10), floorLevel: "upper" });
    expect(r).toMatchObject({ method: "none", verdict: "not screened", ratio: null, sources: [], needsEngineer: true });
    expect(r.messages).toEqual([
      "A concrete slab above the ground is a suspended floor (or its level isn't recorded): we don't screen it.",
      engineer,
    ]);
  });
  it("suspended concrete", () => {
    expect(screenFloor({ ...slab(10), floorType: "suspended concrete" }).messages).toEqual([
      "We don't screen suspended concrete floors: their strength depends on reinforcement we can't see.",
      engineer,
    ]);
  });
  it("any other floor", () => {
    expect(screenFloor({ ...slab(10), floorType: "other" }).messages).toEqual(["We can't screen this kind of floor.", engineer]);
  });
});

describe("screenFloor: joists", () => {
  const joists = (over: Partial<FloorScreenInput> = {}, j = {}): FloorScreenInput => ({
    ...slab(0),
    floorType: "timber joists",
    totalWeightKN: 8,
    joists: { spanMm: 4000, spacingMm: 400, distanceFromSupportMm: 1000, direction: "perpendicular", ...j },
    ...over,
  });

  it("a stand reaching past the span is not screened and goes to an engineer", () => {
    const r = screenFloor(joists({}, { distanceFromSupportMm: 3800 }));
    expect(r).toMatchObject({ verdict: "not screened", ratio: null, needsEngineer: true });
    expect(r.messages).toEqual([
      "The stand reaches past the joists' span onto the next support: this screening can't place it. A structural engineer decides.",
    ]);
    expect(r.joists?.beyondSpan).toBe(true);
  });

  it("no direction given is taken as unknown, the worse way round", () => {
    const r = screenFloor(joists({}, { direction: undefined }));
    expect(r.messages).toContain(
      "Which way the joists run isn't known: we took the worse way round. Find out; a tank across the joists spreads its weight over more of them.",
    );
  });

  it("legs each carrying more than the code's concentrated load (2.0 kN, UK NA, from memory) are told to spread it; at or under it they aren't", () => {
    const legs = (count: number) => ({ ...stand, footprint: { kind: "legs" as const, count, legLengthMm: 80, legWidthMm: 80 } });
    const spread = "Each leg carries more than the concentrated load the code designs a floor for: spread it.";
    // 8 kN on 4 legs = 2.0 kN a leg: not more than 2.0
    expect(screenFloor(joists({ stand: legs(4) })).messages).not.toContain(spread);
    // 8 kN on 3 legs = 2.67 kN a leg
    expect(screenFloor(joists({ stand: legs(3) })).messages).toContain(spread);
    // 8 kN on 6 legs = 1.33 kN a leg
    expect(screenFloor(joists({ stand: legs(6) })).messages).not.toContain(spread);
  });
});
