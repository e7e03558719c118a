import { describe, expect, it } from "vitest";
import { canOnProject, canSeeProject, type ProjectAction, type Relation } from "@/lib/auth/permissions";
import { ROLE_HOME, ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import { personNameField, phoneField } from "@/lib/people/contact-fields";

const ACTIONS: ProjectAction[] = [
  "view", "move", "override_gate", "edit_survey", "approve_load", "tick_checklist", "untick_checklist",
  "log_water_test", "void_water_test", "log_dose", "record_stocking", "upload_photo", "write_note",
  "send_message", "edit_details", "view_internal", "file_stage_photos", "finish_others_upload",
  "record_visit", "manage_service",
];

// The permission table as the design states it: crew work on the install; clients view, log tests,
// upload photos and message; everything else is the lead's alone.
const CREW_MAY = [
  "view", "move", "edit_survey", "tick_checklist", "log_water_test", "log_dose", "record_stocking", "upload_photo",
  "send_message", "view_internal", "file_stage_photos", "record_visit",
];
const CLIENT_MAY = ["view", "log_water_test", "upload_photo", "send_message"];

const allowed = (rel: Relation) => ACTIONS.filter((a) => canOnProject(rel, a));

describe("project permissions: the whole table", () => {
  it("a lead may do every action on every project", () => {
    expect(allowed({ role: "lead", assigned: false, owner: false })).toEqual(ACTIONS);
  });

  it("assigned crew may do exactly the crew's actions", () => {
    expect(allowed({ role: "crew", assigned: true, owner: false })).toEqual(CREW_MAY);
  });

  it("the owning client may do exactly the client's actions", () => {
    expect(allowed({ role: "client", assigned: false, owner: true })).toEqual(CLIENT_MAY);
  });

  it("crew not assigned and a client who isn't the owner may do nothing, whatever the other flag says", () => {
    expect(allowed({ role: "crew", assigned: false, owner: true })).toEqual([]);
    expect(allowed({ role: "client", assigned: true, owner: false })).toEqual([]);
    expect(canSeeProject({ role: "crew", assigned: false, owner: true })).toBe(false);
    expect(canSeeProject({ role: "client", assigned: true, owner: false })).toBe(false);
    expect(canSeeProject({ role: "client", assigned: false, owner: true })).toBe(true);
    expect(canSeeProject({ role: "crew", assigned: true, owner: false })).toBe(true);
  });

  it("every role has a label and a home page", () => {
    expect(ROLES.map((r) => ROLE_HOME[r])).toEqual(["/board", "/board", "/portal"]);
    expect(ROLES.map((r) => ROLE_LABELS[r])).toEqual(["Project lead", "Crew", "Client"]);
  });
});

describe("contact fields", () => {
  it("a phone number may hold digits, spaces, +, brackets and dashes only, up to 40 characters", () => {
    expect(phoneField.parse(" +1 (555) 010-0199 ")).toBe("+1 (555) 010-0199");
    expect(phoneField.parse("")).toBe("");
    expect(phoneField.parse(undefined)).toBeUndefined();
    expect(phoneField.safeParse("0".repeat(40)).success).toBe(true);
    const long = phoneField.safeParse("0".repeat(41));
    expect(long.success).toBe(false);
    expect(long.error?.issues.some((i) => i.message === "That phone number is too long.")).toBe(true);
    const letters = phoneField.safeParse("555 call me");
    expect(letters.error?.issues.some((i) => i.message === "Use digits, spaces, +, ( ) and - only.")).toBe(true);
    expect(phoneField.safeParse("x5550100").success).toBe(false);
    expect(phoneField.safeParse("5550100x").success).toBe(false);
  });

  it("a name needs 2 to 120 characters after trimming, with the caller's message when missing", () => {
    const name = personNameField("Enter the client's name.");
    expect(name.parse("  Jo  ")).toBe("Jo");
    expect(name.safeParse(" J ").error?.issues[0].message).toBe("Enter the client's name.");
    expect(name.safeParse("x".repeat(120)).success).toBe(true);
    expect(name.safeParse("x".repeat(121)).error?.issues[0].message).toBe("Keep the name under 120 characters.");
  });
});
