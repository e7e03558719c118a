"use client";
import { useCallback, useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { newTickKey, pendingLabel, type QueuedTick } from "@/lib/install/tick-queue";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { UploadButton } from "@/components/ui/upload-button";
import { useTickQueue } from "@/components/offline/use-tick-queue";
import { WaitingStrip } from "@/components/offline/waiting-strip";
import type { VisitReportView } from "@/db/queries/visit-reports";
import { WaterTestPanel } from "./water-test-panel";

type Json<T> = T extends Date ? string : T extends object ? { [K in keyof T]: Json<T[K]> } : T;
type Props = { projectId: string; report: Json<VisitReportView>; equipment: { id: string; label: string; serviced: boolean }[] };

const visitQueueKey = (visitId: string) => `tankwright:visit-ticks:${visitId}`;

/**
 * The visit report on a phone. Task ticks go through the same offline queue as install day (kept on
 * the phone, sent in order, each once); the written parts save with one button; sign-off locks it.
 */
export function VisitReportForm({ projectId, report, equipment }: Props) {
  const router = useRouter();
  const visitId = report.visit.id;
  const base = `/api/projects/${projectId}/service/visits/${visitId}`;
  const [done, setDone] = useState<Record<number, boolean>>(() => Object.fromEntries(report.tasks.map((t) => [t.index, t.done])));
  const [refused, setRefused] = useState<string | null>(null);
  const [fields, setFields] = useState({
    waterChangeL: report.waterChangeL == null ? "" : String(report.waterChangeL),
    livestockNote: report.livestockNote ?? "",
    clientNotes: report.clientNotes ?? "",
    internalNotes: report.internalNotes ?? "",
  });
  const [saved, setSaved] = useState<string | null>(null);
  const [serviced, setServiced] = useState<Record<string, boolean>>(() => Object.fromEntries(equipment.map((e) => [e.id, e.serviced])));
  const [photos, setPhotos] = useState(report.photos);
  const [error, setError] = useState<string | null>(null);

  const onSaved = useCallback(() => setRefused(null), []);
  const onRefused = useCallback((q: QueuedTick, message: string) => {
    setRefused(`Not saved: ${message}`);
    setDone((d) => ({ ...d, [Number(q.itemId)]: !q.done }));
  }, []);
  const { queue, enqueue, retryNow, lastError } = useTickQueue(projectId, { onSaved, onRefused }, {
    url: `${base}/ticks`,
    storageKey: visitQueueKey(visitId),
    body: (q) => ({ taskIndex: Number(q.itemId), done: q.done }),
  });

  function tick(index: number, value: boolean) {
    setDone((d) => ({ ...d, [index]: value }));
    enqueue({ itemId: String(index), done: value, note: null, value: null, attachmentId: null });
  }

  async function saveFields(): Promise<boolean> {
    setSaved(null);
    setError(null);
    const res = await sendJson(base, "PATCH", {
      waterChangeL: fields.waterChangeL,
      livestockNote: fields.livestockNote || null,
      clientNotes: fields.clientNotes || null,
      internalNotes: fields.internalNotes || null,
    });
    if (!res.ok) {
      setError(res.fields ? Object.values(res.fields)[0] : res.error);
      return false;
    }
    setSaved("Saved.");
    return true;
  }

  async function serviceEquipment(id: string) {
    setServiced((s) => ({ ...s, [id]: true }));
    const res = await sendJson(`${base}/equipment`, "POST", { equipmentId: id, clientKey: newTickKey() });
    if (!res.ok) {
      setServiced((s) => ({ ...s, [id]: false }));
      setError(res.error);
    }
  }

  async function signOff() {
    setError(null);
    if (queue.length) {
      setError("Some ticks are still waiting to save. Sign off once they are sent.");
      return;
    }
    if (!(await saveFields())) return;
    const res = await sendJson(`${base}/sign-off`, "POST", {});
    if (!res.ok) setError(res.error);
    else router.refresh();
  }

  const set = (k: keyof typeof fields) => (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => setFields((f) => ({ ...f, [k]: e.target.value }));

  return (
    <div className="flex flex-col gap-4" data-testid="visit-report-form">
      {queue.length > 0 && (
        <WaitingStrip testId="pending-ticks" sticky label={pendingLabel(queue.length)} reason={lastError} onRetry={retryNow} />
      )}
      <fieldset className="flex flex-col gap-1 rounded-2xl border border-line bg-card p-4">
        <legend className="px-1 text-sm font-semibold">Tasks</legend>
        {report.tasks.length === 0 && <p className="text-sm text-muted">The plan lists no tasks.</p>}
        {report.tasks.map((t) => (
          <label key={t.index} className="flex min-h-11 items-center gap-3 text-sm">
            <input type="checkbox" className="h-5 w-5" checked={!!done[t.index]} onChange={(e) => tick(t.index, e.target.checked)} />
            {t.label}
          </label>
        ))}
        {refused && <p className="text-xs font-medium text-danger">{refused}</p>}
      </fieldset>

      <div className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-4">
        <label htmlFor="water-change" className="text-sm font-medium">
          Water changed (L)
        </label>
        <input id="water-change" inputMode="decimal" className={`${inputStyles} num`} value={fields.waterChangeL} onChange={set("waterChangeL")} />
        <p className="text-xs text-muted">
          {report.suggestedL != null
            ? `The plan's ${report.waterChangePercent} % of the tank and sump from its design is ${report.suggestedL} L.`
            : "The design gives no volume, so enter the litres changed."}
        </p>
      </div>

      <WaterTestPanel base={base} initial={report.waterTest ? { ...report.waterTest } : null} />

      {equipment.length > 0 && (
        <fieldset className="flex flex-col gap-1 rounded-2xl border border-line bg-card p-4">
          <legend className="px-1 text-sm font-semibold">Equipment serviced</legend>
          {equipment.map((e) => (
            <label key={e.id} className="flex min-h-11 items-center gap-3 text-sm">
              <input type="checkbox" className="h-5 w-5" checked={!!serviced[e.id]} disabled={!!serviced[e.id]} onChange={() => void serviceEquipment(e.id)} />
              {e.label}
            </label>
          ))}
          <p className="text-xs text-muted">Ticking a piece records its service and restarts its service clock. Switch equipment off at the mains before opening it.</p>
        </fieldset>
      )}

      <div className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-4">
        <label htmlFor="livestock-note" className="text-sm font-medium">
          Livestock check
        </label>
        <textarea id="livestock-note" rows={2} className={inputStyles} value={fields.livestockNote} onChange={set("livestockNote")} />
        {report.hasLivestockRecord && (
          <a className={buttonStyles.quiet} href={`/projects/${projectId}/fish`}>
            Open the livestock record
          </a>
        )}
        <label htmlFor="client-notes" className="text-sm font-medium">
          Notes for the client
        </label>
        <textarea id="client-notes" rows={3} className={inputStyles} value={fields.clientNotes} onChange={set("clientNotes")} />
        <label htmlFor="internal-notes" className="text-sm font-medium">
          Internal notes (the team only; never shown to the client)
        </label>
        <textarea id="internal-notes" rows={2} className={inputStyles} value={fields.internalNotes} onChange={set("internalNotes")} />
        <button type="button" className={`${buttonStyles.secondary} self-start`} onClick={() => void saveFields()}>
          Save notes
        </button>
        {saved && <p role="status" className="text-xs text-ok">{saved}</p>}
      </div>

      <div className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4">
        <p className="text-sm font-semibold">Photos</p>
        <div className="flex flex-wrap gap-2">
          {photos.map((p) => (
            // eslint-disable-next-line @next/next/no-img-element -- photos stream through the app's checked route
            <img key={p.id} src={`/api/attachments/${p.id}?variant=thumb`} alt={p.caption ?? p.fileName} className="h-20 w-20 rounded-lg object-cover" />
          ))}
        </div>
        <UploadButton
          projectId={projectId}
          stage="in_service"
          label="Add a photo"
          onUploaded={async (file) => {
            const res = await sendJson(`${base}/photos`, "POST", { attachmentId: file.id });
            if (res.ok) setPhotos((p) => [...p, { id: file.id, fileName: file.fileName, caption: null }]);
            else setError(res.error);
          }}
        />
      </div>

      {error && (
        <p role="alert" className="text-sm font-medium text-danger">
          {error}
        </p>
      )}
      <button type="button" className={`${buttonStyles.primary} min-h-11`} onClick={() => void signOff()}>
        Sign off and send to the client
      </button>
    </div>
  );
}
