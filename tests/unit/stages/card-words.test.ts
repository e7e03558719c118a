import { describe, expect, it } from "vitest";
import { dayWords, peopleWords, shortNames, sinceWords } from "@/lib/stages/card-words";

const now = new Date("2026-12-02T09:00:00Z");

describe("card words", () => {
  it("says time in a stage as a day, not a count", () => {
    expect(sinceWords("2026-12-02T01:00:00Z", now)).toBe("here since today");
    expect(sinceWords("2026-12-01T23:59:00Z", now)).toBe("here since yesterday");
    expect(sinceWords("2026-11-29T12:00:00Z", now)).toBe("here since 29 Nov");
    expect(sinceWords("2025-11-29T12:00:00Z", now)).toBe("here since 29 Nov 2025");
    expect(sinceWords("not a date", now)).toBe("here since an unknown day");
    // A clock a little ahead on another device still reads as today.
    expect(sinceWords("2026-12-02T10:00:00Z", now)).toBe("here since today");
    expect(dayWords("2027-01-03T00:00:00Z", now)).toBe("3 Jan 2027");
  });

  it("names people by first name, with an initial only where two share one", () => {
    expect(shortNames(["Teodor Lind", "Priya Castell"])).toEqual(["Teodor", "Priya"]);
    expect(shortNames(["Sam Bell", "Sam Kerr", "Ana"])).toEqual(["Sam B.", "Sam K.", "Ana"]);
    expect(shortNames(["  "])).toEqual(["Someone"]);
  });

  it("puts the lead first and the crew after", () => {
    expect(peopleWords("Maren Okafor", ["Teo Lind", "Priya Castell"])).toBe("Maren with Teo, Priya");
    expect(peopleWords("Maren Okafor", [])).toBe("Maren");
    expect(peopleWords(null, ["Teo Lind", "Priya Castell"])).toBe("Teo, Priya");
    expect(peopleWords(null, [])).toBe("Nobody assigned yet");
  });
});
