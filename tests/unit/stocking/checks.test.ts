import { describe, expect, it } from "vitest";
import {
  canEat,
  checkLength,
  checkOrder,
  checkPh,
  checkPredation,
  checkReef,
  checkShoaling,
  checkTemperament,
  checkTemperature,
  checkWaterKind,
  groupBySpecies,
  requiredTankLengthMm,
} from "@/lib/stocking/checks";
import { checkPlan } from "@/lib/stocking/check-plan";
import { line, sp, tank } from "./fixtures";

// Every threshold below is a rule of thumb (common practice), not a published limit.

describe("water kind", () => {
  it("flags a brackish species in a fresh tank and names both kinds", () => {
    const puffer = sp({ commonName: "Spotted puffer", water: "brackish" });
    const w = checkWaterKind([line(puffer)], tank({ water: "fresh" }));
    expect(w).toHaveLength(1);
    expect(w[0].message).toBe("Spotted puffer lives in brackish water; this tank holds fresh water.");
  });
  it("is silent when the kinds match or the design doesn't say", () => {
    const tetra = sp({ commonName: "Tetra" });
    expect(checkWaterKind([line(tetra)], tank())).toEqual([]);
    expect(checkWaterKind([line(tetra)], tank({ water: null }))).toEqual([]);
  });
});

describe("temperature and pH ranges", () => {
  it("names the pair of species whose temperatures don't meet", () => {
    const cool = sp({ commonName: "Cool minnow", tempC: { min: 14, max: 22 } });
    const warm = sp({ commonName: "Warm discus", tempC: { min: 27, max: 31 } });
    const w = checkTemperature([line(cool), line(warm)], tank({ tempC: null }));
    expect(w.map((x) => x.message)).toEqual(["Temperature: Cool minnow (14–22 °C) and Warm discus (27–31 °C) have no range in common."]);
  });
  it("treats ranges that touch at one degree as overlapping", () => {
    const a = sp({ commonName: "A", tempC: { min: 20, max: 24 } });
    const b = sp({ commonName: "B", tempC: { min: 24, max: 28 } });
    expect(checkTemperature([line(a), line(b)], tank({ tempC: 24 }))).toEqual([]);
  });
  it("flags a species whose range leaves out the tank's set temperature", () => {
    const cool = sp({ commonName: "Cool minnow", tempC: { min: 14, max: 22 } });
    expect(checkTemperature([line(cool)], tank({ tempC: 25 }))[0].message).toBe("Temperature: the tank runs at 25 °C; Cool minnow wants 14–22 °C.");
  });
  it("does the same for pH, pairwise and against the tank", () => {
    const soft = sp({ commonName: "Soft-water tetra", pH: { min: 4.5, max: 6.5 } });
    const hard = sp({ commonName: "Rift cichlid", pH: { min: 7.5, max: 8.5 } });
    const w = checkPh([line(soft), line(hard)], tank({ pH: 7.0 }));
    expect(w.map((x) => x.message)).toEqual([
      "pH: Soft-water tetra (4.5–6.5) and Rift cichlid (7.5–8.5) have no range in common.",
      "pH: the tank runs at pH 7.0; Soft-water tetra wants 4.5–6.5.",
      "pH: the tank runs at pH 7.0; Rift cichlid wants 7.5–8.5.",
    ]);
  });
});

describe("adult length against tank length", () => {
  it("asks for six times the adult length (common practice)", () => {
    const big = sp({ commonName: "Big barb", adultLengthMm: 350 });
    expect(requiredTankLengthMm(big)).toBe(2100);
    expect(checkLength([line(big)], tank({ lengthMm: 1800 }))[0].message).toBe("Big barb grows to about 35 cm and wants a tank at least 210 cm long; this one is 180 cm.");
    expect(checkLength([line(big)], tank({ lengthMm: 2100 }))).toEqual([]);
  });
  it("uses the species' own minimum when it is longer", () => {
    const tall = sp({ commonName: "Tall angel", adultLengthMm: 150, minTankLengthMm: 1200 });
    expect(requiredTankLengthMm(tall)).toBe(1200);
    expect(checkLength([line(tall)], tank({ lengthMm: 1000 }))).toHaveLength(1);
  });
});

