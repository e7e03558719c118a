"use client";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";

/**
 * A client's photo of a problem at home (a leak, cloudy water, a noisy pump). It is sent through
 * the app's upload route, which files it on the project's current stage, marked as a problem.
 */
export function ProblemPhotoForm({ projectId, stage }: { projectId: string; stage: string }) {
  const router = useRouter();
  const form = useRef<HTMLFormElement>(null);
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const file = data.get("file");
    if (!(file instanceof File) || file.size === 0) {
      setStatus({ ok: false, text: "Choose a photo first." });
      return;
    }
    data.set("stage", stage);
    data.set("isProblem", "true");
    setBusy(true);
    setStatus(null);
    try {
      const res = await fetch(`/api/projects/${projectId}/uploads`, { method: "POST", body: data });
      const body = await res.json().catch(() => null);
      if (!res.ok) {
        setStatus({ ok: false, text: body?.error ?? `The upload didn't go through (${res.status}). Try again.` });
        return;
      }
      form.current?.reset();
      setStatus({ ok: true, text: "Photo sent. Your project team can see it now; add a message if it's urgent." });
      router.refresh();
    } catch {
      setStatus({ ok: false, text: "No connection. Check the network and try again; nothing was sent." });
    } finally {
      setBusy(false);
    }
  }
  return (
    <form id="problem-photo" ref={form} onSubmit={onSubmit} className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4" aria-labelledby="problem-photo-heading">
      <h3 id="problem-photo-heading" className="font-semibold">
        Report a problem with a photo
      </h3>
      <p className="text-sm text-muted">If water is leaking near a socket or extension lead, switch it off at the wall before you go near it, and call us.</p>
      <label htmlFor="problem-file" className="text-sm font-medium">
        Photo
      </label>
      <input id="problem-file" name="file" type="file" accept="image/*" capture="environment" className="text-sm" />
      <label htmlFor="problem-caption" className="text-sm font-medium">
        What's wrong? (optional)
      </label>
      <input id="problem-caption" name="caption" maxLength={300} className={inputStyles} />
      <SubmitRow busy={busy} label="Send photo" busyLabel="Sending…" status={status} variant="secondary" />
    </form>
  );
}
