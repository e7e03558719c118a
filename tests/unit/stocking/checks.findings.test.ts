import { describe, expect, it } from "vitest";
import { canEat, checkLength, checkOrder, checkPh, checkPredation, checkReef, checkShoaling, checkTemperament, checkTemperature, checkWaterKind } from "@/lib/stocking/checks";
import { checkBioload, estimateBioload } from "@/lib/stocking/bioload";
import { quarantineVerdict } from "@/lib/stocking/quarantine";
import { insideLengthMm, tankFacts } from "@/lib/stocking/tank-facts";
import { overlap } from "@/lib/stocking/ranges";
import { COUNTED_KINDS, EVENT_LABELS, applyEvent, censusOf, growthSeries } from "@/lib/stocking/census";
import { fishCountWords, growthWords } from "@/lib/stocking/client-words";
import { BRACKISH_BELOW_PSU, WATER_LABELS, tankWaterKind } from "@/lib/stocking/species";
import { demoDesign } from "../tank/fixtures";
import { line, sp, tank } from "./fixtures";

// Each finding is checked whole: its rule, its key (one per pair or species, the same whichever way
// round the plan lists them), its severity, its words and the species it names. The thresholds are
// common practice (see lib/stocking), not published limits.

describe("each check's finding, whole", () => {
  it("water kind", () => {
    const puffer = sp({ id: "b-puffer", commonName: "Spotted puffer", water: "brackish" });
    expect(checkWaterKind([line(puffer)], tank())).toEqual([
      { rule: "water", key: "water:b-puffer", severity: "warning", message: "Spotted puffer lives in brackish water; this tank holds fresh water.", speciesIds: ["b-puffer"] },
    ]);
  });
  it("temperature: a pair, keyed the same either way round, and the tank's own setting", () => {
    const cool = sp({ id: "z-cool", commonName: "Cool minnow", tempC: { min: 14, max: 22 } });
    const warm = sp({ id: "a-warm", commonName: "Warm discus", tempC: { min: 27, max: 31 } });
    const pair = {
      rule: "temperature",
      key: "temperature:a-warm+z-cool",
      severity: "warning",
      message: "Temperature: Cool minnow (14–22 °C) and Warm discus (27–31 °C) have no range in common.",
      speciesIds: ["z-cool", "a-warm"],
    };
    expect(checkTemperature([line(cool), line(warm)], tank({ tempC: null }))).toEqual([pair]);
    expect(checkTemperature([line(warm), line(cool)], tank({ tempC: null }))[0].key).toBe("temperature:a-warm+z-cool");
    expect(checkTemperature([line(cool)], tank({ tempC: 25 }))).toEqual([
      { rule: "temperature", key: "temperature:tank+z-cool", severity: "warning", message: "Temperature: the tank runs at 25 °C; Cool minnow wants 14–22 °C.", speciesIds: ["z-cool"] },
    ]);
  });
  it("pH: a pair and the tank's own pH, one decimal", () => {
    const soft = sp({ id: "s", commonName: "Soft-water tetra", pH: { min: 5.5, max: 6.5 } });
    const hard = sp({ id: "h", commonName: "Hard-water livebearer", pH: { min: 7.5, max: 8.5 } });
    expect(checkPh([line(soft), line(hard)], tank({ pH: null }))).toEqual([
      { rule: "ph", key: "ph:h+s", severity: "warning", message: "pH: Soft-water tetra (5.5–6.5) and Hard-water livebearer (7.5–8.5) have no range in common.", speciesIds: ["s", "h"] },
    ]);
    expect(checkPh([line(soft)], tank({ pH: 7.0 }))).toEqual([
      { rule: "ph", key: "ph:tank+s", severity: "warning", message: "pH: the tank runs at pH 7.0; Soft-water tetra wants 5.5–6.5.", speciesIds: ["s"] },
    ]);
  });
  it("length, and nothing when the tank's length isn't known", () => {
    const big = sp({ id: "big", commonName: "Big cichlid", adultLengthMm: 300 });
    expect(checkLength([line(big)], tank({ lengthMm: 1200 }))).toEqual([
      { rule: "length", key: "length:big", severity: "warning", message: "Big cichlid grows to about 30 cm and wants a tank at least 180 cm long; this one is 120 cm.", speciesIds: ["big"] },
    ]);
    expect(checkLength([line(big)], tank({ lengthMm: null }))).toEqual([]);
  });
  it("temperament names the bully first, whichever way round the plan lists them", () => {
    const bully = sp({ id: "x-bully", commonName: "Red devil", temperament: "aggressive" });
    const meek = sp({ id: "a-meek", commonName: "Glass tetra", temperament: "peaceful" });
    const finding = {
      rule: "temperament",
      key: "temperament:a-meek+x-bully",
      severity: "warning",
      message: "Red devil is aggressive and Glass tetra is peaceful: expect harassment.",
      speciesIds: ["x-bully", "a-meek"],
    };
    expect(checkTemperament([line(bully), line(meek)])).toEqual([finding]);
    expect(checkTemperament([line(meek), line(bully)])).toEqual([finding]);
    expect(checkTemperament([line(bully), line(sp({ commonName: "Other", temperament: "semi-aggressive" }))])).toEqual([]);
  });
  it("predation: who can swallow whom, at a third of the predator's length exactly", () => {
    const pike = sp({ id: "pike", commonName: "Pike cichlid", adultLengthMm: 150, diet: "carnivore" });
    const snack = sp({ id: "snack", commonName: "Ember fish", adultLengthMm: 50 });
    expect(checkPredation([line(pike), line(snack)])).toEqual([
      { rule: "predation", key: "predation:pike>snack", severity: "warning", message: "Pike cichlid grows to about 15 cm and can swallow Ember fish (about 5 cm).", speciesIds: ["pike", "snack"] },
    ]);
    expect(canEat(pike, sp({ commonName: "Just too big", adultLengthMm: 51 }))).toBe(false);
    expect(canEat(sp({ commonName: "Omnivore", adultLengthMm: 150, diet: "omnivore" }), snack)).toBe(true);
    expect(canEat(sp({ commonName: "Grazer", adultLengthMm: 150, diet: "herbivore" }), snack)).toBe(false);
    // A species never preys on itself, even one too small to measure.
    const speck = sp({ commonName: "Speck", adultLengthMm: 0, diet: "carnivore" });
    expect(canEat(speck, speck)).toBe(false);
  });
  it("shoaling counts every batch, and a species kept alone is never short", () => {
    const rasbora = sp({ id: "r", commonName: "Harlequin rasbora", shoalMin: 8 });
    expect(checkShoaling([line(rasbora, 3, 1), line(rasbora, 2, 2)])).toEqual([
      { rule: "shoaling", key: "shoaling:r", severity: "warning", message: "Harlequin rasbora is kept in groups of 8 or more; the plan has 5.", speciesIds: ["r"] },
    ]);
    expect(checkShoaling([line(rasbora, 8)])).toEqual([]);
    expect(checkShoaling([line(sp({ commonName: "Loner", shoalMin: 1 }), 1)])).toEqual([]);
  });
  it("reef: names what a species harms, and nothing for a safe one or outside a reef", () => {
    const nipper = sp({ id: "n", commonName: "Nipper", water: "salt", coralSafe: false, invertSafe: false });
    const shrimpEater = sp({ id: "e", commonName: "Shrimp eater", water: "salt", coralSafe: true, invertSafe: false });
    const safe = sp({ id: "k", commonName: "Safe goby", water: "salt", coralSafe: true, invertSafe: true });
    expect(checkReef([line(nipper), line(shrimpEater), line(safe)], tank({ reef: true, water: "salt" }))).toEqual([
      { rule: "reef", key: "reef:n", severity: "warning", message: "Nipper isn't safe with corals or invertebrates in a reef.", speciesIds: ["n"] },
      { rule: "reef", key: "reef:e", severity: "warning", message: "Shrimp eater isn't safe with invertebrates in a reef.", speciesIds: ["e"] },
    ]);
    expect(checkReef([line(nipper)], tank({ reef: false, water: "salt" }))).toEqual([]);
  });
  it("order: a note only when a territorial species goes in before a peaceful, non-territorial one", () => {
    const damsel = sp({ id: "d", commonName: "Damsel", territorial: true, temperament: "semi-aggressive" });
    const chromis = sp({ id: "c", commonName: "Chromis" });
    expect(checkOrder([line(damsel, 1, 1), line(chromis, 5, 2)])).toEqual([
      {
        rule: "order",
        key: "order:d<c",
        severity: "note",
        message: "Territorial Damsel (batch 1) is planned before peaceful Chromis (batch 2); territorial fish usually go in last.",
        speciesIds: ["d", "c"],
      },
    ]);
    // The same batch, or after: no note.
    expect(checkOrder([line(damsel, 1, 2), line(chromis, 5, 2)])).toEqual([]);
    // Only peaceful, non-territorial fish count as the ones to protect; a fish that isn't territorial is never the first of the pair.
    expect(checkOrder([line(damsel, 1, 1), line(sp({ commonName: "Bold", temperament: "semi-aggressive" }), 1, 2)])).toEqual([]);
    expect(checkOrder([line(damsel, 1, 1), line(sp({ commonName: "Quiet guard", territorial: true }), 1, 2)])).toEqual([]);
    expect(checkOrder([line(chromis, 1, 1), line(sp({ commonName: "Later tetra" }), 1, 2)])).toEqual([]);
  });
});

