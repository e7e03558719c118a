/**
 * Every route handler in app/api, found on disk so a new route is covered without touching the
 * tests, with what its wrapper says about access, and a sample body that its schema accepts.
 */
import { readdirSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { randomUUID } from "node:crypto";
import { routeAccess, type RouteAccess } from "@/server/route";
import { canOnProject, canSeeProject, type Relation } from "@/lib/auth/permissions";
import type { Role } from "@/lib/auth/roles";
import { lightDesign } from "../unit/survey/fixtures";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
// The auth library's own endpoints check their own CSRF token; the walker unit test names them too.
const OWN_CHECKS = new Set(["app/api/auth/[...nextauth]/route.ts"]);
const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export type Handler = { method: string; path: string; file: string; access: RouteAccess; mutating: boolean };

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/^route\.tsx?$/.test(name)) out.push(p);
  }
  return out;
}

export async function listHandlers(): Promise<Handler[]> {
  const out: Handler[] = [];
  for (const abs of walk(join(ROOT, "app/api")).sort()) {
    const file = relative(ROOT, abs).split("\\").join("/");
    if (OWN_CHECKS.has(file)) continue;
    const mod = (await import(abs)) as Record<string, unknown>;
    const path = "/" + file.replace(/^app\//, "").replace(/\/route\.tsx?$/, "");
    for (const [method, fn] of Object.entries(mod)) {
      const access = routeAccess(fn);
      if (!access) continue;
      out.push({ method, path, file, access, mutating: MUTATING.has(method) });
    }
  }
  return out;
}

/** The path with `[id]` as the project and any other segment as an id that doesn't exist. */
export function urlFor(h: Handler, projectId: string): string {
  return h.path.replace(/\[([^\]]+)\]/g, (_m, name: string) => (name === "id" && h.path.startsWith("/api/projects/") ? projectId : name === "token" ? "t".repeat(32) : randomUUID()));
}

const NOW_ISH = "2026-01-05T10:00";

const MATRIX_SPECIES = {
  commonName: "Matrix tetra",
  scientificName: "Matrixia testa",
  water: "fresh",
  tempMinC: 22,
  tempMaxC: 27,
  phMin: 6,
  phMax: 7.5,
  adultLengthMm: 35,
  temperament: "peaceful",
  territorial: false,
  shoalMin: 6,
  level: "middle",
  coralSafe: null,
  invertSafe: null,
  diet: "omnivore",
  minTankLengthMm: null,
  source: "invented for the route tests",
};

