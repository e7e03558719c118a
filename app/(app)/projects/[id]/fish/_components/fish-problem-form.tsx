"use client";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/**
 * A client's report of a fish problem: the photo goes through the project's upload route (marked as a
 * problem) and the words through its messages, so the team is told the usual way.
 */
export function FishProblemForm({ projectId, stage }: { projectId: string; stage: string }) {
  const router = useRouter();
  const form = useRef<HTMLFormElement>(null);
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<FormStatus>(null);
  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const file = data.get("file");
    const what = String(data.get("what") ?? "").trim();
    if (what.length < 3) {
      setStatus({ ok: false, text: "Tell us what you see, in a few words." });
      return;
    }
    setBusy(true);
    setStatus(null);
    try {
      if (file instanceof File && file.size > 0) {
        const upload = new FormData();
        upload.set("file", file);
        upload.set("stage", stage);
        upload.set("isProblem", "true");
        upload.set("caption", what.slice(0, 300));
        const res = await fetch(`/api/projects/${projectId}/uploads`, { method: "POST", body: upload });
        if (!res.ok) {
          const body = await res.json().catch(() => null);
          setStatus({ ok: false, text: body?.error ?? `The photo didn't go through (${res.status}). Try again; nothing was sent.` });
          return;
        }
      }
      const res = await fetch(`/api/projects/${projectId}/messages`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ body: `Problem with the fish: ${what}` }),
      });
      if (!res.ok) {
        const body = await res.json().catch(() => null);
        setStatus({ ok: false, text: body?.error ?? `The message didn't go through (${res.status}). Try again.` });
        return;
      }
      form.current?.reset();
      setStatus({ ok: true, text: "Sent. Your project team has your message and photo." });
      router.refresh();
    } catch {
      setStatus({ ok: false, text: "No connection. Check the network and try again." });
    } finally {
      setBusy(false);
    }
  }
  return (
    <form ref={form} onSubmit={onSubmit} aria-labelledby="fish-problem-heading" className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4">
      <h3 id="fish-problem-heading" className="font-semibold">
        Something wrong with a fish?
      </h3>
      <p className="text-sm text-muted">Tell us what you see (a fish hiding, torn fins, white spots, one chasing another). A photo helps. Don't add medicines or new fish before we reply.</p>
      <label htmlFor="fish-problem-what" className="text-sm font-medium">
        What you see
      </label>
      <input id="fish-problem-what" name="what" maxLength={1000} className={inputStyles} />
      <label htmlFor="fish-problem-file" className="text-sm font-medium">
        Photo (optional)
      </label>
      <input id="fish-problem-file" name="file" type="file" accept="image/*" capture="environment" className="text-sm" />
      <SubmitRow busy={busy} label="Send to the team" busyLabel="Sending…" status={status} variant="secondary" />
    </form>
  );
}
