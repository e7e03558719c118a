"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { inviteSchema, type InviteInput } from "@/app/api/people/invite.schema";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";

export function InviteForm() {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { role: "client", name: "", email: "", phone: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson<{ name: string }>("/api/people", "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof InviteInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset();
    setStatus({ ok: true, text: `${result.data.name} was added. Their invitation e-mail is on its way.` });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-2xl border border-line bg-card p-5 sm:grid-cols-2" aria-label="Add a person">
      <h2 className="text-lg font-semibold sm:col-span-2">Add a person</h2>
      <Field id="invite-name" label="Name" error={e.name?.message}>
        <input id="invite-name" className={inputStyles} aria-invalid={!!e.name} {...register("name")} />
      </Field>
      <Field id="invite-email" label="E-mail" error={e.email?.message}>
        <input id="invite-email" type="email" className={inputStyles} aria-invalid={!!e.email} {...register("email")} />
      </Field>
      <Field id="invite-phone" label="Phone (optional)" error={e.phone?.message}>
        <input id="invite-phone" type="tel" className={inputStyles} aria-invalid={!!e.phone} {...register("phone")} />
      </Field>
      <Field id="invite-role" label="Role" error={e.role?.message}>
        <select id="invite-role" className={inputStyles} {...register("role")}>
          <option value="client">Client: sees their own projects</option>
          <option value="crew">Crew: works assigned projects</option>
        </select>
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Add and send invitation" busyLabel="Adding…" status={status} className="sm:col-span-2" />
    </form>
  );
}
