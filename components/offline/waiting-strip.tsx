import { buttonStyles } from "@/components/ui/button-styles";

/** What is still on this phone, why, and a way to try at once. Shown only while something waits. */
export function WaitingStrip({ label, reason, onRetry, testId, sticky = false }: { label: string; reason: string | null; onRetry: () => void; testId: string; sticky?: boolean }) {
  return (
    <div
      role="status"
      data-testid={testId}
      className={`flex flex-wrap items-center gap-3 rounded-xl border border-caution/40 bg-caution-soft px-4 py-3 text-sm ${sticky ? "sticky top-14 z-20 col-span-full" : ""}`}
    >
      <span className="font-semibold text-caution">{label}</span>
      <span className="text-ink/80">{reason ?? "Sending…"}</span>
      <button type="button" onClick={onRetry} className={`${buttonStyles.secondary} ml-auto min-h-11`}>
        Try now
      </button>
    </div>
  );
}
