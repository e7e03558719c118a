"use client";
import { useEffect, useState } from "react";
import { format } from "date-fns";
import { sendJson } from "@/lib/http/send-json";

type Entry = { id: string; done: boolean; note: string | null; value: number | null; byName: string; at: string };

/** Every tick and untick of one item on this project, newest first. */
export function ItemHistory({ projectId, itemId, unit }: { projectId: string; itemId: string; unit: string | null }) {
  const [entries, setEntries] = useState<Entry[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    void sendJson<{ history: Entry[] }>(`/api/projects/${projectId}/checklist/items/${itemId}`, "GET").then((res) => {
      if (res.ok) setEntries(res.data.history);
      else setError(res.error);
    });
  }, [projectId, itemId]);
  if (error) return <p className="mt-2 text-sm text-danger">{error}</p>;
  if (!entries) return <p className="mt-2 text-sm text-muted">Loading history…</p>;
  if (!entries.length) return <p className="mt-2 text-sm text-muted">Nothing saved yet.</p>;
  return (
    <ol className="mt-2 flex flex-col gap-1 border-l-2 border-line pl-3 text-sm" data-testid="item-history">
      {entries.map((e) => (
        <li key={e.id}>
          <span className={e.done ? "font-semibold text-ok" : "font-semibold text-caution"}>{e.done ? "Ticked" : "Unticked"}</span> by {e.byName},{" "}
          <time dateTime={e.at}>{format(new Date(e.at), "d MMM yyyy, HH:mm")}</time>
          {e.value !== null && unit && ` · ${e.value} ${unit}`}
          {e.note && <span className="block text-muted">“{e.note}”</span>}
        </li>
      ))}
    </ol>
  );
}
