import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getStockingPlan } from "@/db/queries/stocking-plan";
import { getLivestock } from "@/db/queries/livestock";
import { listSpecies } from "@/db/queries/species";
import { listHoldingTanks } from "@/db/queries/holding-tanks";
import { listProjectAttachments } from "@/db/queries/attachments";
import { canOnProject } from "@/lib/auth/permissions";
import { WATER_LABELS } from "@/lib/stocking/species";
import { ClientFish } from "./_components/client-fish";
import { PlanChecks } from "./_components/plan-checks";
import { PlanBatchForm } from "./_components/plan-batch-form";
import { PlanSettingsForm } from "./_components/plan-settings-form";
import { BatchCard } from "./_components/batch-card";
import { LivestockRecord } from "./_components/livestock-record";
import { EventForm } from "./_components/event-form";
import { toLivestockProps } from "./_components/livestock-views";

export const metadata: Metadata = { title: "Fish" };

const FISH_STAGES = ["first_stocking", "in_service"];

export default async function FishPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project, relation } = await requirePageProject(id, user, "view_livestock");
  const record = toLivestockProps(await getLivestock(project.id));

  if (user.role === "client") {
    const photos = (await listProjectAttachments(project.id))
      .filter((a) => FISH_STAGES.includes(a.stage) && !a.isProblem && a.contentType.startsWith("image/"))
      .slice(-8)
      .map((a) => ({ id: a.id, caption: a.caption }));
    return <ClientFish projectId={project.id} stage={project.stage} record={record} photos={photos} />;
  }

  const canEdit = canOnProject(relation, "edit_stocking_plan");
  const can = {
    quarantine: canOnProject(relation, "record_quarantine"),
    override: canOnProject(relation, "override_quarantine"),
    stock: canOnProject(relation, "record_stocking") && FISH_STAGES.includes(project.stage),
  };
  const [plan, species, tanks] = await Promise.all([getStockingPlan(project.id), canEdit ? listSpecies() : Promise.resolve([]), listHoldingTanks()]);
  const tankOptions = tanks.map((t) => ({ id: t.id, name: `${t.name} (${Math.round(t.volumeL)} L, ${t.location})` }));
  // The tank's own water kind first in the picker; other kinds stay available (the checks say why they don't fit).
  const speciesOptions = [...species]
    .sort((a, b) => Number(b.water === plan.tank.water) - Number(a.water === plan.tank.water))
    .map((s) => ({ id: s.id, label: `${s.commonName} (${s.scientificName}) · ${s.water}` }));

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="plan-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
        <div>
          <h2 id="plan-heading" className="text-lg font-semibold">
            Stocking plan
          </h2>
          <p className="text-sm text-muted">
            Batches go in this order. Each spends its quarantine in a holding tank, then enters the display once the water has re-tested at zero.
            {plan.tank.water && ` This tank holds ${WATER_LABELS[plan.tank.water]}.`}
          </p>
        </div>
        {canEdit && <PlanSettingsForm projectId={project.id} reef={plan.settings.reef} targetPh={plan.settings.targetPh} measuredPh={plan.settings.measuredPh} />}
        {plan.batches.length === 0 ? (
          <p className="text-sm text-muted">No batches planned yet.{canEdit ? "" : " The lead plans them."}</p>
        ) : (
          <ol className="flex flex-col gap-3">
            {plan.batches.map((b) => (
              <BatchCard
                key={b.id}
                projectId={project.id}
                tanks={tankOptions}
                can={can}
                isLead={user.role === "lead"}
                batch={{
                  ...b,
                  quarantineStartedAt: b.quarantineStartedAt?.toISOString() ?? null,
                  quarantineEndsAt: b.quarantineEndsAt?.toISOString() ?? null,
                  notes: b.notes.map((n) => ({ ...n, at: n.at.toISOString() })),
                }}
              />
            ))}
          </ol>
        )}
        {!can.stock && plan.batches.some((b) => b.status === "in quarantine") && (
          <p className="text-sm text-muted">Batches go into the display from first stocking on; move the project on the board when the cycle is done.</p>
        )}
        {canEdit && <PlanBatchForm projectId={project.id} species={speciesOptions} nextPosition={plan.batches.length + 1} />}
        {canEdit && tanks.length === 0 && (
          <p className="text-sm">
            No holding tanks yet. <Link href="/holding-tanks" className="text-accent underline">Add one</Link> before the first batch goes into quarantine.
          </p>
        )}
      </section>

      <PlanChecks warnings={plan.warnings} bioload={plan.bioload} hasDesign={plan.tank.water !== null} />

      <section aria-labelledby="record-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
        <h2 id="record-heading" className="text-lg font-semibold">
          Livestock record
        </h2>
        <LivestockRecord record={record} />
        {canOnProject(relation, "record_livestock") && record.groups.length > 0 && <EventForm projectId={project.id} groups={record.groups} tanks={tankOptions} />}
      </section>
    </div>
  );
}
