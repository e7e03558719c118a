import { describe, expect, it } from "vitest";
import { countWord, formatAgo, formatDuration, formatMgL, formatRuleSpan } from "@/lib/cycling/wording";

describe("wording", () => {
  it("rounds durations to the unit a person would use", () => {
    expect(formatDuration(0.5)).toBe("30 minutes");
    expect(formatDuration(1)).toBe("an hour");
    expect(formatDuration(6.2)).toBe("6 hours");
    expect(formatDuration(47.9)).toBe("48 hours");
    expect(formatDuration(48)).toBe("2 days");
    expect(formatDuration(73)).toBe("3 days");
  });

  it("writes rule spans and ages in words", () => {
    expect(formatRuleSpan(24)).toBe("a day");
    expect(formatRuleSpan(48)).toBe("2 days");
    expect(formatRuleSpan(12)).toBe("12 hours");
    expect(formatAgo(0)).toBe("just now");
    expect(formatAgo(-0.5)).toBe("just now");
    expect(formatAgo(30)).toBe("30 hours ago");
  });

  it("spells small counts and trims concentrations", () => {
    expect(countWord(2)).toBe("two");
    expect(countWord(12)).toBe("12");
    expect(formatMgL(0.25)).toBe("0.25 mg/L");
    expect(formatMgL(0.1 + 0.2)).toBe("0.3 mg/L");
  });
});
