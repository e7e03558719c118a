"use client";
import { useId, useState } from "react";
import { DndContext, KeyboardSensor, PointerSensor, closestCenter, useSensor, useSensors, type DragEndEvent } from "@dnd-kit/core";
import { SortableContext, arrayMove, sortableKeyboardCoordinates, verticalListSortingStrategy } from "@dnd-kit/sortable";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { sendJson } from "@/lib/http/send-json";
import { SortableItem } from "./sortable-item";
import { NewItemForm } from "./new-item-form";
import type { TemplateItem } from "./template-types";

/** Every stage's items as a sortable list; moves save the item's new neighbours. */
export function TemplateEditor({ stages, initial }: { stages: Stage[]; initial: TemplateItem[] }) {
  const dndId = useId();
  const [items, setItems] = useState(initial);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 6 } }), useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }));

  async function onDragEnd(stage: Stage, e: DragEndEvent) {
    if (!e.over || e.active.id === e.over.id) return;
    const live = items.filter((i) => i.stage === stage && !i.retiredAt);
    const from = live.findIndex((i) => i.id === e.active.id);
    const to = live.findIndex((i) => i.id === e.over!.id);
    const moved = arrayMove(live, from, to);
    const before = items;
    setItems([...items.filter((i) => !(i.stage === stage && !i.retiredAt)), ...moved]);
    const res = await sendJson<{ item: TemplateItem }>(`/api/checklist-items/${e.active.id}`, "PATCH", { after: moved[to - 1]?.id ?? null, before: moved[to + 1]?.id ?? null });
    if (!res.ok) {
      setItems(before);
      setMessage({ ok: false, text: res.error });
    } else setMessage({ ok: true, text: `Moved “${res.data.item.label}”.` });
  }

  const replace = (item: TemplateItem) => setItems((xs) => xs.map((x) => (x.id === item.id ? { ...item, retiredAt: item.retiredAt ? String(item.retiredAt) : null } : x)));

  return (
    <div className="flex flex-col gap-8">
      {message && (
        <p role="status" className={`text-sm ${message.ok ? "text-ok" : "text-danger"}`}>
          {message.text}
        </p>
      )}
      {stages.map((stage) => {
        const live = items.filter((i) => i.stage === stage && !i.retiredAt);
        const retired = items.filter((i) => i.stage === stage && i.retiredAt);
        return (
          <section key={stage} aria-labelledby={`tpl-${stage}`} className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-4" data-testid={`template-${stage}`}>
            <h2 id={`tpl-${stage}`} className="text-lg font-semibold">
              {STAGE_LABELS[stage]} <span className="text-sm font-normal text-muted">· {live.length} items</span>
            </h2>
            {live.length ? (
              <DndContext id={`${dndId}-${stage}`} sensors={sensors} collisionDetection={closestCenter} onDragEnd={(e) => void onDragEnd(stage, e)}>
                <SortableContext items={live.map((i) => i.id)} strategy={verticalListSortingStrategy}>
                  <ol className="flex flex-col gap-2">
                    {live.map((item) => (
                      <SortableItem key={item.id} item={item} onChanged={replace} onError={(text) => setMessage({ ok: false, text })} />
                    ))}
                  </ol>
                </SortableContext>
              </DndContext>
            ) : (
              <p className="text-sm text-muted">No items for this stage.</p>
            )}
            <NewItemForm stage={stage} onAdded={(item) => setItems((xs) => [...xs, { ...item, retiredAt: null }])} />
            {retired.length > 0 && (
              <details className="text-sm">
                <summary className="cursor-pointer text-muted">{retired.length} retired</summary>
                <ul className="mt-1 list-disc pl-5 text-muted">
                  {retired.map((r) => (
                    <li key={r.id}>{r.label}</li>
                  ))}
                </ul>
              </details>
            )}
          </section>
        );
      })}
    </div>
  );
}