describe("bioload", () => {
  const tetra = sp({ id: "t", commonName: "Tetra", adultLengthMm: 40 });
  it("has no estimate without a known, positive volume and a water kind", () => {
    expect(estimateBioload([line(tetra)], tank({ netVolumeL: null }))).toBeNull();
    expect(estimateBioload([line(tetra)], tank({ netVolumeL: 0 }))).toBeNull();
    expect(estimateBioload([line(tetra)], tank({ water: null }))).toBeNull();
    expect(estimateBioload([line(tetra)], tank({ netVolumeL: 2 }))?.allowanceCm).toBe(1);
  });
  it("at exactly the allowance is close to it, one fish more is over it", () => {
    // 25 tetras of 4 cm = 100 cm against 200 L ÷ 2 L per cm = 100 cm: 100 %.
    expect(checkBioload([line(tetra, 25)], tank({ netVolumeL: 200 }))).toEqual([
      {
        rule: "bioload",
        key: "bioload",
        severity: "note",
        message: "Close to the rough stocking allowance: 100 cm of adult fish against about 100 cm (100%). About 1 cm of adult fish per 2 L of net water in fresh water (common practice; a rough guide).",
        speciesIds: ["t"],
      },
    ]);
    expect(checkBioload([line(tetra, 26)], tank({ netVolumeL: 200 }))[0]).toMatchObject({ severity: "warning", message: expect.stringMatching(/^Over the rough stocking allowance: 104 cm/) });
  });
});

