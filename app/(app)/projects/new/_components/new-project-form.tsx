"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { projectCreateSchema, type ProjectCreateInput } from "@/app/api/projects/project-create.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

type Person = { id: string; name: string; email: string };

export function NewProjectForm({ clients, leads, crew, defaultLeadId }: { clients: Person[]; leads: Person[]; crew: Person[]; defaultLeadId: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, watch, formState, setError } = useForm<ProjectCreateInput>({
    resolver: zodResolver(projectCreateSchema),
    defaultValues: {
      clientMode: clients.length ? "existing" : "new",
      clientId: "",
      clientName: "",
      clientEmail: "",
      title: "",
      siteAddress: "",
      siteTown: "",
      targetInstallDate: "",
      leadId: defaultLeadId,
      crewIds: [],
      tankSummary: "",
    },
  });
  const mode = watch("clientMode");
  const e = formState.errors;
  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const res = await sendJson<{ id: string; invited: { name: string; email: string } | null }>("/api/projects", "POST", values);
    if (!res.ok) {
      for (const [field, message] of Object.entries(res.fields ?? {})) {
        setError((field === "email" ? "clientEmail" : field) as keyof ProjectCreateInput, { message });
      }
      setFailure(res.error);
      return;
    }
    router.push(`/projects/${res.data.id}${res.data.invited ? "?invited=1" : "?created=1"}`);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 rounded-2xl border border-line bg-card p-5 sm:grid-cols-2" aria-label="New project">
      <fieldset className="flex flex-col gap-3 sm:col-span-2">
        <legend className="mb-1 text-sm font-semibold">Client</legend>
        <div className="flex gap-4 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" value="existing" disabled={!clients.length} {...register("clientMode")} /> An existing client
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="new" {...register("clientMode")} /> A new client (we e-mail them an invitation)
          </label>
        </div>
        {mode === "existing" ? (
          <Field id="np-client" label="Client" error={e.clientId?.message}>
            <select id="np-client" className={inputStyles} aria-invalid={!!e.clientId} {...register("clientId")}>
              <option value="">Choose a client…</option>
              {clients.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name} ({c.email})
                </option>
              ))}
            </select>
          </Field>
        ) : (
          <div className="grid gap-3 sm:grid-cols-2">
            <Field id="np-client-name" label="Client's name" error={e.clientName?.message}>
              <input id="np-client-name" className={inputStyles} aria-invalid={!!e.clientName} {...register("clientName")} />
            </Field>
            <Field id="np-client-email" label="Client's e-mail" error={e.clientEmail?.message}>
              <input id="np-client-email" type="email" className={inputStyles} aria-invalid={!!e.clientEmail} {...register("clientEmail")} />
            </Field>
          </div>
        )}
      </fieldset>
      <div className="sm:col-span-2">
        <Field id="np-title" label="Project title" error={e.title?.message} hint="For example: the room and the kind of tank.">
          <input id="np-title" className={inputStyles} aria-invalid={!!e.title} {...register("title")} />
        </Field>
      </div>
      <Field id="np-address" label="Site address" error={e.siteAddress?.message}>
        <input id="np-address" className={inputStyles} aria-invalid={!!e.siteAddress} {...register("siteAddress")} />
      </Field>
      <Field id="np-town" label="Town" error={e.siteTown?.message}>
        <input id="np-town" className={inputStyles} aria-invalid={!!e.siteTown} {...register("siteTown")} />
      </Field>
      <Field id="np-install" label="Target install date (optional)" error={e.targetInstallDate?.message}>
        <input id="np-install" type="date" className={inputStyles} aria-invalid={!!e.targetInstallDate} {...register("targetInstallDate")} />
      </Field>
      <Field id="np-lead" label="Lead" error={e.leadId?.message}>
        <select id="np-lead" className={inputStyles} {...register("leadId")}>
          <option value="">No lead yet</option>
          {leads.map((l) => (
            <option key={l.id} value={l.id}>
              {l.name}
            </option>
          ))}
        </select>
      </Field>
      <fieldset className="sm:col-span-2">
        <legend className="mb-1 text-sm font-medium">Crew</legend>
        {crew.length ? (
          <div className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
            {crew.map((c) => (
              <label key={c.id} className="flex items-center gap-2">
                <input type="checkbox" value={c.id} {...register("crewIds")} /> {c.name}
              </label>
            ))}
          </div>
        ) : (
          <p className="text-sm text-muted">No crew accounts yet; add them under People.</p>
        )}
        {e.crewIds && <p className="text-xs font-medium text-danger">{e.crewIds.message ?? "Choose crew from the list."}</p>}
      </fieldset>
      <div className="sm:col-span-2">
        <Field id="np-tank" label="Tank summary (optional)" error={e.tankSummary?.message} hint="Size in mm and the kind of tank, e.g. 1200 × 500 × 600 mm planted.">
          <input id="np-tank" className={inputStyles} aria-invalid={!!e.tankSummary} {...register("tankSummary")} />
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <button type="submit" className={buttonStyles.primary} disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Creating…" : "Create project"}
        </button>
        {failure && (
          <p role="alert" className="text-sm text-danger">
            {failure}
          </p>
        )}
      </div>
    </form>
  );
}