/** A body each route's schema accepts: sent only to callers who must be refused before it is read. */
export const SAMPLE_BODIES: Record<string, unknown> = {
  "PATCH /api/checklist-items/[id]": { label: "Check the level twice" },
  "POST /api/checklist-items": { stage: "site_survey", label: "Check the level", needsPhoto: false },
  "POST /api/invitations/accept": { token: "t".repeat(32), password: "long-enough-pass", confirm: "long-enough-pass" },
  "PATCH /api/me/contact": { name: "Pat Sample", phone: "" },
  "PUT /api/me/notifications": { message: true },
  "PATCH /api/me/units": { unitSystem: "metric" },
  "POST /api/people": { name: "New Person", email: "new-person@fixture.test", role: "crew", phone: "" },
  "POST /api/projects": {
    clientMode: "new",
    clientId: "",
    clientName: "New Client",
    clientEmail: "new-client@fixture.test",
    title: "Matrix tank",
    siteAddress: "1 Test Row",
    siteTown: "Testbury",
    targetInstallDate: "",
    leadId: "",
    crewIds: [],
    tankSummary: "",
  },
  "PATCH /api/projects/[id]": { version: 1, title: "A new title" },
  "POST /api/projects/[id]/checklist/ticks": { itemId: randomUUID(), done: true, clientKey: "matrix-key-1" },
  "PUT /api/projects/[id]/design": lightDesign(),
  "POST /api/projects/[id]/doses/[doseId]/void": { reason: "entered twice" },
  "POST /api/projects/[id]/doses": { dosedAt: NOW_ISH, targetMgL: 2 },
  "POST /api/projects/[id]/leak-checks": { kind: "filled", passed: true },
  "POST /api/projects/[id]/load-approval": { engineerReference: null },
  "DELETE /api/projects/[id]/load-approval": { reason: "the design changed" },
  "POST /api/projects/[id]/load-approval/revoke": { reason: "the design changed" },
  "PATCH /api/projects/[id]/materials/[materialId]": { loaded: true },
  "POST /api/projects/[id]/materials": { label: "Gravel", quantity: 2, unit: "bags" },
  "POST /api/projects/[id]/messages": { body: "Hello there" },
  "POST /api/projects/[id]/move": { toStage: "stand_load_check", version: 1 },
  "PATCH /api/projects/[id]/notes/[noteId]": { shared: true },
  "POST /api/projects/[id]/notes": { body: "A note", shared: false },
  "POST /api/projects/[id]/stocking-batches": { description: "Six small fish", fishCount: 6 },
  "PUT /api/projects/[id]/survey": { notes: "Looked at the room" },
  "POST /api/projects/[id]/uploads": { fileName: "tank.jpg", contentType: "image/jpeg", sizeBytes: 1000, stage: "site_survey" },
  "POST /api/projects/[id]/visits": { kind: "install day", startsAt: "2027-01-05T10:00", durationMinutes: 60 },
  "POST /api/projects/[id]/water-tests/[testId]/correct": { takenAt: NOW_ISH, ammoniaMgL: 0, reason: "typed the wrong figure" },
  "POST /api/projects/[id]/water-tests/[testId]/void": { reason: "entered twice" },
  "POST /api/projects/[id]/water-tests": { takenAt: NOW_ISH, ammoniaMgL: 0 },
  "PUT /api/settings/cycle-rules": { stallDays: 10 },
  "POST /api/holding-tanks": { name: "Matrix holding tank", volumeL: 120, location: "Back room" },
  "PATCH /api/people/[id]": { active: false },
  "POST /api/projects/[id]/cycle/restart": { reason: "The filter media was washed in tap water" },
  "POST /api/projects/[id]/livestock/events": { groupId: randomUUID(), kind: "behaviour", note: "Chasing at feeding time" },
  "POST /api/projects/[id]/stocking-plan/batches/[batchId]/display": { reTestOverride: "Re-tested on site before adding" },
  "POST /api/projects/[id]/stocking-plan/batches/[batchId]/override": { reason: "Bought from our own holding system" },
  "POST /api/projects/[id]/stocking-plan/batches/[batchId]/quarantine-notes": { kind: "observation", text: "All eating well" },
  "POST /api/projects/[id]/stocking-plan/batches/[batchId]/quarantine": { holdingTankId: randomUUID() },
  "PUT /api/projects/[id]/stocking-plan/batches/[batchId]": { items: [{ speciesId: randomUUID(), count: 6 }] },
  "POST /api/projects/[id]/stocking-plan/batches": { items: [{ speciesId: randomUUID(), count: 6 }] },
  "PUT /api/projects/[id]/stocking-plan": { reef: false },
  "PATCH /api/projects/[id]/uploads/[attachmentId]": { caption: "The stand, levelled" },
  "POST /api/projects/[id]/uploads/[attachmentId]/void": { reason: "wrong project" },
  "POST /api/projects/[id]/visits/[visitId]/cancel": { reason: "client away" },
  "PUT /api/projects/[id]/service/plan": { frequency: "weekly", everyWeeks: 2, weekday: "TU", startsOn: "2027-01-05", startTime: "09:00", durationMinutes: 90, waterChangePercent: 20, tasks: ["Glass cleaned"], usualAssigneeId: null },
  "PATCH /api/projects/[id]/service/visits/[visitId]": { clientNotes: "All well" },
  "POST /api/projects/[id]/service/visits/[visitId]/move": { startsAt: "2027-01-06T10:00", assignedTo: null },
  "POST /api/projects/[id]/service/visits/[visitId]/skip": { reason: "client away" },
  "POST /api/projects/[id]/service/visits/[visitId]/reopen": { reason: "wrong litres" },
  "POST /api/projects/[id]/service/visits/[visitId]/ticks": { taskIndex: 0, done: true, clientKey: "matrix-visit-key-1" },
  "POST /api/projects/[id]/service/visits/[visitId]/equipment": { equipmentId: randomUUID(), clientKey: "matrix-equip-key-1" },
  "POST /api/projects/[id]/service/visits/[visitId]/water-test": { takenAt: NOW_ISH, nitrateMgL: 10 },
  "POST /api/projects/[id]/service/visits/[visitId]/photos": { attachmentId: randomUUID() },
  "PUT /api/settings/service-tasks": { tasks: ["Glass cleaned"] },
  "PATCH /api/projects/[id]/visits/[visitId]": { kind: "install day", startsAt: "2027-01-06T10:00", durationMinutes: 60 },
  "PUT /api/settings/quarantine": { quarantineDays: 28 },
  "POST /api/projects/[id]/equipment": { kind: "heater", makeModel: "Heater 300 W (house brand)", installedOn: "2026-01-10", warrantyUntil: "2028-01-10", serviceIntervalDays: "", lastServicedOn: "", notes: "" },
  "PATCH /api/projects/[id]/equipment/[equipmentId]": { kind: "heater", makeModel: "Heater 300 W (house brand)", installedOn: "2026-01-10", warrantyUntil: "2028-01-10", serviceIntervalDays: 90, notes: "" },
  "POST /api/projects/[id]/equipment/[equipmentId]/retire": { reason: "replaced with a larger one" },
  "POST /api/projects/[id]/equipment/[equipmentId]/services": { servicedOn: "2026-06-01", note: "cleaned", clientKey: "sample-key-0001" },
  "PUT /api/settings/equipment-intervals": { "canister filter": 120, "sump return pump": 180, heater: 180, chiller: 180, "UV clarifier": 180, lighting: 365, "protein skimmer": 30, "CO2 system": 90, "dosing pump": 90, other: "" },
  "PUT /api/settings/time-zone": { timeZone: "UTC" },
  "PUT /api/settings/timing": { stageDurations: {} },
  "PUT /api/species/[speciesId]": MATRIX_SPECIES,
  "POST /api/species": MATRIX_SPECIES,
  "POST /api/invoices/[invoiceId]/transfer": { amountMinor: 1000, receivedOn: "2026-11-30", reference: "BANK-REF-1" },
  "POST /api/money/monthly": { period: "2026-11" },
  "PUT /api/money/settings": { currency: "EUR", depositBp: 3000, progressBp: 4000, defaultTaxBp: 2000, paymentTermsDays: 14 },
  "POST /api/price-list": { group: "tank_glass", label: "Glass panel", unit: "each", unitPriceMinor: 1000, taxBp: 2000, basis: "manual" },
  "PATCH /api/price-list/[itemId]": { label: "Glass panel" },
  "POST /api/projects/[id]/quotes": { from: "design" },
  "PUT /api/projects/[id]/quotes/[quoteId]": { lines: [], notes: "" },
  "POST /api/projects/[id]/quotes/[quoteId]/accept": { typedName: "Pat Sample", seenHash: "a".repeat(64) },
  "PUT /api/projects/[id]/schedule": { depositBp: 3000, progressBp: 4000, monthlyPlanMinor: null, monthlyPlanTaxBp: 2000 },
  "PUT /api/projects/[id]/test-kits": { analyte: "ammonia", kitId: null },
  "POST /api/settings/test-kits": { name: "Kit A", analyte: "ammonia", basis: "compound", steps: "0, 0.5, 1" },
  "PUT /api/settings/floor-code": { floorCode: "en-uk" },
};

export const keyOf = (h: Handler) => `${h.method} ${h.path}`;

export type Caller = { name: string; role: Role | null; relation: Relation | null; email?: string };

/**
 * What a caller must get from a handler before its body is looked at: 401, 404 or 403, or
 * "allowed" when the wrapper lets them through to the body.
 */
export function expectedRefusal(h: Handler, caller: Caller): 401 | 403 | 404 | "allowed" {
  const a = h.access;
  if (a.kind === "public") return "allowed";
  if (!caller.role) return 401;
  if (a.kind === "user") return a.roles.length && !a.roles.includes(caller.role) ? 403 : "allowed";
  const rel = caller.relation!;
  if (!canSeeProject(rel)) return 404;
  return canOnProject(rel, a.action) ? "allowed" : 403;
}
