import type { ReactNode } from "react";
import { buttonStyles } from "./button-styles";

export type FormStatus = { ok: boolean; text: string } | null;

/** A form's submit button with the outcome of the last try beside it, read out to screen readers. */
export function SubmitRow({
  busy,
  label,
  busyLabel,
  status,
  variant = "primary",
  className = "",
  children,
}: {
  busy: boolean;
  label: string;
  busyLabel: string;
  status: FormStatus;
  variant?: "primary" | "secondary";
  className?: string;
  children?: ReactNode;
}) {
  return (
    <div className={`flex flex-wrap items-center gap-3 ${className}`}>
      <button type="submit" className={buttonStyles[variant]} disabled={busy}>
        {busy ? busyLabel : label}
      </button>
      {children}
      {status && (
        <p role="status" className={`text-sm ${status.ok ? "text-ok" : "text-danger"}`}>
          {status.text}
        </p>
      )}
    </div>
  );
}
