"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/** The company's time zone, chosen from the zones the server knows. */
export function TimeZoneForm({ current, zones }: { current: string; zones: string[] }) {
  const router = useRouter();
  const [zone, setZone] = useState(current);
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | undefined>();
  const onSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    const result = await sendJson("/api/settings/time-zone", "PUT", { timeZone: zone });
    setBusy(false);
    setError(result.ok ? undefined : result.fields?.timeZone);
    setStatus(result.ok ? { ok: true, text: "Saved. Due dates and service visits now follow this zone." } : { ok: false, text: result.error });
    if (result.ok) router.refresh();
  };
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="time-zone-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="time-zone-heading" className="text-lg font-semibold">
          Time zone
        </h2>
        <p className="text-sm text-muted">Where the company works. Service visits recur on its clock, and &ldquo;today&rdquo;, &ldquo;this week&rdquo; and due dates are counted in it.</p>
      </div>
      <Field id="company-time-zone" label="Time zone" error={error}>
        <select id="company-time-zone" className={`${inputStyles} max-w-80`} value={zone} onChange={(e) => setZone(e.target.value)}>
          {zones.map((z) => (
            <option key={z} value={z}>
              {z.replaceAll("_", " ")}
            </option>
          ))}
        </select>
      </Field>
      <SubmitRow busy={busy} label="Save time zone" busyLabel="Saving…" status={status} />
    </form>
  );
}
