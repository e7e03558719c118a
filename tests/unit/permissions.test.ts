import { describe, expect, it } from "vitest";
import { canOnProject, canSeeProject } from "@/lib/auth/permissions";

describe("project permissions", () => {
  it("lets the lead see and do everything", () => {
    const rel = { role: "lead" as const, assigned: false, owner: false };
    expect(canSeeProject(rel)).toBe(true);
    expect(canOnProject(rel, "override_gate")).toBe(true);
    expect(canOnProject(rel, "void_water_test")).toBe(true);
  });

  it("lets crew work only assigned projects, never override or approve", () => {
    expect(canSeeProject({ role: "crew", assigned: false, owner: false })).toBe(false);
    const rel = { role: "crew" as const, assigned: true, owner: false };
    expect(canOnProject(rel, "move")).toBe(true);
    expect(canOnProject(rel, "tick_checklist")).toBe(true);
    expect(canOnProject(rel, "override_gate")).toBe(false);
    expect(canOnProject(rel, "approve_load")).toBe(false);
    expect(canOnProject(rel, "void_water_test")).toBe(false);
  });

  it("lets a client see only their own project, log tests, upload and message", () => {
    expect(canSeeProject({ role: "client", assigned: false, owner: false })).toBe(false);
    const rel = { role: "client" as const, assigned: false, owner: true };
    expect(canOnProject(rel, "log_water_test")).toBe(true);
    expect(canOnProject(rel, "send_message")).toBe(true);
    expect(canOnProject(rel, "move")).toBe(false);
    expect(canOnProject(rel, "tick_checklist")).toBe(false);
  });
});
