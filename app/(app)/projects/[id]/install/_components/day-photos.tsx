"use client";
import { useEffect, useId, useMemo, useState } from "react";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { PHOTO_ACCEPT } from "@/lib/install/upload-rules";
import { waitingPhotosLabel } from "@/lib/install/photo-queue";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { WaitingStrip } from "@/components/offline/waiting-strip";
import { usePhotoQueueContext } from "./photo-queue-context";
import type { SentPhoto } from "./use-photo-queue";
import type { StoredPhoto } from "./photo-store";

type Props = { stages: Stage[]; defaultStage: Stage; initial: SentPhoto[] };

/**
 * The day's photos. One taken without a signal waits on the phone, shown as waiting, and is sent when
 * the connection returns; sent ones show the server's thumbnail.
 */
export function DayPhotos({ stages, defaultStage, initial }: Props) {
  const id = useId();
  const [sent, setSent] = useState<SentPhoto[]>(initial);
  const [stage, setStage] = useState<Stage>(defaultStage);
  const [caption, setCaption] = useState("");
  const [busy, setBusy] = useState(false);
  const { queue, add, retryNow, lastError, refusals, dismissRefusal, listen } = usePhotoQueueContext();
  useEffect(
    () =>
      listen((o) => {
        if (o.kind === "sent") setSent((s) => (s.some((x) => x.id === o.photo.id) ? s : [...s, o.photo]));
      }),
    [listen],
  );

  async function pick(files: FileList | null) {
    if (!files?.length) return;
    setBusy(true);
    try {
      for (const f of Array.from(files)) await add(f, stage, caption.trim() || null);
      setCaption("");
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="photos-heading" className="flex flex-col gap-3 rounded-xl border border-line bg-card p-4" data-testid="day-photos">
      <div className="flex flex-col gap-1">
        <h2 id="photos-heading" className="text-lg font-semibold">
          Photos
        </h2>
        <p className="text-sm text-muted">Photos taken without a signal wait on this phone and send themselves when you&apos;re back online.</p>
      </div>
      <div className="flex flex-col gap-2 sm:flex-row sm:items-end">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-stage`} className="text-sm font-medium">
            Stage
          </label>
          <select id={`${id}-stage`} className={`${inputStyles} min-h-11`} value={stage} onChange={(e) => setStage(e.target.value as Stage)}>
            {stages.map((s) => (
              <option key={s} value={s}>
                {STAGE_LABELS[s]}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-1 flex-col gap-1">
          <label htmlFor={`${id}-caption`} className="text-sm font-medium">
            Caption (optional)
          </label>
          <input id={`${id}-caption`} className={`${inputStyles} min-h-11`} value={caption} maxLength={300} onChange={(e) => setCaption(e.target.value)} />
        </div>
        <label htmlFor={`${id}-file`} className={`${buttonStyles.primary} min-h-11 cursor-pointer ${busy ? "opacity-50" : ""}`}>
          {busy ? "Keeping it…" : "Take a photo"}
        </label>
        <input
          id={`${id}-file`}
          type="file"
          multiple
          accept={PHOTO_ACCEPT}
          className="sr-only"
          disabled={busy}
          onChange={(e) => {
            const input = e.currentTarget;
            void pick(input.files).finally(() => {
              input.value = "";
            });
          }}
        />
      </div>

      {queue.length > 0 && <WaitingStrip testId="waiting-photos" label={waitingPhotosLabel(queue.length)} reason={lastError} onRetry={retryNow} />}
      {refusals.map((r) => (
        <p key={r.key} role="alert" className="flex flex-wrap items-center gap-2 text-sm font-medium text-danger">
          Not sent: {r.fileName}. {r.message}
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => dismissRefusal(r.key)}>
            Dismiss
          </button>
        </p>
      ))}

      {queue.length + sent.length > 0 ? (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
          {queue.map((p) => (
            <WaitingPhoto key={p.clientKey} photo={p} />
          ))}
          {[...sent].reverse().map((p) => (
            <li key={p.id} className="flex flex-col gap-1" data-testid="photo" data-state="sent">
              <a href={p.url} target="_blank" rel="noreferrer">
                {p.thumbUrl ? (
                  // eslint-disable-next-line @next/next/no-img-element
                  <img src={p.thumbUrl} alt={p.caption ?? p.fileName} className="aspect-square w-full rounded-lg border border-line object-cover" />
                ) : (
                  <span className="flex aspect-square w-full items-center justify-center rounded-lg border border-line text-xs text-muted">{p.fileName}</span>
                )}
              </a>
              <span className="truncate text-xs">
                <span className="font-semibold text-ok">Sent</span> · {p.caption ?? p.fileName}
              </span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-muted">No photos from install day yet.</p>
      )}
    </section>
  );
}

/** A photo still on the phone: its own preview where the browser can draw it (not HEIC). */
function WaitingPhoto({ photo }: { photo: StoredPhoto }) {
  const drawable = /^image\/(jpeg|png|webp)$/.test(photo.contentType);
  const url = useMemo(() => (drawable ? URL.createObjectURL(photo.blob) : null), [drawable, photo.blob]);
  useEffect(() => () => {
    if (url) URL.revokeObjectURL(url);
  }, [url]);
  return (
    <li className="flex flex-col gap-1" data-testid="photo" data-state="waiting">
      {url ? (
        // eslint-disable-next-line @next/next/no-img-element
        <img src={url} alt={photo.caption ?? photo.fileName} className="aspect-square w-full rounded-lg border border-caution/60 object-cover opacity-80" />
      ) : (
        <span className="flex aspect-square w-full items-center justify-center rounded-lg border border-caution/60 p-2 text-center text-xs text-muted">{photo.fileName}</span>
      )}
      <span className="truncate text-xs">
        <span className="rounded bg-caution-soft px-1 font-semibold text-caution">Waiting to send</span> · {photo.caption ?? photo.fileName}
      </span>
    </li>
  );
}