describe("quarantine's words", () => {
  const now = new Date("2026-12-02T12:00:00Z");
  it("says a batch hasn't been quarantined, and how many days are left, in the singular too", () => {
    expect(quarantineVerdict({ startedAt: null, days: 28, now, override: null })).toEqual({ done: false, reason: "This batch hasn't been through quarantine; put it in a holding tank first." });
    expect(quarantineVerdict({ startedAt: new Date("2026-11-05T12:00:00Z"), days: 28, now, override: null })).toEqual({ done: false, reason: "Quarantine runs 28 days; 1 day is left." });
    expect(quarantineVerdict({ startedAt: new Date("2026-11-04T12:00:00Z"), days: 28, now, override: null })).toEqual({ done: true, reason: null });
  });
});

describe("what the checks know of a tank", () => {
  it("reads the water kind, inside length and set temperature from the design", () => {
    const d = demoDesign();
    expect(tankFacts({ design: d, netVolumeL: 600, reef: false, pH: 7.2 })).toEqual({
      water: tankWaterKind(d.water as "fresh" | "salt", d.salinityPsu),
      lengthMm: d.lengthMm - 2 * d.panelThicknessMm,
      netVolumeL: 600,
      tempC: d.temperatureC,
      pH: 7.2,
      reef: false,
    });
    expect(tankFacts({ design: null, netVolumeL: null, reef: true, pH: null })).toEqual({ water: null, lengthMm: null, netVolumeL: null, tempC: null, pH: null, reef: true });
    expect(tankFacts({ design: { ...d, water: "salt", salinityPsu: 35 }, netVolumeL: 1, reef: true, pH: null }).water).toBe("salt");
    expect(tankFacts({ design: { ...d, temperatureC: Number.NaN }, netVolumeL: 1, reef: false, pH: null }).tempC).toBeNull();
    // A design saved before water kinds were recorded says neither.
    expect(tankFacts({ design: { ...d, water: undefined as unknown as "fresh" }, netVolumeL: 1, reef: false, pH: null }).water).toBeNull();
  });
  it("has no inside length when the walls leave nothing, or a figure is missing", () => {
    const d = demoDesign();
    expect(insideLengthMm({ ...d, lengthMm: 30, panelThicknessMm: 15 })).toBeNull();
    expect(insideLengthMm({ ...d, lengthMm: 31, panelThicknessMm: 15 })).toBe(1);
    expect(insideLengthMm({ ...d, lengthMm: Number.NaN })).toBeNull();
    expect(insideLengthMm({ ...d, panelThicknessMm: Number.NaN })).toBeNull();
    expect(insideLengthMm({ ...d, lengthMm: Number.POSITIVE_INFINITY })).toBeNull();
  });
  it("calls salt water below 25 psu brackish (common practice)", () => {
    expect(BRACKISH_BELOW_PSU).toBe(25);
    expect(tankWaterKind("salt", 24.9)).toBe("brackish");
    expect(tankWaterKind("salt", 25)).toBe("salt");
    expect(tankWaterKind("salt", null)).toBe("salt");
  });
  it("ranges meet at a single shared point", () => {
    expect(overlap({ min: 20, max: 24 }, { min: 24, max: 28 })).toEqual({ min: 24, max: 24 });
  });
});

