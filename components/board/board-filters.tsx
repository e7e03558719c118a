"use client";
import { useId } from "react";
import type { BoardPerson } from "@/db/queries/board";
import type { BoardFilters as Filters } from "@/lib/stages/board-filters";
import { inputStyles } from "@/components/ui/button-styles";

/** Person, overdue and free-text filters; the board keeps them in the address so a reload keeps them. */
export function BoardFilters({ filters, people, onChange, shown, total }: { filters: Filters; people: BoardPerson[]; onChange: (f: Filters) => void; shown: number; total: number }) {
  const id = useId();
  return (
    <form role="search" aria-label="Filter the board" className="flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-q`} className="text-xs font-medium text-muted">
          Search title, client or town
        </label>
        <input id={`${id}-q`} type="search" className={`${inputStyles} w-56`} value={filters.q ?? ""} onChange={(e) => onChange({ ...filters, q: e.target.value || undefined })} />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-person`} className="text-xs font-medium text-muted">
          Person
        </label>
        <select id={`${id}-person`} className={`${inputStyles} w-48`} value={filters.person ?? ""} onChange={(e) => onChange({ ...filters, person: e.target.value || undefined })}>
          <option value="">Everyone</option>
          {people.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
      </div>
      <label className="flex items-center gap-2 pb-2 text-sm">
        <input type="checkbox" checked={!!filters.overdue} onChange={(e) => onChange({ ...filters, overdue: e.target.checked || undefined })} />
        Late for their stage only
      </label>
      <p className="pb-2 text-xs text-muted" aria-live="polite">
        {shown === total ? `${total} projects` : `Showing ${shown} of ${total} projects`}
      </p>
    </form>
  );
}
