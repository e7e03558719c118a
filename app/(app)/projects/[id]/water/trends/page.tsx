import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { getDesignVolume, getUnitSystem, listWaterTests } from "@/db/queries/water";
import { EmptyState } from "@/components/ui/empty-state";
import { READING_LIMITS } from "@/lib/cycling/readings";
import { trendPoints } from "@/lib/service/trends";
import { estimateNitrateRise } from "@/lib/service/nitrate-rise";
import { TrendsChart } from "./_components/trends-chart";
import { ChangePlanner } from "./_components/change-planner";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Trends & water changes");

/**
 * The tank's water over months and a water-change planner. Nothing here writes: the lead, the
 * assigned crew and the owning client all see the same page (the planner only computes).
 */
export default async function WaterTrendsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  const now = new Date();
  const [tests, unitSystem, volume] = await Promise.all([listWaterTests(project.id, { includeVoided: false }), getUnitSystem(user.id), getDesignVolume(project.id)]);
  const points = trendPoints(tests, now, READING_LIMITS.futureToleranceMinutes * 60_000);
  const rise = estimateNitrateRise(tests, now);

  return (
    <div className="flex flex-col gap-6">
      <p className="text-sm">
        <Link href={`/projects/${project.id}/water`} className="text-accent underline">
          Back to water & cycling
        </Link>
      </p>
      <section aria-labelledby="trends-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
        <h2 id="trends-heading" className="text-lg font-semibold">
          Nitrate, pH and temperature over time
        </h2>
        {points.length ? (
          <TrendsChart points={points} unitSystem={unitSystem} />
        ) : (
          <EmptyState title="No water tests yet.">Nitrate, pH and temperature appear here as tests are logged on the Water & cycling tab, and build into a picture over the months.</EmptyState>
        )}
      </section>
      <ChangePlanner
        measuredRise={rise ? { risePerDayMgL: rise.risePerDayMgL, pairs: rise.pairs, fromAt: rise.fromAt.toISOString(), toAt: rise.toAt.toISOString() } : null}
        netVolumeL={volume?.netVolumeL ?? null}
        unitSystem={unitSystem}
      />
    </div>
  );
}
