"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { noteSchema, type NoteInput } from "@/app/api/projects/[id]/notes/note.schema";
import { SubmitRow } from "@/components/ui/submit-row";
import { buttonStyles } from "@/components/ui/button-styles";
import { delayWords, leavesAtSentence } from "@/lib/mail/notice-delay";

/**
 * The lead's note: internal unless shared. A shared note asks first, naming who will see it, and
 * its e-mail waits in the outbox so it can be taken back from the note.
 */
export function NoteForm({ projectId, audience, delaySeconds }: { projectId: string; audience: { name: string; email: string }[]; delaySeconds: number }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [confirming, setConfirming] = useState(false);
  const names = audience.map((a) => a.name).join(" and ") || "the client";
  const { register, handleSubmit, formState, reset, setError, watch } = useForm<NoteInput>({ resolver: zodResolver(noteSchema), defaultValues: { body: "", shared: false } });
  const sharing = watch("shared");
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    if (values.shared && !confirming) {
      setConfirming(true);
      return;
    }
    setConfirming(false);
    const result = await sendJson<{ email: { to: string; leavesAt: string } | null }>(`/api/projects/${projectId}/notes`, "POST", values);
    if (!result.ok) {
      if (result.fields?.body) setError("body", { message: result.fields.body });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset({ body: "", shared: false });
    const email = values.shared && "email" in result.data ? result.data.email : null;
    setStatus({ ok: true, text: values.shared ? (email ? `Note shared with ${email.to}. ${leavesAtSentence(email.leavesAt)}` : `Note shared with ${names}.`) : "Internal note saved." });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4" aria-label="Add a note">
      <Field id="note-body" label="Note" error={formState.errors.body?.message}>
        <textarea id="note-body" rows={3} className={inputStyles} aria-invalid={!!formState.errors.body} {...register("body")} />
      </Field>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register("shared", { onChange: () => setConfirming(false) })} /> Share with {names} (they see it and get an e-mail)
      </label>
      {confirming && sharing && (
        <div role="group" aria-label="Share this note?" className="rounded-lg border border-caution/40 bg-caution-soft/40 p-3 text-sm" data-testid="note-share-confirm">
          <p className="font-semibold">Share this note with {names}?</p>
          <ul className="mt-1 list-disc pl-5 text-ink/80">
            {audience.map((a) => (
              <li key={a.email}>
                {a.name} ({a.email}) will see it on the project&apos;s timeline and get an e-mail.
              </li>
            ))}
          </ul>
          <p className="mt-1 text-xs text-muted">The e-mail waits {delayWords(delaySeconds)} in the outbox; you can take it back until it leaves.</p>
          <button type="button" className={`${buttonStyles.secondary} mt-2`} onClick={() => setConfirming(false)}>
            Not yet
          </button>
        </div>
      )}
      <SubmitRow
        busy={formState.isSubmitting}
        label={sharing ? (confirming ? `Share with ${names}` : "Save and share…") : "Save note"}
        busyLabel="Saving…"
        status={status}
      />
    </form>
  );
}
