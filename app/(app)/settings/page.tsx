import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { getCompanyCycleRules } from "@/db/queries/cycle-state";
import { DEFAULT_CYCLE_RULES } from "@/lib/cycling/cycle-rules";
import { listTestKits } from "@/db/queries/test-kits";
import { CycleRulesForm } from "./_components/cycle-rules-form";
import { TestKitsPanel } from "./_components/test-kits-panel";

export const metadata: Metadata = { title: "Settings" };

/** Company-wide settings, one section each; the lead only. */
export default async function SettingsPage() {
  await requirePageUser("lead");
  const [overrides, kits] = await Promise.all([getCompanyCycleRules(), listTestKits()]);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Settings</h1>
        <p className="text-sm text-muted">Company-wide rules. Changes apply to every project from the moment they are saved.</p>
      </div>
      <CycleRulesForm overrides={overrides} defaults={{ ...DEFAULT_CYCLE_RULES }} />
      <TestKitsPanel kits={kits} />
    </div>
  );
}
