"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { MESSAGE_MAX, messageSchema, type MessageInput } from "@/app/api/projects/[id]/messages/message.schema";
import { SubmitRow } from "@/components/ui/submit-row";

/** Writes a message on the project. On failure the text stays in the box, so nothing is lost. */
export function MessageForm({ projectId, to }: { projectId: string; to: string }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError, watch } = useForm<MessageInput>({ resolver: zodResolver(messageSchema), defaultValues: { body: "" } });
  const length = watch("body")?.length ?? 0;
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson(`/api/projects/${projectId}/messages`, "POST", values);
    if (!result.ok) {
      if (result.fields?.body) setError("body", { message: result.fields.body });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset({ body: "" });
    setStatus({ ok: true, text: `Sent. ${to} gets an e-mail about it.` });
    router.refresh();
  });
  return (
    <form id="new-message" onSubmit={onSubmit} noValidate className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4" aria-label="Send a message">
      <Field id="message-body" label="Message" error={formState.errors.body?.message} hint={`${length}/${MESSAGE_MAX} characters`}>
        <textarea id="message-body" rows={4} className={inputStyles} aria-invalid={!!formState.errors.body} aria-describedby={formState.errors.body ? "message-body-error" : undefined} {...register("body")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Send message" busyLabel="Sending…" status={status} />
    </form>
  );
}
