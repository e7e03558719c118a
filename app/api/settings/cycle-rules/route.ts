import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { badRequest, type FieldErrors } from "@/server/errors";
import { getCompanyCycleRules } from "@/db/queries/cycle-state";
import { saveCompanyCycleRules } from "@/db/queries/cycle-ready";
import { DEFAULT_CYCLE_RULES, resolveCycleRules, validateCycleRules, type CycleRules } from "@/lib/cycling/cycle-rules";
import { cycleRulesSchema } from "./cycle-rules.schema";

/** The company's overrides, the defaults, and the rules in force. Lead only. */
export const GET = userRoute({ roles: ["lead"] }, async () => {
  const overrides = await getCompanyCycleRules();
  return NextResponse.json({ overrides, defaults: DEFAULT_CYCLE_RULES, rules: resolveCycleRules(overrides) });
});

/**
 * Replaces the company's overrides (an empty field goes back to the default), then checks every
 * cycling project under the new rules so a tank they now pass gets its notice.
 */
export const PUT = userRoute({ roles: ["lead"], schema: cycleRulesSchema }, async ({ input }) => {
  const overrides: Partial<CycleRules> = {};
  for (const [key, value] of Object.entries(input)) {
    if (value !== null && value !== undefined) (overrides as Record<string, unknown>)[key] = value;
  }
  const problems = validateCycleRules(overrides);
  if (problems.length) {
    const fields: FieldErrors = {};
    for (const p of problems) fields[p.field] ??= p.message;
    throw badRequest("Some rules are out of range; nothing was saved.", fields);
  }
  const { notified } = await saveCompanyCycleRules(overrides);
  return NextResponse.json({ overrides, rules: resolveCycleRules(overrides), projectsNotified: notified });
});
