import { describe, expect, it } from "vitest";
import { catalogueRecords } from "@/db/seed/species/seed";
import { speciesSchema } from "@/app/api/species/species.schema";
import { canOnProject } from "@/lib/auth/permissions";

describe("the starting species catalogue", () => {
  const records = catalogueRecords();
  it("holds about forty species of each water kind", () => {
    for (const water of ["fresh", "brackish", "salt"]) {
      const n = records.filter((r) => r.water === water).length;
      expect(n).toBeGreaterThanOrEqual(38);
      expect(n).toBeLessThanOrEqual(45);
    }
  });
  it("passes the lead's own form checks, names each species once and says where every value came from", () => {
    for (const r of records) {
      const parsed = speciesSchema.safeParse(r);
      expect(parsed.success, `${r.commonName}: ${JSON.stringify(parsed.error?.issues)}`).toBe(true);
      expect(r.source).toBe("from memory");
      if (r.water !== "salt") expect([r.coralSafe, r.invertSafe]).toEqual([null, null]);
    }
    expect(new Set(records.map((r) => r.scientificName)).size).toBe(records.length);
  });
});

describe("who may touch the fish", () => {
  const lead = { role: "lead" as const, assigned: false, owner: false };
  const crew = { role: "crew" as const, assigned: true, owner: false };
  const client = { role: "client" as const, assigned: false, owner: true };
  it("lets the lead plan, crew view the plan and keep the record, and the client only look", () => {
    expect(canOnProject(lead, "edit_stocking_plan")).toBe(true);
    expect(canOnProject(lead, "override_quarantine")).toBe(true);
    expect(canOnProject(crew, "view_stocking_plan")).toBe(true);
    expect(canOnProject(crew, "edit_stocking_plan")).toBe(false);
    expect(canOnProject(crew, "override_quarantine")).toBe(false);
    expect(canOnProject(crew, "record_livestock")).toBe(true);
    expect(canOnProject(crew, "record_quarantine")).toBe(true);
    expect(canOnProject(client, "view_livestock")).toBe(true);
    expect(canOnProject(client, "record_livestock")).toBe(false);
    expect(canOnProject(client, "view_stocking_plan")).toBe(false);
    expect(canOnProject({ ...client, owner: false }, "view_livestock")).toBe(false);
  });
});
