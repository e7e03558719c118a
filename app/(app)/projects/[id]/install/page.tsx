import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { listChecklistItems, listProjectTicks } from "@/db/queries/checklists";
import { getDesignData, getUnitSystem, listMaterials } from "@/db/queries/materials";
import { listLeakChecks } from "@/db/queries/leak-checks";
import { listProjectAttachments } from "@/db/queries/attachments";
import { latestTicks } from "@/lib/install/checklist-progress";
import { bedFootprintFromDesign, looksLikeDesign } from "@/lib/install/install-calcs";
import { computeLoad } from "@/lib/tank/load";
import type { Stage } from "@/lib/stages/stages";
import { Caution } from "@/components/ui/caution";
import { EmptyState } from "@/components/ui/empty-state";
import { ChecklistDay } from "./_components/checklist-day";
import { MaterialsPanel } from "./_components/materials-panel";
import { FillPanel } from "./_components/fill-panel";
import { DayPhotos } from "./_components/day-photos";
import { PhotoQueueProvider } from "./_components/photo-queue-context";
import type { DayState } from "./_components/checklist-types";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Install day");

const DAY_STAGES: Stage[] = ["stand_load_check", "aquascape", "fill_leak_test"];

function netVolumeFrom(data: Record<string, unknown> | null): number | null {
  if (!looksLikeDesign(data)) return null;
  try {
    const v = computeLoad(data).netVolumeL;
    return Number.isFinite(v) && v > 0 ? v : null;
  } catch {
    return null;
  }
}

export default async function InstallDayPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser("lead", "crew");
  const { project } = await requirePageProject(id, user, "tick_checklist");
  const [items, ticks, mats, checks, design, units, files] = await Promise.all([
    listChecklistItems(),
    listProjectTicks(project.id),
    listMaterials(project.id),
    listLeakChecks(project.id),
    getDesignData(project.id),
    getUnitSystem(user.id),
    listProjectAttachments(project.id),
  ]);
  const dayPhotos = files
    .filter((f) => DAY_STAGES.includes(f.stage) && f.contentType.startsWith("image/"))
    .map((f) => ({ id: f.id, fileName: f.fileName, caption: f.caption, url: `/api/attachments/${f.id}?variant=full`, thumbUrl: f.thumbKey ? `/api/attachments/${f.id}?variant=thumb` : null }));
  const dayItems = items.filter((i) => DAY_STAGES.includes(i.stage));
  const initial: Record<string, DayState> = {};
  for (const [itemId, t] of latestTicks(ticks)) {
    initial[itemId] = { done: t.done, note: t.note, value: t.value, attachmentId: t.attachmentId, byName: t.byName, mine: t.byUserId === user.id, at: t.at.toISOString() };
  }
  const footprint = bedFootprintFromDesign(design);
  const substrate = design && typeof design.substrate === "object" ? (design.substrate as { type?: string; depthMm?: number }) : null;

  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-8 lg:max-w-none">
      <nav aria-label="On this page" className="flex flex-wrap gap-2 text-sm">
        {[
          ["#stage-stand_load_check", "Stand & load"],
          ["#stage-aquascape", "Aquascape"],
          ["#stage-fill_leak_test", "Fill checklist"],
          ["#photos-heading", "Photos"],
          ["#materials-heading", "Materials"],
          ["#fill-heading", "Fill & leak test"],
        ].map(([href, label]) => (
          <a key={href} href={href} className="inline-flex min-h-11 items-center rounded-full border border-line bg-card px-3 font-medium hover:bg-paper">
            {label}
          </a>
        ))}
      </nav>
      <Caution title="Before anything goes in the water">
        Heaters and pumps stay unplugged during the fill. Every cord gets a drip loop, and the socket is on tested ground-fault
        protection (RCD/GFCI). Wiring near water is for a licensed electrician under local codes. Lift glass with enough people
        for its weight; never slide a tank on its base.
      </Caution>
      <PhotoQueueProvider userId={user.id} projectId={project.id}>
      {dayItems.length ? (
        <ChecklistDay
          projectId={project.id}
          stages={DAY_STAGES}
          items={dayItems.map((i) => ({ id: i.id, stage: i.stage, label: i.label, hint: i.hint, needsPhoto: i.needsPhoto, measure: i.measure }))}
          initial={initial}
          me={{ name: user.name, isLead: user.role === "lead" }}
        />
      ) : (
        <EmptyState title="No checklist items yet">The lead adds them on the Checklists page.</EmptyState>
      )}
      <DayPhotos stages={DAY_STAGES} defaultStage={DAY_STAGES.includes(project.stage) ? project.stage : "aquascape"} initial={dayPhotos} />
      </PhotoQueueProvider>
      <div className="grid items-start gap-8 lg:grid-cols-2">
      <MaterialsPanel
        projectId={project.id}
        units={units}
        initial={mats.map((m) => ({ ...m, loadedAt: m.loadedAt?.toISOString() ?? null }))}
        prefill={{
          lengthMm: footprint?.lengthMm ?? null,
          widthMm: footprint?.widthMm ?? null,
          note: footprint?.note ?? null,
          substrate: substrate?.type && substrate.type !== "none" ? substrate.type : null,
          depthMm: substrate?.depthMm ?? null,
          rockMassKg: typeof design?.rockMassKg === "number" ? design.rockMassKg : null,
        }}
      />
      <FillPanel
        projectId={project.id}
        units={units}
        designVolumeL={netVolumeFrom(design)}
        initial={checks.map((c) => ({ ...c, at: c.at.toISOString() }))}
      />
      </div>
    </div>
  );
}
