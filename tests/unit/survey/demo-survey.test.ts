import { describe, expect, it } from "vitest";
import { DEMO_DESIGNS, DEMO_SURVEYS } from "@/db/seed/demo-survey";
import { DEMO_PROJECTS } from "@/db/seed/demo-projects";
import { loadCheck } from "@/lib/survey/load-check";
import { isSurveyComplete } from "@/lib/survey/survey-missing";
import { tankDesignSchema } from "@/lib/survey/tank-design.schema";

describe("demo surveys and designs", () => {
  it("cover every demo project from the stand & load check on, with complete surveys and valid designs", () => {
    const later = DEMO_PROJECTS.filter((p) => p.stage !== "site_survey");
    for (const p of later) {
      expect(DEMO_DESIGNS[p.key], p.key).toBeTruthy();
      expect(isSurveyComplete(DEMO_SURVEYS[p.key]), p.key).toBe(true);
      const parsed = tankDesignSchema.safeParse(DEMO_DESIGNS[p.key]);
      expect(parsed.success ? [] : parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`), p.key).toEqual([]);
      const r = loadCheck(DEMO_DESIGNS[p.key], DEMO_SURVEYS[p.key]);
      expect(r.glass.ok, `${p.key}: ${r.glass.panels.map((x) => x.message).join(" ")}`).toBe(true);
      expect(r.access?.tank.fits, p.key).toBe(true);
    }
  });
});
