"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import type { KitView } from "@/db/queries/test-kits";
import type { Analyte } from "@/lib/cycling/readings";
import { ANALYTES, ANALYTE_NAMES, NEUTRAL_TEST_KITS } from "@/lib/cycling/test-kits";
import { sendJson } from "@/lib/http/send-json";
import { inputStyles } from "@/components/ui/button-styles";

/** The lead chooses which of the company's kits this project's water is read with, one per analyte. */
export function KitChoice({ projectId, chosen, kits }: { projectId: string; chosen: Record<Analyte, KitView>; kits: KitView[] }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  async function choose(analyte: Analyte, kitId: string) {
    setBusy(true);
    setStatus(null);
    const result = await sendJson(`/api/projects/${projectId}/test-kits`, "PUT", { analyte, kitId: kitId || null });
    setBusy(false);
    if (!result.ok) return setStatus({ ok: false, text: result.error });
    const name = kits.find((k) => k.id === kitId)?.name ?? NEUTRAL_TEST_KITS[analyte].name;
    setStatus({ ok: true, text: `${ANALYTE_NAMES[analyte]} is now read with ${name}.` });
    router.refresh();
  }
  return (
    <section aria-labelledby="kit-choice-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" data-testid="kit-choice">
      <div>
        <h2 id="kit-choice-heading" className="text-lg font-semibold">
          Kits for this tank
        </h2>
        <p className="text-sm text-muted">The kit chosen for each test gives the quick picks below. The company&apos;s kits are described in Settings.</p>
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        {ANALYTES.map((a) => (
          <div key={a} className="flex flex-col gap-1">
            <label htmlFor={`kit-${a}`} className="text-sm font-medium">
              {ANALYTE_NAMES[a]}
            </label>
            <select id={`kit-${a}`} className={inputStyles} disabled={busy} value={chosen[a].id ?? ""} onChange={(e) => choose(a, e.target.value)}>
              <option value="">{NEUTRAL_TEST_KITS[a].name} (neutral)</option>
              {kits
                .filter((k) => k.analyte === a)
                .map((k) => (
                  <option key={k.id} value={k.id!}>
                    {k.name}
                  </option>
                ))}
            </select>
          </div>
        ))}
      </div>
      {status && (
        <p role="status" className={`text-sm ${status.ok ? "text-ok" : "text-danger"}`}>
          {status.text}
        </p>
      )}
    </section>
  );
}
