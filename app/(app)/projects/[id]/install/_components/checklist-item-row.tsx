"use client";
import { useEffect, useId, useState } from "react";
import { format } from "date-fns";
import { checkMeasuredValue } from "@/lib/install/checklist-progress";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { PHOTO_ACCEPT } from "@/lib/install/upload-rules";
import { waitingPhotoFor } from "@/lib/install/photo-queue";
import { ItemHistory } from "./item-history";
import { usePhotoQueueContext } from "./photo-queue-context";
import type { DayItem, DayState, ItemSubmit } from "./checklist-types";
import { UNDO_WINDOW_MINUTES, canUndoOwn, undoDeadline } from "@/lib/install/undo-window";

/** One checklist item: tick it (with a value or photo where asked), or, for the lead, untick with a reason. */
export function ChecklistItemRow({ projectId, item, state, refusal, isLead, onSubmit }: { projectId: string; item: DayItem; state: DayState | null; refusal: string | null; isLead: boolean; onSubmit: ItemSubmit }) {
  const id = useId();
  const [note, setNote] = useState("");
  const [value, setValue] = useState("");
  // The item's photo goes through the page's photo queue: kept on the phone, sent when there is signal.
  const { queue: photos, add, listen } = usePhotoQueueContext();
  const waiting = waitingPhotoFor(photos, item.id);
  const [photo, setPhoto] = useState<{ id: string; fileName: string } | null>(null);
  const [keeping, setKeeping] = useState(false);
  const [error, setError] = useState<string | null>(null);
  useEffect(
    () =>
      listen((o) => {
        if (o.entry.forItemId !== item.id) return;
        if (o.kind === "sent") setPhoto({ id: o.photo.id, fileName: o.photo.fileName });
        else if (!o.entry.thenTick) setError(`The photo wasn't accepted: ${o.message}`);
      }),
    [listen, item.id],
  );

  async function takePhoto(file: File) {
    setError(null);
    setKeeping(true);
    try {
      await add(file, item.stage, item.label, item.id);
    } catch {
      setError("This phone couldn't read that photo. Try taking it again.");
    } finally {
      setKeeping(false);
    }
  }
  const [unticking, setUnticking] = useState(false);
  const [showHistory, setShowHistory] = useState(false);
  const done = state?.done === true;

  function tick() {
    setError(null);
    let measured: number | null = null;
    if (item.measure) {
      measured = value.trim() === "" ? null : Number(value.replace(",", "."));
      const problem = checkMeasuredValue(item.measure, measured);
      if (problem) return setError(problem);
    }
    if (item.needsPhoto && !photo && !waiting) return setError("Attach a photo first: this item needs one.");
    onSubmit({ done: true, note: note.trim() || null, value: measured, attachmentId: photo?.id ?? null, photoKey: photo ? null : (waiting?.clientKey ?? null) });
    setNote("");
  }

  function untick() {
    if (!note.trim()) return setError("Say why it's being unticked.");
    setError(null);
    onSubmit({ done: false, note: note.trim(), value: null, attachmentId: null });
    setNote("");
    setValue("");
    setPhoto(null);
    setUnticking(false);
  }

  return (
    <li className={`rounded-xl border bg-card p-3 ${done ? "border-ok/40" : "border-line"}`} data-testid="checklist-item" data-item={item.label} data-done={done ? "true" : "false"}>
      <div className="flex items-start gap-3">
        <span aria-hidden="true" className={`mt-0.5 flex h-7 w-7 shrink-0 items-center justify-center rounded-full border-2 text-sm font-bold ${done ? "border-ok bg-ok text-white" : "border-line text-transparent"}`}>
          ✓
        </span>
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <p className="font-medium">{item.label}</p>
          {item.hint && <p className="text-sm text-muted">{item.hint}</p>}
          {(item.needsPhoto || item.measure) && (
            <p className="text-xs font-semibold text-muted">
              {item.needsPhoto && "Photo needed"}
              {item.needsPhoto && item.measure && " · "}
              {item.measure && `Measure in ${item.measure.unit} (${item.measure.min}–${item.measure.max})`}
            </p>
          )}
          {state && (
            <p className="text-sm" data-testid="item-status">
              {state.pending ? (
                <span className="rounded bg-caution-soft px-1.5 py-0.5 text-xs font-semibold text-caution">{state.waitingForPhoto ? "Not saved yet: waiting for its photo" : "Not saved yet"}</span>
              ) : (
                <span className="text-xs font-semibold text-ok">Saved</span>
              )}{" "}
              <span className="text-muted">
                {state.done ? "Done" : "Unticked"} by {state.byName} · <time dateTime={state.at}>{format(new Date(state.at), "d MMM, HH:mm")}</time>
                {state.value !== null && item.measure && ` · ${state.value} ${item.measure.unit}`}
                {state.note && ` · “${state.note}”`}
              </span>
            </p>
          )}
          {state?.attachmentId && (
            <a href={`/api/attachments/${state.attachmentId}?variant=full`} target="_blank" rel="noreferrer" className="w-fit">
              {/* eslint-disable-next-line @next/next/no-img-element */}
              <img src={`/api/attachments/${state.attachmentId}?variant=thumb`} alt={`Taken for: ${item.label}`} className="h-20 rounded-lg border border-line object-cover" />
            </a>
          )}
        </div>
      </div>

      {!done && (
        <div className="mt-3 flex flex-col gap-2">
          {item.measure && (
            <div className="flex flex-col gap-1">
              <label htmlFor={`${id}-value`} className="text-sm font-medium">
                Measured value ({item.measure.unit})
              </label>
              <input id={`${id}-value`} inputMode="decimal" className={`${inputStyles} min-h-11`} value={value} onChange={(e) => setValue(e.target.value)} aria-invalid={!!error} />
            </div>
          )}
          {item.needsPhoto &&
            (photo ? (
              <p className="text-sm text-ok" data-testid="item-photo" data-state="sent">
                Photo attached: {photo.fileName}
              </p>
            ) : waiting ? (
              <p className="text-sm" data-testid="item-photo" data-state="waiting">
                <span className="rounded bg-caution-soft px-1.5 py-0.5 text-xs font-semibold text-caution">Waiting to send</span> Photo kept on this phone: {waiting.fileName}
              </p>
            ) : (
              <div>
                <label htmlFor={`${id}-photo`} className={`${buttonStyles.secondary} min-h-11 cursor-pointer ${keeping ? "opacity-50" : ""}`}>
                  {keeping ? "Keeping it…" : "Attach a photo"}
                </label>
                <input
                  id={`${id}-photo`}
                  type="file"
                  accept={PHOTO_ACCEPT}
                  className="sr-only"
                  disabled={keeping}
                  onChange={(e) => {
                    const input = e.currentTarget;
                    const f = input.files?.[0];
                    if (f) void takePhoto(f).finally(() => (input.value = ""));
                  }}
                />
              </div>
            ))}
          <label htmlFor={`${id}-note`} className="sr-only">
            Note for {item.label} (optional)
          </label>
          <input id={`${id}-note`} className={`${inputStyles} min-h-11`} placeholder="Note (optional)" value={note} onChange={(e) => setNote(e.target.value)} />
          <button type="button" onClick={tick} className={`${buttonStyles.primary} min-h-11 w-full`} aria-label={`Mark done: ${item.label}`}>
            Mark done
          </button>
        </div>
      )}

      {(error || refusal) && (
        <p role="alert" className="mt-2 text-sm font-medium text-danger">
          {error ?? refusal}
        </p>
      )}

      {state && (
        <div className="mt-2 flex flex-wrap gap-2">
          {done && !isLead && state.mine && !state.pending && canUndoOwn({ byUserId: "me", at: state.at }, "me", new Date()) && (
            <button
              type="button"
              className={`${buttonStyles.secondary} min-h-11`}
              title={`Your own tick can be undone for ${UNDO_WINDOW_MINUTES} minutes`}
              onClick={() => onSubmit({ done: false, note: "Undone: ticked by mistake", value: null, attachmentId: null })}
            >
              Undo my tick (until {format(undoDeadline(state.at), "HH:mm")})
            </button>
          )}
          {done && isLead && !state.pending && !unticking && (
            <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setUnticking(true)}>
              Untick…
            </button>
          )}
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} aria-expanded={showHistory} onClick={() => setShowHistory((v) => !v)}>
            {showHistory ? "Hide history" : "History"}
          </button>
        </div>
      )}
      {unticking && (
        <div className="mt-2 flex flex-col gap-2">
          <label htmlFor={`${id}-reason`} className="text-sm font-medium">
            Why untick it?
          </label>
          <input id={`${id}-reason`} className={`${inputStyles} min-h-11`} value={note} onChange={(e) => setNote(e.target.value)} />
          <div className="flex gap-2">
            <button type="button" className={`${buttonStyles.danger} min-h-11`} onClick={untick}>
              Untick
            </button>
            <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setUnticking(false)}>
              Cancel
            </button>
          </div>
        </div>
      )}
      {showHistory && <ItemHistory projectId={projectId} itemId={item.id} unit={item.measure?.unit ?? null} />}
    </li>
  );
}
