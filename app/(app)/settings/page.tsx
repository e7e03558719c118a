import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { getCompanyCycleRules } from "@/db/queries/cycle-state";
import { DEFAULT_CYCLE_RULES } from "@/lib/cycling/cycle-rules";
import { listTestKits } from "@/db/queries/test-kits";
import { CycleRulesForm } from "./_components/cycle-rules-form";
import { TimingForm } from "./_components/timing-form";
import { getStageDurationOverrides } from "@/db/queries/stage-durations";
import { DEFAULT_STAGE_DURATIONS } from "@/lib/stages/durations";
import { getCompanyNoticeDelay } from "@/db/queries/outbox";
import { env } from "@/env";
import { QuarantineForm } from "./_components/quarantine-form";
import { getQuarantineDays } from "@/db/queries/holding-tanks";
import { DEFAULT_QUARANTINE_DAYS } from "@/lib/stocking/quarantine";
import { TestKitsPanel } from "./_components/test-kits-panel";
import { FloorCodeForm } from "./_components/floor-code-form";
import { getCompanyFloorCode } from "@/db/queries/company-settings";
import { getServiceSettings } from "@/db/queries/service-settings";
import { effectiveKindIntervals } from "@/lib/service/equipment-due";
import { DEFAULT_SERVICE_INTERVAL_DAYS } from "@/lib/service/equipment-kinds";
import { TimeZoneForm } from "./_components/time-zone-form";
import { EquipmentIntervalsForm } from "./_components/equipment-intervals-form";
import { ServiceTasksForm } from "./_components/service-tasks-form";
import { getServiceTaskTemplate } from "@/db/queries/service-plans";
import { DEFAULT_SERVICE_TASKS } from "@/lib/service/default-tasks";

export const metadata: Metadata = { title: "Settings" };

async function serviceTasksOrDefaults(): Promise<string[]> {
  const saved = await getServiceTaskTemplate();
  return saved.length ? saved : [...DEFAULT_SERVICE_TASKS];
}

/** Company-wide settings, one section each; the lead only. */
export default async function SettingsPage() {
  await requirePageUser("lead");
  const [overrides, kits, floorCode, durationOverrides, companyDelay, quarantineDays] = await Promise.all([getCompanyCycleRules(), listTestKits(), getCompanyFloorCode(), getStageDurationOverrides(), getCompanyNoticeDelay(), getQuarantineDays()]);
  const service = await getServiceSettings();
  const zones = ["UTC", ...Intl.supportedValuesOf("timeZone").filter((z) => z !== "UTC")];
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Settings</h1>
        <p className="text-sm text-muted">Company-wide rules. Changes apply to every project from the moment they are saved.</p>
      </div>
      <TimingForm
        overrides={durationOverrides}
        defaults={{ ...DEFAULT_STAGE_DURATIONS }}
        noticeDelay={{ companySeconds: companyDelay, defaultSeconds: env().NOTICE_DELAY_SECONDS }}
      />
      <CycleRulesForm overrides={overrides} defaults={{ ...DEFAULT_CYCLE_RULES }} />
      <TestKitsPanel kits={kits} />
      <FloorCodeForm current={floorCode} />
      <QuarantineForm days={quarantineDays} defaultDays={DEFAULT_QUARANTINE_DAYS} />
      <TimeZoneForm current={service.timeZone} zones={zones} />
      <EquipmentIntervalsForm intervals={effectiveKindIntervals(service.equipmentIntervals)} commonPractice={{ ...DEFAULT_SERVICE_INTERVAL_DAYS }} />
      <ServiceTasksForm tasks={await serviceTasksOrDefaults()} />
    </div>
  );
}
