"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { percent } from "@/lib/install/checklist-progress";
import { pendingLabel, type QueuedTick } from "@/lib/install/tick-queue";
import { tickKeyForPhoto } from "@/lib/install/photo-queue";
import { useTickQueue } from "@/components/offline/use-tick-queue";
import { WaitingStrip } from "@/components/offline/waiting-strip";
import { ChecklistItemRow } from "./checklist-item-row";
import { usePhotoQueueContext } from "./photo-queue-context";
import type { DayItem, DayState, ItemSubmit } from "./checklist-types";

type Props = {
  projectId: string;
  stages: Stage[];
  items: DayItem[];
  initial: Record<string, DayState>;
  me: { name: string; isLead: boolean };
};

/** The day's checklist, one stage after another, ticked on a phone and saved even on a poor signal. */
export function ChecklistDay({ projectId, stages, items, initial, me }: Props) {
  const [states, setStates] = useState<Record<string, DayState>>(initial);
  const [refusals, setRefusals] = useState<Record<string, string>>({});
  const [confirmed, setConfirmed] = useState<Record<string, DayState>>(initial);

  const onSaved = useCallback((t: { itemId: string; at: string }, q: QueuedTick) => {
    const saved: DayState = { done: q.done, note: q.note, value: q.value, attachmentId: q.attachmentId, byName: me.name, mine: true, at: t.at, pending: false };
    setConfirmed((c) => ({ ...c, [q.itemId]: saved }));
    setStates((s) => (s[q.itemId]?.pending && s[q.itemId]?.at === q.queuedAt ? { ...s, [q.itemId]: saved } : s));
  }, [me.name]);

  /** A refused save: the item goes back to what the server last confirmed, with the reason. */
  const refuse = useCallback((itemId: string, reason: string) => {
    setRefusals((r) => ({ ...r, [itemId]: reason }));
    setStates((s) => {
      const next = { ...s };
      if (confirmed[itemId]) next[itemId] = confirmed[itemId];
      else delete next[itemId];
      return next;
    });
  }, [confirmed]);

  const onRefused = useCallback((q: QueuedTick, error: string) => refuse(q.itemId, `Not saved: ${error}`), [refuse]);

  const { queue, enqueue, retryNow, lastError } = useTickQueue(projectId, { onSaved, onRefused });

  const { queue: photos, holdTick, listen } = usePhotoQueueContext();
  // Photo key → the server's id, for a "Mark done" pressed just after its photo left the queue.
  const sentPhotoIds = useRef(new Map<string, string>());

  // A tick held on a photo follows it as soon as the server has the photo, under a key made from the
  // photo's, so sending the photo twice can't tick twice.
  useEffect(
    () =>
      listen((o) => {
        const { entry } = o;
        if (!entry.forItemId) return;
        if (o.kind === "sent") sentPhotoIds.current.set(entry.clientKey, o.photo.id);
        const held = entry.thenTick;
        if (!held) return;
        if (o.kind === "sent") {
          const q = enqueue({ itemId: held.itemId, done: true, note: held.note, value: held.value, attachmentId: o.photo.id, clientKey: tickKeyForPhoto(entry.clientKey) });
          setStates((s) => ({ ...s, [held.itemId]: { done: true, note: held.note, value: held.value, attachmentId: o.photo.id, byName: me.name, mine: true, at: q.queuedAt, pending: true } }));
        } else {
          refuse(held.itemId, `Not saved: the photo was refused. ${o.message} Take it again.`);
        }
      }),
    [listen, enqueue, me.name, refuse],
  );

  // Ticks held on photos still on this phone show as pending, waiting for the photo.
  useEffect(() => {
    const held = photos.filter((p) => p.thenTick);
    if (!held.length) return;
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the photo queue comes from IndexedDB after mount
    setStates((s) => {
      const next = { ...s };
      for (const { thenTick: t } of held) {
        if (t && !next[t.itemId]?.pending) next[t.itemId] = { done: true, note: t.note, value: t.value, attachmentId: null, byName: me.name, mine: true, at: t.heldAt, pending: true, waitingForPhoto: true };
      }
      return next;
    });
  }, [photos, me.name]);

  // Ticks left on this phone from an earlier visit show as pending until they are sent.
  useEffect(() => {
    if (!queue.length) return;
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the queue comes from localStorage after mount
    setStates((s) => {
      const next = { ...s };
      for (const q of queue) {
        if (!next[q.itemId]?.pending) next[q.itemId] = { done: q.done, note: q.note, value: q.value, attachmentId: q.attachmentId, byName: me.name, mine: true, at: q.queuedAt, pending: true };
      }
      return next;
    });
  }, [queue, me.name]);

  function submit(itemId: string, { photoKey, ...t }: Parameters<ItemSubmit>[0]) {
    setRefusals((r) => {
      const { [itemId]: _gone, ...rest } = r;
      return rest;
    });
    if (photoKey && !t.attachmentId) {
      const sentId = sentPhotoIds.current.get(photoKey);
      if (!sentId) {
        const heldAt = new Date().toISOString();
        if (holdTick(photoKey, { itemId, note: t.note, value: t.value, heldAt })) {
          setStates((s) => ({ ...s, [itemId]: { ...t, byName: me.name, mine: true, at: heldAt, pending: true, waitingForPhoto: true } }));
        } else {
          setRefusals((r) => ({ ...r, [itemId]: "Not saved: the photo wasn't sent. Take it again." }));
        }
        return;
      }
      t = { ...t, attachmentId: sentId };
    }
    const q = enqueue({ itemId, ...t });
    setStates((s) => ({ ...s, [itemId]: { ...t, byName: me.name, mine: true, at: q.queuedAt, pending: true } }));
  }

  return (
    // Phone first, one column; a desktop uses its width with a column per stage.
    <div className="grid items-start gap-6 lg:grid-cols-2 2xl:grid-cols-3" data-testid="checklist-columns">
      {queue.length > 0 && (
        <WaitingStrip testId="pending-ticks" sticky label={pendingLabel(queue.length)} reason={lastError} onRetry={retryNow} />
      )}
      {stages.map((stage) => {
        const list = items.filter((i) => i.stage === stage);
        if (!list.length) return null;
        const done = list.filter((i) => states[i.id]?.done).length;
        const pct = percent(done, list.length);
        const headingId = `stage-${stage}`;
        return (
          <section key={stage} aria-labelledby={headingId} className="flex flex-col gap-3" data-testid={`checklist-${stage}`}>
            <div className="flex flex-col gap-1">
              <div className="flex items-baseline justify-between gap-2">
                <h2 id={headingId} className="text-lg font-semibold">
                  {STAGE_LABELS[stage]}
                </h2>
                <span className="text-sm tabular-nums text-muted" data-testid={`progress-${stage}`}>
                  {done} of {list.length} done
                </span>
              </div>
              <div role="progressbar" aria-label={`${STAGE_LABELS[stage]} progress`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-2.5 overflow-hidden rounded-full bg-paper">
                <div className={`h-full rounded-full ${pct === 100 ? "bg-ok" : "bg-accent"}`} style={{ width: `${pct}%` }} />
              </div>
            </div>
            <ol className="flex flex-col gap-2">
              {list.map((item) => (
                <ChecklistItemRow
                  key={item.id}
                  projectId={projectId}
                  item={item}
                  state={states[item.id] ?? null}
                  refusal={refusals[item.id] ?? null}
                  isLead={me.isLead}
                  onSubmit={(t) => submit(item.id, t)}
                />
              ))}
            </ol>
          </section>
        );
      })}
    </div>
  );
}
