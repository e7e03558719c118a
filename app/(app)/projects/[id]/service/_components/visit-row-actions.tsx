"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

const localInput = (iso: string) => {
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
};

/** Move one visit (time or person) or skip it with a reason; the rest of the series is untouched. */
export function VisitRowActions({ projectId, visit, people }: { projectId: string; visit: { id: string; startsAt: string; assignedTo: string | null }; people: { id: string; name: string }[] }) {
  const router = useRouter();
  const [mode, setMode] = useState<"none" | "move" | "skip">("none");
  const [startsAt, setStartsAt] = useState(localInput(visit.startsAt));
  const [assignedTo, setAssignedTo] = useState(visit.assignedTo ?? "");
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const base = `/api/projects/${projectId}/service/visits/${visit.id}`;

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const res =
      mode === "move"
        ? await sendJson(`${base}/move`, "POST", { startsAt: new Date(startsAt).toISOString(), assignedTo })
        : await sendJson(`${base}/skip`, "POST", { reason });
    if (!res.ok) setError(res.fields ? Object.values(res.fields)[0] : res.error);
    else {
      setMode("none");
      router.refresh();
    }
  }

  if (mode === "none")
    return (
      <span className="flex gap-3">
        <button type="button" className={buttonStyles.quiet} onClick={() => setMode("move")}>
          Move
        </button>
        <button type="button" className={buttonStyles.quiet} onClick={() => setMode("skip")}>
          Skip
        </button>
      </span>
    );
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2">
      {mode === "move" ? (
        <>
          <label className="flex flex-col text-xs">
            New time
            <input type="datetime-local" className={inputStyles} value={startsAt} onChange={(e) => setStartsAt(e.target.value)} />
          </label>
          <label className="flex flex-col text-xs">
            Who
            <select className={inputStyles} value={assignedTo} onChange={(e) => setAssignedTo(e.target.value)}>
              <option value="">Nobody yet</option>
              {people.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
            </select>
          </label>
        </>
      ) : (
        <label className="flex flex-col text-xs">
          Why skip it
          <input className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} />
        </label>
      )}
      <button type="submit" className={buttonStyles.secondary}>
        {mode === "move" ? "Move" : "Skip this visit"}
      </button>
      <button type="button" className={buttonStyles.quiet} onClick={() => setMode("none")}>
        Cancel
      </button>
      {error && <p className="w-full text-xs font-medium text-danger">{error}</p>}
    </form>
  );
}
