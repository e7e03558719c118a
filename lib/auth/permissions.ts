import type { Role } from "./roles";

/**
 * Who may do what on a project. The caller's relation to the project decides: a lead relates to
 * every project, crew only to projects they are assigned to, a client only to their own.
 */
export type ProjectAction =
  | "view"
  | "move"
  | "override_gate"
  | "edit_survey"
  | "approve_load"
  | "tick_checklist"
  | "untick_checklist"
  | "log_water_test"
  | "void_water_test"
  | "log_dose"
  | "record_stocking"
  | "upload_photo"
  | "write_note"
  | "send_message"
  | "edit_details"
  // The install team's own view: the board card, internal notes, the checklist, materials and leak checks.
  | "view_internal"
  // Filing photos on any stage, and finishing another person's upload (a client's photo is always a problem photo).
  | "file_stage_photos"
  | "finish_others_upload"
  // Reading the project's quote and invoices (the client: the current quote and their own invoices).
  | "see_money"
  // Pricing, issuing quotes, setting the schedule, recording transfers.
  | "manage_money"
  // Accepting the quote and paying invoices: the project's own client.
  | "accept_and_pay"
  // The stocking plan (lead edits, crew views), quarantine, and the livestock record (the client reads it).
  | "view_stocking_plan"
  | "edit_stocking_plan"
  | "record_quarantine"
  | "override_quarantine"
  | "view_livestock"
  | "record_livestock"
  // The tank's equipment register and recording a service by hand (the client reads the register).
  | "edit_equipment"
  // Tanks in service: filling in and signing off a visit report (crew on the tank), and the plan itself (lead).
  | "record_visit"
  | "manage_service";

export type Relation = { role: Role; assigned: boolean; owner: boolean };

// Everything not listed for crew or clients is the lead's alone.
const CREW: ProjectAction[] = [
  "view",
  "view_internal",
  "move",
  "edit_survey",
  "tick_checklist",
  "log_water_test",
  "log_dose",
  "record_stocking",
  "upload_photo",
  "file_stage_photos",
  "send_message",
  "view_stocking_plan",
  "record_quarantine",
  "view_livestock",
  "record_livestock",
  "edit_equipment",
  "record_visit",
];
const CLIENT: ProjectAction[] = ["view", "log_water_test", "upload_photo", "send_message", "see_money", "accept_and_pay", "view_livestock"];
// The client's signature and card are theirs: nobody accepts or pays in their place.
const CLIENT_ONLY: ProjectAction[] = ["accept_and_pay"];

/** True when the caller can see the project at all (else it answers 404, not 403). */
export function canSeeProject(rel: Relation): boolean {
  if (rel.role === "lead") return true;
  if (rel.role === "crew") return rel.assigned;
  return rel.owner;
}

export function canOnProject(rel: Relation, action: ProjectAction): boolean {
  if (!canSeeProject(rel)) return false;
  if (CLIENT_ONLY.includes(action)) return rel.role === "client" && rel.owner;
  if (rel.role === "lead") return true;
  if (rel.role === "crew") return CREW.includes(action);
  return CLIENT.includes(action);
}
