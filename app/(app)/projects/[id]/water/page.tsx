import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { getCycleEvaluation, getCycleStartedAt } from "@/db/queries/cycle-state";
import { getDesignVolume, getUnitSystem, listDoses, listWaterTests } from "@/db/queries/water";
import { listStockingBatches } from "@/db/queries/stocking";
import { canOnProject } from "@/lib/auth/permissions";
import { EmptyState } from "@/components/ui/empty-state";
import { CycleSummary } from "./_components/cycle-summary";
import type { ChartPoint } from "./_components/cycle-chart";
import { CycleChartLazy } from "./_components/cycle-chart-lazy";
import { ReadingsTable } from "./_components/readings-table";
import { WaterTestForm } from "./_components/water-test-form";
import { DosePanel } from "./_components/dose-panel";
import { StockingPanel } from "./_components/stocking-panel";
import { toReadingView, toDoseView, toBatchView } from "./_components/views";
import { canUndoOwn, undoDeadline } from "@/lib/install/undo-window";
import { READING_LIMITS } from "@/lib/cycling/readings";
import { format } from "date-fns";
import { KitChoice } from "./_components/kit-choice";
import { RestartCycleButton } from "./_components/restart-cycle-button";
import { getProjectKits, listTestKits } from "@/db/queries/test-kits";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Water & cycling");

const DAY_MS = 86_400_000;

export default async function WaterPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project, relation } = await requirePageProject(id, user);
  const now = new Date();
  const [tests, evaluation, startedAt, unitSystem] = await Promise.all([
    listWaterTests(project.id, { includeVoided: user.role !== "client" }),
    getCycleEvaluation(project.id, now),
    getCycleStartedAt(project.id),
    getUnitSystem(user.id),
  ]);
  const canDose = canOnProject(relation, "log_dose");
  const canVoid = canOnProject(relation, "void_water_test");
  const canStock = canOnProject(relation, "record_stocking");
  const fishStage = project.stage === "first_stocking" || project.stage === "in_service";
  const canChooseKits = canOnProject(relation, "edit_details");
  const canRestart = project.stage === "cycling" && canOnProject(relation, "override_gate");
  const [doses, volume, batches, kits, companyKits] = await Promise.all([
    canDose ? listDoses(project.id) : Promise.resolve([]),
    canDose ? getDesignVolume(project.id) : Promise.resolve(null),
    listStockingBatches(project.id),
    getProjectKits(project.id),
    canChooseKits ? listTestKits() : Promise.resolve([]),
  ]);

  // The chart shows what the gate counts: this cycle's readings, none dated in the future, on the
  // same day count as "Day N" above it.
  const latestAllowed = now.getTime() + READING_LIMITS.futureToleranceMinutes * 60_000;
  const valid = tests.filter((t) => !t.voided && t.takenAt.getTime() <= latestAllowed).reverse();
  const chartStart = startedAt ?? valid[0]?.takenAt ?? now;
  const counted = valid.filter((t) => t.takenAt.getTime() >= chartStart.getTime());
  const earlier = valid.length - counted.length;
  const today = evaluation.daysSinceStart ?? Math.max(0, Math.floor((now.getTime() - chartStart.getTime()) / DAY_MS));
  const takeBack = Object.fromEntries(
    tests.filter((t) => !t.voided && canUndoOwn({ byUserId: t.takenBy.id, at: t.createdAt }, user.id, now)).map((t) => [t.id, format(undoDeadline(t.createdAt), "HH:mm")]),
  );
  const points: ChartPoint[] = counted.map((t) => ({
    day: Math.round(((t.takenAt.getTime() - chartStart.getTime()) / DAY_MS) * 10) / 10,
    at: t.takenAt.toISOString(),
    ammonia: t.ammoniaMgL,
    nitrite: t.nitriteMgL,
    nitrate: t.nitrateMgL,
  }));

  return (
    <div className="flex flex-col gap-6">
      <CycleSummary
        evaluation={evaluation}
        readings={tests}
        stage={project.stage}
        notifiedAt={project.cycleReadyNotifiedAt}
        forClient={user.role === "client"}
        now={now}
      />

      <section aria-labelledby="chart-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
        <h2 id="chart-heading" className="text-lg font-semibold">
          Ammonia, nitrite and nitrate
        </h2>
        {points.length ? (
          <CycleChartLazy points={points} today={today} />
        ) : (
          <EmptyState title="No water tests yet — log the first one below.">
            The chart fills in as tests are logged: ammonia first, then nitrite, then nitrate as the bacteria establish.
          </EmptyState>
        )}
        {earlier > 0 && (
          <p className="text-xs text-muted">
            {earlier} {earlier === 1 ? "reading from before this cycle began is" : "readings from before this cycle began are"} in the table below but not on the chart.
          </p>
        )}
        {canRestart && <RestartCycleButton projectId={project.id} />}
        <p className="text-sm">
          <Link href={`/projects/${project.id}/water/trends`} className="text-accent underline">
            Trends & water changes
          </Link>
          <span className="text-muted"> — nitrate, pH and temperature over the months, and where a water-change routine settles.</span>
        </p>
      </section>

      {canChooseKits && <KitChoice projectId={project.id} chosen={kits} kits={companyKits} />}

      <WaterTestForm projectId={project.id} unitSystem={unitSystem} kits={kits} />

      <ReadingsTable projectId={project.id} rows={tests.map(toReadingView)} unitSystem={unitSystem} canVoid={canVoid} takeBack={takeBack} />

      {(fishStage || batches.length > 0) && (
        <>
          {/* Fish go in through the stocking plan on the Fish tab, after quarantine; this panel shows the batches and their re-tests. */}
          <StockingPanel projectId={project.id} batches={batches.map(toBatchView)} canRecord={false} isLead={user.role === "lead"} />
          {canStock && fishStage && (
            <p className="-mt-4 text-sm">
              <Link href={`/projects/${project.id}/fish`} className="text-accent underline">
                Plan, quarantine and add fish on the Fish tab
              </Link>
            </p>
          )}
        </>
      )}

      {canDose && <DosePanel projectId={project.id} doses={doses.map(toDoseView)} designVolume={volume} unitSystem={unitSystem} canVoid={canVoid} />}
    </div>
  );
}
