import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { getBoard } from "@/db/queries/board";
import { filtersFromQuery } from "@/lib/stages/board-filters";
import { EmptyState } from "@/components/ui/empty-state";
import { buttonStyles } from "@/components/ui/button-styles";
import { Board } from "@/components/board/board";

export const metadata: Metadata = { title: "Installs" };

export default async function BoardPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser("lead", "crew");
  const query = await searchParams;
  const filters = filtersFromQuery((k) => {
    const v = query[k];
    return typeof v === "string" ? v : null;
  });
  const now = new Date();
  const board = await getBoard(user, now);
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold tracking-tight">Installs by stage</h1>
        {user.role === "lead" && (
          <Link href="/projects/new" className={`${buttonStyles.primary} ml-auto`}>
            New project
          </Link>
        )}
      </div>
      {board.cards.length === 0 ? (
        <EmptyState title="No installs yet">{user.role === "crew" ? "Projects you're assigned to will show here." : "Create a project to start."}</EmptyState>
      ) : (
        <Board initial={board} role={user.role} initialFilters={filters} nowIso={now.toISOString()} />
      )}
    </div>
  );
}
