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

/** The lead's note: internal unless shared, and sharing e-mails the client. */
export function NoteForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<NoteInput>({ resolver: zodResolver(noteSchema), defaultValues: { body: "", shared: false } });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson(`/api/projects/${projectId}/notes`, "POST", values);
    if (!result.ok) {
      if (result.fields?.body) setError("body", { message: result.fields.body });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset({ body: "", shared: false });
    setStatus({ ok: true, text: values.shared ? "Note saved and shared; the client gets an e-mail." : "Internal note saved." });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4" aria-label="Add a note">
      <Field id="note-body" label="Note" error={formState.errors.body?.message}>
        <textarea id="note-body" rows={3} className={inputStyles} aria-invalid={!!formState.errors.body} {...register("body")} />
      </Field>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register("shared")} /> Share with the client (they see it and get an e-mail)
      </label>
      <SubmitRow busy={formState.isSubmitting} label="Save note" busyLabel="Saving…" status={status} />
    </form>
  );
}
