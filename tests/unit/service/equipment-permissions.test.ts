import { describe, expect, it } from "vitest";
import { canOnProject } from "@/lib/auth/permissions";

describe("who may keep a tank's equipment register", () => {
  it("is the lead and the assigned crew; the client and anyone else may not", () => {
    expect(canOnProject({ role: "lead", assigned: false, owner: false }, "edit_equipment")).toBe(true);
    expect(canOnProject({ role: "crew", assigned: true, owner: false }, "edit_equipment")).toBe(true);
    expect(canOnProject({ role: "crew", assigned: false, owner: false }, "edit_equipment")).toBe(false);
    expect(canOnProject({ role: "client", assigned: false, owner: true }, "edit_equipment")).toBe(false);
    // The client reads the register through "view", without the team's notes ("view_internal").
    expect(canOnProject({ role: "client", assigned: false, owner: true }, "view")).toBe(true);
    expect(canOnProject({ role: "client", assigned: false, owner: true }, "view_internal")).toBe(false);
  });
});
