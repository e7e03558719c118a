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

describe("money permissions", () => {
  it("lets the lead manage money, the owning client see, accept and pay, and crew nothing", () => {
    const lead = { role: "lead" as const, assigned: false, owner: false };
    const crew = { role: "crew" as const, assigned: true, owner: false };
    const client = { role: "client" as const, assigned: false, owner: true };
    expect(canOnProject(lead, "manage_money")).toBe(true);
    expect(canOnProject(lead, "see_money")).toBe(true);
    // Accepting and paying are the client's own acts: not even the lead does them in their place.
    expect(canOnProject(lead, "accept_and_pay")).toBe(false);
    for (const a of ["see_money", "manage_money", "accept_and_pay"] as const) expect(canOnProject(crew, a)).toBe(false);
    expect(canOnProject(client, "see_money")).toBe(true);
    expect(canOnProject(client, "accept_and_pay")).toBe(true);
    expect(canOnProject(client, "manage_money")).toBe(false);
    expect(canOnProject({ ...client, owner: false }, "accept_and_pay")).toBe(false);
  });
});
