"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";
import { contactSchema, type ContactInput } from "@/app/api/me/contact/contact.schema";

export function ContactForm({ initial, email, isLead = false }: { initial: ContactInput; email: string; isLead?: boolean }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<ContactInput>({ resolver: zodResolver(contactSchema), defaultValues: initial });
  const onSubmit = handleSubmit(async (values) => {
    const r = await sendJson("/api/me/contact", "PATCH", values);
    if (!r.ok) {
      for (const [f, message] of Object.entries(r.fields ?? {})) setError(f as keyof ContactInput, { message });
      setStatus({ ok: false, text: r.error });
      return;
    }
    setStatus({ ok: true, text: "Saved. The others on your projects see these details." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-2xl border border-line bg-card p-5 sm:grid-cols-2" aria-labelledby="contact-heading">
      <h2 id="contact-heading" className="text-lg font-semibold sm:col-span-2">
        Your contact details
      </h2>
      <Field id="contact-name" label="Name" error={e.name?.message}>
        <input id="contact-name" className={inputStyles} aria-invalid={!!e.name} {...register("name")} />
      </Field>
      <Field id="contact-phone" label="Phone (optional)" error={e.phone?.message}>
        <input id="contact-phone" type="tel" className={inputStyles} aria-invalid={!!e.phone} {...register("phone")} />
      </Field>
      <p className="text-sm text-muted sm:col-span-2">
        E-mail: {email}
        {isLead ? " (your sign-in address; it can't be changed here yet)." : " (ask your project lead to change it)."}
      </p>
      <SubmitRow busy={formState.isSubmitting} label="Save details" busyLabel="Saving…" status={status} className="sm:col-span-2" />
    </form>
  );
}
