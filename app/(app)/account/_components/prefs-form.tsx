"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { PREF_LABELS, prefsSchema, type PrefsInput } from "@/app/api/me/notifications/prefs.schema";
import { SubmitRow } from "@/components/ui/submit-row";

/** One switch per kind of e-mail; invitations and password e-mails always go. */
export function PrefsForm({ initial, kinds }: { initial: Required<PrefsInput>; kinds: (keyof PrefsInput)[] }) {
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState } = useForm<PrefsInput>({ resolver: zodResolver(prefsSchema), defaultValues: initial });
  const onSubmit = handleSubmit(async (values) => {
    const r = await sendJson("/api/me/notifications", "PUT", values);
    setStatus(r.ok ? { ok: true, text: "Saved." } : { ok: false, text: r.error });
  });
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="prefs-heading">
      <h2 id="prefs-heading" className="text-lg font-semibold">
        E-mail notifications
      </h2>
      {kinds.map((k) => (
        <label key={k} className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" {...register(k)} />
          <span>
            <span className="font-medium">{PREF_LABELS[k].label}</span>
            <span className="block text-muted">{PREF_LABELS[k].hint}</span>
          </span>
        </label>
      ))}
      <SubmitRow busy={formState.isSubmitting} label="Save notifications" busyLabel="Saving…" status={status} />
    </form>
  );
}