describe("temperament and size", () => {
  it("warns when an aggressive species shares with a peaceful one, in either order", () => {
    const bully = sp({ commonName: "Rock cichlid", temperament: "aggressive" });
    const meek = sp({ commonName: "Rasbora" });
    const a = checkTemperament([line(bully), line(meek)]);
    const b = checkTemperament([line(meek), line(bully)]);
    expect(a[0].message).toBe("Rock cichlid is aggressive and Rasbora is peaceful: expect harassment.");
    expect(b[0].key).toBe(a[0].key);
    expect(checkTemperament([line(bully), line(sp({ commonName: "Pushy", temperament: "semi-aggressive" }))])).toEqual([]);
  });
  it("warns when a fish eating animals grows three times the length of another (common practice)", () => {
    const angel = sp({ commonName: "Angel", adultLengthMm: 150, diet: "omnivore" });
    const neon = sp({ commonName: "Neon", adultLengthMm: 35 });
    const tetra = sp({ commonName: "Larger tetra", adultLengthMm: 60 });
    expect(canEat(angel, neon)).toBe(true);
    expect(canEat(angel, tetra)).toBe(false);
    expect(checkPredation([line(angel), line(neon), line(tetra)]).map((w) => w.message)).toEqual(["Angel grows to about 15 cm and can swallow Neon (about 4 cm)."]);
  });
  it("doesn't count a plant-eater as a predator", () => {
    const grazer = sp({ commonName: "Silver grazer", adultLengthMm: 150, diet: "herbivore" });
    expect(checkPredation([line(grazer), line(sp({ commonName: "Neon", adultLengthMm: 35 }))])).toEqual([]);
  });
});

describe("shoaling", () => {
  it("counts a species over every batch against its group minimum", () => {
    const tetra = sp({ commonName: "Neon", shoalMin: 6 });
    expect(checkShoaling([line(tetra, 4, 1)])[0].message).toBe("Neon is kept in groups of 6 or more; the plan has 4.");
    expect(checkShoaling([line(tetra, 4, 1), line(tetra, 2, 2)])).toEqual([]);
  });
});

describe("reef safety", () => {
  const angel = sp({ commonName: "Dwarf angel", water: "salt", coralSafe: false, invertSafe: true });
  const trigger = sp({ commonName: "Trigger", water: "salt", coralSafe: false, invertSafe: false });
  it("warns about coral- or invertebrate-unsafe species only in a reef", () => {
    expect(checkReef([line(angel), line(trigger)], tank({ reef: true })).map((w) => w.message)).toEqual([
      "Dwarf angel isn't safe with corals in a reef.",
      "Trigger isn't safe with corals or invertebrates in a reef.",
    ]);
    expect(checkReef([line(angel)], tank({ reef: false }))).toEqual([]);
  });
});

describe("order of batches", () => {
  it("notes a territorial species planned before a peaceful one (common practice: territorial last)", () => {
    const damsel = sp({ commonName: "Damsel", territorial: true, temperament: "aggressive" });
    const chromis = sp({ commonName: "Chromis" });
    const w = checkOrder([line(damsel, 1, 1), line(chromis, 6, 2)]);
    expect(w[0].message).toBe("Territorial Damsel (batch 1) is planned before peaceful Chromis (batch 2); territorial fish usually go in last.");
    expect(w[0].severity).toBe("note");
    expect(checkOrder([line(chromis, 6, 1), line(damsel, 1, 2)])).toEqual([]);
  });
});

describe("checkPlan", () => {
  it("groups species across batches and lists warnings before notes", () => {
    const tetra = sp({ commonName: "Neon", shoalMin: 6 });
    expect(groupBySpecies([line(tetra, 3, 1), line(tetra, 2, 3)])).toEqual([{ species: tetra, count: 5, firstBatch: 1, lastBatch: 3 }]);
    const damsel = sp({ commonName: "Damsel", territorial: true, temperament: "aggressive" });
    const w = checkPlan([line(damsel, 1, 1), line(tetra, 5, 2)], tank());
    expect(w.map((x) => x.rule)).toEqual(["temperament", "shoaling", "order"]);
  });
});
