import type { ReactNode } from "react";

/** A short, specific caution: who to ask, what not to do. */
export function Caution({ tone = "caution", title, children }: { tone?: "caution" | "danger" | "info"; title?: string; children: ReactNode }) {
  const styles = {
    caution: "border-caution/40 bg-caution-soft text-caution",
    danger: "border-danger/40 bg-danger-soft text-danger",
    info: "border-accent/30 bg-accent-soft text-accent-strong",
  }[tone];
  return (
    <div role={tone === "danger" ? "alert" : "note"} className={`rounded-lg border px-3 py-2 text-sm ${styles}`}>
      {title && <p className="font-semibold">{title}</p>}
      <div className="text-ink/80">{children}</div>
    </div>
  );
}
