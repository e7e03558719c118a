"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import { acceptQuoteSchema } from "@/app/api/projects/[id]/quotes/quote.schema";
import type { z } from "zod";

type Input = z.infer<typeof acceptQuoteSchema>;

/** The client accepts the quote they are reading by typing their name; the hash says exactly what they saw. */
export function AcceptForm({ projectId, quoteId, hash, version, name }: { projectId: string; quoteId: string; hash: string; version: number; name: string }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, handleSubmit, formState, setError } = useForm<Input>({ resolver: zodResolver(acceptQuoteSchema), defaultValues: { typedName: "", seenHash: hash } });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const res = await sendJson(`/api/projects/${projectId}/quotes/${quoteId}/accept`, "POST", values);
    if (!res.ok) {
      if (res.fields?.typedName) setError("typedName", { message: res.fields.typedName });
      setStatus({ ok: false, text: res.error });
      return;
    }
    setStatus({ ok: true, text: "Accepted. Your deposit invoice is below." });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3 rounded-xl border border-line bg-paper p-4" aria-label="Accept the quote">
      <p className="text-sm">
        To accept version {version} exactly as shown above, type your name as it is on your account (<strong>{name}</strong>). We keep the date, your
        address on the internet and a fingerprint of this quote with your acceptance.
      </p>
      <input type="hidden" {...register("seenHash")} />
      <Field id="typed-name" label="Your full name" error={formState.errors.typedName?.message}>
        <input id="typed-name" autoComplete="name" className={inputStyles} aria-invalid={!!formState.errors.typedName} {...register("typedName")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Accept this quote" busyLabel="Accepting…" status={status} />
    </form>
  );
}
