"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/** The tasks of a routine service visit; each new plan starts from this list. */
export function ServiceTasksForm({ tasks }: { tasks: string[] }) {
  const router = useRouter();
  const [value, setValue] = useState(tasks.join("\n"));
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | undefined>();
  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(undefined);
    const list = value
      .split("\n")
      .map((t) => t.trim())
      .filter(Boolean);
    const res = await sendJson("/api/settings/service-tasks", "PUT", { tasks: list });
    setBusy(false);
    if (!res.ok) {
      setError(res.fields ? Object.values(res.fields)[0] : undefined);
      setStatus({ ok: false, text: res.error });
      return;
    }
    setStatus({ ok: true, text: "Saved. Plans already made keep their own list; edit a plan to change it." });
    router.refresh();
  }
  return (
    <form onSubmit={save} noValidate aria-labelledby="service-tasks-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="service-tasks-heading" className="text-lg font-semibold">
          Routine visit
        </h2>
        <p className="text-sm text-muted">What a routine service visit includes. A new service plan copies this list; the lead can change it per tank.</p>
      </div>
      <Field id="service-tasks" label="Tasks, one per line" error={error}>
        <textarea id="service-tasks" rows={7} className={inputStyles} value={value} onChange={(e) => setValue(e.target.value)} />
      </Field>
      <SubmitRow busy={busy} label="Save routine visit" busyLabel="Saving…" status={status} />
    </form>
  );
}
