import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { listSpecies } from "@/db/queries/species";
import { WATER_KINDS, WATER_LABELS } from "@/lib/stocking/species";
import { SpeciesCatalogue } from "./_components/species-catalogue";

export const metadata: Metadata = { title: "Species" };

/** The company's species catalogue; the lead edits it. */
export default async function SpeciesPage() {
  await requirePageUser("lead");
  const rows = await listSpecies();
  const species = rows.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString(), retiredAt: null }));
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Species</h1>
        <p className="text-sm text-muted">
          The catalogue the stocking checks read: {WATER_KINDS.map((w) => `${rows.filter((r) => r.water === w).length} of ${WATER_LABELS[w]}`).join(", ")}. Each entry says where its values
          come from; values recalled rather than looked up are marked “from memory”. Ranges are rules of thumb; individual fish differ.
        </p>
      </div>
      <SpeciesCatalogue species={species} />
    </div>
  );
}
