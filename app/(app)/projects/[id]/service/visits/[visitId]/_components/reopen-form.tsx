"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

/** The lead reopens a signed-off report; the reason stays on it. */
export function ReopenForm({ projectId, visitId }: { projectId: string; visitId: string }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  async function reopen(e: React.FormEvent) {
    e.preventDefault();
    const res = await sendJson(`/api/projects/${projectId}/service/visits/${visitId}/reopen`, "POST", { reason });
    if (!res.ok) setError(res.fields?.reason ?? res.error);
    else router.refresh();
  }
  return (
    <form onSubmit={reopen} className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4">
      <label htmlFor="reopen-reason" className="text-sm font-medium">
        Reopen this report (say why)
      </label>
      <input id="reopen-reason" className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} />
      {error && <p className="text-xs font-medium text-danger">{error}</p>}
      <button type="submit" className={`${buttonStyles.secondary} self-start`}>
        Reopen
      </button>
    </form>
  );
}
