"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { format } from "date-fns";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { Field } from "@/components/ui/field";

export type ApprovalState = {
  approvedAt: string;
  approvedByName: string;
  engineerReference: string | null;
  current: boolean;
  /** Why a standing approval no longer matches, in plain words. */
  staleReason: string | null;
  revokedAt: string | null;
  revokedByName: string | null;
  revokeReason: string | null;
} | null;

const when = (iso: string) => format(new Date(iso), "d MMM yyyy, HH:mm");

/** The approval's state for everyone on the section; approve and withdraw for the lead. */
export function ApprovalPanel(props: {
  projectId: string;
  isLead: boolean;
  approval: ApprovalState;
  designUpdatedAt: string | null;
  surveyComplete: boolean;
  needsEngineer: boolean;
  glassOk: boolean;
}) {
  const { projectId, isLead, approval, designUpdatedAt, surveyComplete, needsEngineer, glassOk } = props;
  const router = useRouter();
  const [reference, setReference] = useState("");
  const [reason, setReason] = useState("");
  const [error, setError] = useState<{ text: string; field?: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const standing = approval && !approval.revokedAt;
  const currentApproval = standing && approval.current;

  async function approve() {
    setBusy(true);
    setError(null);
    const res = await sendJson(`/api/projects/${projectId}/load-approval`, "POST", { engineerReference: reference || null, designUpdatedAt });
    setBusy(false);
    if (!res.ok) {
      setError({ text: res.error, field: res.fields?.engineerReference ? "engineerReference" : undefined });
      if (res.status === 409) router.refresh();
      return;
    }
    setReference("");
    router.refresh();
  }

  async function revoke() {
    setBusy(true);
    setError(null);
    const res = await sendJson(`/api/projects/${projectId}/load-approval/revoke`, "POST", { reason });
    setBusy(false);
    if (!res.ok) {
      setError({ text: res.fields?.reason ?? res.error, field: "reason" });
      return;
    }
    setReason("");
    router.refresh();
  }

  let state: { text: string; cls: string };
  if (!approval) state = { text: "Not approved yet", cls: "bg-paper text-muted" };
  else if (approval.revokedAt) state = { text: "Approval withdrawn", cls: "bg-paper text-muted" };
  else if (approval.current) state = { text: "Approved for this design", cls: "bg-ok-soft text-ok" };
  else state = { text: "Approval no longer stands", cls: "bg-caution-soft text-caution" };

  const blocked = !designUpdatedAt
    ? "Save a tank design first."
    : !surveyComplete
      ? "Finish the site survey first."
      : !glassOk
        ? "A panel doesn't pass the glass check (too thin, or past the plate table): change the design first."
        : null;

  return (
    <section aria-labelledby="approval-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="approval-heading" className="text-lg font-semibold">
          Load check sign-off
        </h2>
        <span className={`rounded-full px-2.5 py-0.5 text-xs font-semibold ${state.cls}`} data-testid="approval-state">
          {state.text}
        </span>
      </div>
      {approval && (
        <p className="text-sm text-ink/80">
          Approved by {approval.approvedByName} on {when(approval.approvedAt)}
          {approval.engineerReference && <> · Engineer&apos;s approval: {approval.engineerReference}</>}
          {approval.revokedAt && (
            <>
              <br />
              Withdrawn by {approval.revokedByName} on {when(approval.revokedAt)}: {approval.revokeReason}
            </>
          )}
          {standing && !approval.current && (
            <>
              <br />
              <span data-testid="approval-stale-reason">{approval.staleReason ?? "The design has changed since."}</span> The lead must check the new figures and approve again.
            </>
          )}
        </p>
      )}

      {isLead && !currentApproval && (
        <div className="flex flex-col gap-3">
          {blocked ? (
            <p className="text-sm text-muted">{blocked}</p>
          ) : (
            <>
              {needsEngineer && (
                <Field
                  id="engineer-reference"
                  label="Structural engineer's approval (required: name, firm, date and reference)"
                  error={error?.field === "engineerReference" ? error.text : undefined}
                  hint="The floor screens over its rated load, so an engineer must have checked it."
                >
                  <textarea id="engineer-reference" rows={2} className={inputStyles} value={reference} onChange={(ev) => setReference(ev.target.value)} aria-invalid={error?.field === "engineerReference"} />
                </Field>
              )}
              <div>
                <button type="button" className={buttonStyles.primary} onClick={approve} disabled={busy}>
                  {busy ? "Approving…" : "Approve the load check"}
                </button>
              </div>
            </>
          )}
        </div>
      )}
      {!isLead && !currentApproval && <p className="text-sm text-muted">Only the project lead can approve the load check.</p>}

      {isLead && standing && (
        <details className="rounded-lg border border-line px-3 py-2 text-sm">
          <summary className="cursor-pointer font-medium">Withdraw the approval</summary>
          <div className="mt-2 flex flex-col gap-2">
            <Field id="revoke-reason" label="Reason" error={error?.field === "reason" ? error.text : undefined}>
              <input id="revoke-reason" className={inputStyles} value={reason} onChange={(ev) => setReason(ev.target.value)} />
            </Field>
            <div>
              <button type="button" className={buttonStyles.danger} onClick={revoke} disabled={busy}>
                Withdraw approval
              </button>
            </div>
          </div>
        </details>
      )}
      {error && !error.field && (
        <p role="alert" className="text-sm text-danger">
          {error.text}
        </p>
      )}
    </section>
  );
}
