import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { listChecklistItems } from "@/db/queries/checklists";
import { STAGES } from "@/lib/stages/stages";
import { TemplateEditor } from "./_components/template-editor";

export const metadata: Metadata = { title: "Checklists" };

/** The company's checklist per stage, edited by the lead: add, reorder, mark photo or measured, retire. */
export default async function ChecklistsPage() {
  await requirePageUser("lead");
  const items = await listChecklistItems({ includeRetired: true });
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Checklists</h1>
        <p className="text-sm text-muted">
          What the crew tick on the day, stage by stage. Drag to reorder (or focus the handle and use Space and the arrow keys). Retired
          items leave the list but stay in every project&apos;s history.
        </p>
      </div>
      <TemplateEditor stages={[...STAGES]} initial={items.map((i) => ({ ...i, retiredAt: i.retiredAt?.toISOString() ?? null, createdAt: i.createdAt.toISOString() }))} />
    </div>
  );
}
