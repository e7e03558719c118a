"use client";
import { useState } from "react";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import type { TemplateItem } from "./template-types";

/** One template item: a drag handle, its flags, and edit and retire. */
export function SortableItem({ item, onChanged, onError }: { item: TemplateItem; onChanged: (i: TemplateItem) => void; onError: (text: string) => void }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: item.id });
  const [editing, setEditing] = useState(false);
  const [confirmRetire, setConfirmRetire] = useState(false);
  const [label, setLabel] = useState(item.label);
  const [hint, setHint] = useState(item.hint ?? "");

  async function save(patch: Record<string, unknown>) {
    const res = await sendJson<{ item: TemplateItem }>(`/api/checklist-items/${item.id}`, "PATCH", patch);
    if (!res.ok) return onError(res.fields ? Object.values(res.fields)[0] : res.error);
    onChanged(res.data.item);
    setEditing(false);
    setConfirmRetire(false);
  }

  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      className={`flex flex-col gap-2 rounded-lg border border-line bg-card p-2 ${isDragging ? "shadow-lg ring-2 ring-accent" : ""}`}
      data-testid="template-item"
    >
      <div className="flex items-start gap-2">
        <button
          type="button"
          ref={setActivatorNodeRef}
          {...attributes}
          {...listeners}
          aria-label={`Move “${item.label}”`}
          className="flex h-11 w-11 shrink-0 cursor-grab items-center justify-center rounded-lg border border-line text-muted hover:bg-paper"
        >
          <span aria-hidden="true">⋮⋮</span>
        </button>
        <div className="flex min-w-0 flex-1 flex-col gap-0.5">
          <span className="font-medium">{item.label}</span>
          {item.hint && <span className="text-sm text-muted">{item.hint}</span>}
          <span className="flex flex-wrap gap-1 text-xs">
            {item.needsPhoto && <span className="rounded bg-accent-soft px-1.5 py-0.5 font-semibold text-accent-strong">Photo</span>}
            {item.measure && (
              <span className="rounded bg-paper px-1.5 py-0.5 font-semibold">
                Measured {item.measure.min}–{item.measure.max} {item.measure.unit}
              </span>
            )}
          </span>
        </div>
        <div className="flex shrink-0 gap-1">
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setEditing((v) => !v)} aria-expanded={editing}>
            Edit
          </button>
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setConfirmRetire(true)}>
            Retire
          </button>
        </div>
      </div>
      {confirmRetire && (
        <div role="alertdialog" aria-label="Retire this item?" className="flex flex-wrap items-center gap-2 rounded-lg bg-caution-soft p-2 text-sm">
          <span>Retire “{item.label}”? It leaves every checklist; past ticks stay in the history.</span>
          <button type="button" className={`${buttonStyles.danger} min-h-11`} onClick={() => void save({ retire: true })}>
            Retire it
          </button>
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setConfirmRetire(false)}>
            Keep it
          </button>
        </div>
      )}
      {editing && (
        <form
          className="flex flex-col gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void save({ label, hint: hint || null });
          }}
        >
          <label className="text-sm font-medium" htmlFor={`edit-label-${item.id}`}>
            Label
          </label>
          <input id={`edit-label-${item.id}`} className={inputStyles} value={label} onChange={(e) => setLabel(e.target.value)} />
          <label className="text-sm font-medium" htmlFor={`edit-hint-${item.id}`}>
            Hint (optional)
          </label>
          <input id={`edit-hint-${item.id}`} className={inputStyles} value={hint} onChange={(e) => setHint(e.target.value)} />
          <label className="flex min-h-11 items-center gap-2 text-sm">
            <input type="checkbox" checked={item.needsPhoto} onChange={(e) => void save({ needsPhoto: e.target.checked })} className="h-5 w-5" />
            Needs a photo
          </label>
          {item.measure && (
            <button type="button" className={buttonStyles.quiet} onClick={() => void save({ measure: null })}>
              Stop asking for a measured value
            </button>
          )}
          <button type="submit" className={`${buttonStyles.primary} min-h-11 w-fit`}>
            Save
          </button>
        </form>
      )}
    </li>
  );
}
