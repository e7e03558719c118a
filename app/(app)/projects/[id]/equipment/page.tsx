import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { canOnProject } from "@/lib/auth/permissions";
import { listEquipment, recentEquipmentServices } from "@/db/queries/equipment";
import { getServiceSettings } from "@/db/queries/service-settings";
import { effectiveKindIntervals, pieceDue } from "@/lib/service/equipment-due";
import { localDay } from "@/lib/service/local-dates";
import { EmptyState } from "@/components/ui/empty-state";
import { Caution } from "@/components/ui/caution";
import { EquipmentForm } from "./_components/equipment-form";
import { PieceCard } from "./_components/piece-card";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Equipment");
export const dynamic = "force-dynamic";

/** The tank's equipment register: what is fitted, when each piece is next due, and its warranty. */
export default async function EquipmentPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project, relation } = await requirePageProject(id, user);
  const internal = canOnProject(relation, "view_internal");
  const canEdit = canOnProject(relation, "edit_equipment");
  const [pieces, services, settings] = await Promise.all([listEquipment(project.id, { internal }), internal ? recentEquipmentServices(project.id) : Promise.resolve([]), getServiceSettings()]);
  const today = localDay(new Date(), settings.timeZone);
  const kindIntervals = effectiveKindIntervals(settings.equipmentIntervals);
  const inUse = pieces.filter((p) => !p.retiredAt);
  const retired = pieces.filter((p) => p.retiredAt);
  const line = (p: (typeof pieces)[number]) => ({
    piece: p,
    due: pieceDue({ ...p, lastServicedOn: p.lastServicedAt ? localDay(p.lastServicedAt, settings.timeZone) : null }, settings.equipmentIntervals, today),
    lastServicedOn: p.lastServicedAt ? localDay(p.lastServicedAt, settings.timeZone) : null,
    services: services.filter((s) => s.equipmentId === p.id).map((s) => ({ ...s, servicedOn: localDay(s.servicedAt, settings.timeZone) })),
  });
  return (
    <section aria-labelledby="equipment-heading" className="flex max-w-3xl flex-col gap-4">
      <div>
        <h2 id="equipment-heading" className="text-lg font-semibold">
          Equipment
        </h2>
        <p className="text-sm text-muted">
          {internal
            ? "What is fitted to this tank, when each piece is next due for service, and its warranty. Services done on a visit are recorded on the visit's report; one done at another time is recorded here."
            : "The equipment running your tank, when each piece is next looked after, and its warranty."}
        </p>
      </div>
      {internal && (
        <Caution title="Before servicing anything powered">
          Switch off and unplug it first, keep a drip loop in every cable and everything on RCD (GFCI) protection. Sockets and wiring are for a licensed electrician; follow local electrical codes.
        </Caution>
      )}
      {inUse.length === 0 ? (
        <EmptyState title="No equipment recorded yet">{canEdit ? "Add the filter, heater, lights and the rest below." : "The team adds it when the tank is set up."}</EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {inUse.map((p) => (
            <PieceCard key={p.id} projectId={project.id} line={line(p)} today={today} canEdit={canEdit} internal={internal} kindIntervals={kindIntervals} />
          ))}
        </ul>
      )}
      {canEdit && (
        <div className="flex flex-col gap-2">
          <h3 className="font-semibold">Add equipment</h3>
          <EquipmentForm projectId={project.id} kindIntervals={kindIntervals} />
        </div>
      )}
      {internal && retired.length > 0 && (
        <details className="rounded-2xl border border-line bg-card p-4">
          <summary className="cursor-pointer font-semibold">Retired ({retired.length})</summary>
          <ul className="mt-3 flex flex-col gap-2 text-sm">
            {retired.map((p) => (
              <li key={p.id}>
                <span className="font-medium">{p.kind}</span>
                {p.makeModel && ` · ${p.makeModel}`} — retired {p.retiredAt && localDay(p.retiredAt, settings.timeZone)}
                {p.retiredByName && ` by ${p.retiredByName}`}: {p.retireReason}
              </li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
}