describe("the census at its edges", () => {
  it("moves or removes exactly as many fish as there are, and refuses one more, saying how many there are", () => {
    expect(applyEvent({ display: 3, holding: 0 }, { kind: "lost", count: 3 })).toEqual({ ok: true, state: { display: 0, holding: 0 } });
    expect(applyEvent({ display: 3, holding: 0 }, { kind: "lost", count: 4 })).toEqual({ ok: false, message: "Only 3 fish are in the display; you can't move or remove 4." });
    expect(applyEvent({ display: 0, holding: 1 }, { kind: "from_holding", count: 2 })).toEqual({ ok: false, message: "Only 1 fish is in the holding tank; you can't move or remove 2." });
  });
  it("refuses a history that doesn't add up, with the same words", () => {
    expect(() => censusOf([{ kind: "added", count: 2 }, { kind: "lost", count: 3 }])).toThrow("Only 2 fish are in the display; you can't move or remove 3.");
  });
  it("charts only measured events that have a length", () => {
    const at = (d: string) => new Date(`2026-11-${d}T10:00:00Z`);
    expect(
      growthSeries([
        { kind: "measured", at: at("20"), lengthMm: 31 },
        { kind: "measured", at: at("10"), lengthMm: null },
        { kind: "behaviour", at: at("12"), lengthMm: 40 },
        { kind: "measured", at: at("05"), lengthMm: 25 },
      ]),
    ).toEqual([
      { at: at("05"), lengthMm: 25 },
      { at: at("20"), lengthMm: 31 },
    ]);
  });
  it("tells the client about one fish and about growth since the first measurement", () => {
    expect(fishCountWords(1)).toBe("1 fish");
    expect(fishCountWords(0)).toBe("0 fish");
    expect(growthWords([{ lengthCm: 3.5, when: "4 Nov" }], 60)).toBe("Last measured at about 3.5 cm; fully grown is about 6 cm.");
    expect(growthWords([{ lengthCm: 2, when: "4 Nov" }, { lengthCm: 3.5, when: "30 Nov" }], 60)).toBe("Last measured at about 3.5 cm, up from 2.0 cm on 4 Nov; fully grown is about 6 cm.");
  });
});

describe("the stocking words, value by value", () => {
  it("names each event kind, counts the ones that move fish, and names each water kind", () => {
    expect(EVENT_LABELS).toEqual({
      added: "Added",
      lost: "Lost",
      to_holding: "Moved to a holding tank",
      from_holding: "Back from a holding tank",
      rehomed: "Rehomed",
      measured: "Measured",
      behaviour: "Behaviour note",
    });
    expect(COUNTED_KINDS).toEqual(["added", "lost", "to_holding", "from_holding", "rehomed"]);
    expect(WATER_LABELS).toEqual({ fresh: "fresh water", brackish: "brackish water", salt: "salt water" });
  });
});
