import { describe, expect, it } from "vitest";
import { skippedStages } from "@/lib/stages/skipped";

describe("skippedStages", () => {
  it("lists the stages a forward move jumps over", () => {
    expect(skippedStages("cycling", "in_service")).toEqual(["first_stocking"]);
    expect(skippedStages("site_survey", "fill_leak_test")).toEqual(["stand_load_check", "aquascape"]);
  });
  it("is empty for one stage forward, the same stage, or a move back", () => {
    expect(skippedStages("cycling", "first_stocking")).toEqual([]);
    expect(skippedStages("cycling", "cycling")).toEqual([]);
    expect(skippedStages("in_service", "site_survey")).toEqual([]);
  });
});
