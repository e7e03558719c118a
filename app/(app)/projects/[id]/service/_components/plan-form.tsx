"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { WEEKDAYS, WEEKDAY_NAMES, type Recurrence } from "@/lib/service/recurrence";

type Initial = {
  recurrence: Recurrence | null;
  startsOn: string;
  startTime: string;
  durationMinutes: number;
  waterChangePercent: number;
  tasks: string[];
  usualAssigneeId: string | null;
  version: number | null;
};

/** The lead's plan editor. Saving writes the coming visits; a new timing replaces only untouched ones. */
export function PlanForm({ projectId, people, initial }: { projectId: string; people: { id: string; name: string }[]; initial: Initial }) {
  const router = useRouter();
  const r = initial.recurrence;
  const [v, setV] = useState({
    frequency: r?.kind ?? "weekly",
    everyWeeks: String(r?.kind === "weekly" ? r.everyWeeks : 2),
    weekday: r?.kind === "weekly" ? r.weekday : "TU",
    dayOfMonth: String(r?.kind === "monthly" ? r.dayOfMonth : 1),
    startsOn: initial.startsOn,
    startTime: initial.startTime,
    durationMinutes: String(initial.durationMinutes),
    waterChangePercent: String(initial.waterChangePercent),
    tasks: initial.tasks.join("\n"),
    usualAssigneeId: initial.usualAssigneeId ?? "",
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  const set = (k: keyof typeof v) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>) => setV((s) => ({ ...s, [k]: e.target.value }));

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setErrors({});
    setStatus(null);
    const res = await sendJson<{ added: number; replaced: number }>(`/api/projects/${projectId}/service/plan`, "PUT", {
      ...v,
      tasks: v.tasks
        .split("\n")
        .map((t) => t.trim())
        .filter(Boolean),
      version: initial.version,
    });
    if (!res.ok) {
      setErrors(res.fields ?? {});
      setStatus(res.error);
      return;
    }
    setStatus(`Plan saved. ${res.data.added} visit(s) added${res.data.replaced ? `, ${res.data.replaced} replaced` : ""}.`);
    router.refresh();
  }

  const field = (id: keyof typeof v, label: string, input: React.ReactNode) => (
    <div className="flex flex-col gap-1">
      <label htmlFor={`plan-${id}`} className="text-xs font-medium">
        {label}
      </label>
      {input}
      {errors[id] && <p className="text-xs font-medium text-danger">{errors[id]}</p>}
    </div>
  );

  return (
    <form onSubmit={save} className="mt-4 grid gap-3 border-t border-line pt-4 sm:grid-cols-2" data-testid="plan-form">
      {field(
        "frequency",
        "Repeats",
        <select id="plan-frequency" className={inputStyles} value={v.frequency} onChange={set("frequency")}>
          <option value="weekly">Weekly, or every few weeks</option>
          <option value="monthly">Monthly, on a day of the month</option>
        </select>,
      )}
      {v.frequency === "weekly" ? (
        <>
          {field("everyWeeks", "Every how many weeks", <input id="plan-everyWeeks" inputMode="numeric" className={inputStyles} value={v.everyWeeks} onChange={set("everyWeeks")} />)}
          {field(
            "weekday",
            "On",
            <select id="plan-weekday" className={inputStyles} value={v.weekday} onChange={set("weekday")}>
              {WEEKDAYS.map((d) => (
                <option key={d} value={d}>
                  {WEEKDAY_NAMES[d]}
                </option>
              ))}
            </select>,
          )}
        </>
      ) : (
        field("dayOfMonth", "Day of the month (29–31 fall on the last day of shorter months)", <input id="plan-dayOfMonth" inputMode="numeric" className={inputStyles} value={v.dayOfMonth} onChange={set("dayOfMonth")} />)
      )}
      {field("startsOn", "First day", <input id="plan-startsOn" type="date" className={inputStyles} value={v.startsOn} onChange={set("startsOn")} />)}
      {field("startTime", "Start time (company time zone)", <input id="plan-startTime" type="time" className={inputStyles} value={v.startTime} onChange={set("startTime")} />)}
      {field("durationMinutes", "Minutes per visit", <input id="plan-durationMinutes" inputMode="numeric" className={inputStyles} value={v.durationMinutes} onChange={set("durationMinutes")} />)}
      {field("waterChangePercent", "Water change (%)", <input id="plan-waterChangePercent" inputMode="decimal" className={inputStyles} value={v.waterChangePercent} onChange={set("waterChangePercent")} />)}
      {field(
        "usualAssigneeId",
        "Usually done by",
        <select id="plan-usualAssigneeId" className={inputStyles} value={v.usualAssigneeId} onChange={set("usualAssigneeId")}>
          <option value="">Nobody yet</option>
          {people.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>,
      )}
      <div className="sm:col-span-2">{field("tasks", "Tasks of a routine visit, one per line", <textarea id="plan-tasks" rows={6} className={inputStyles} value={v.tasks} onChange={set("tasks")} />)}</div>
      <div className="flex items-center gap-3 sm:col-span-2">
        <button type="submit" className={buttonStyles.primary}>
          Save the plan
        </button>
        {status && (
          <p role="status" className="text-sm">
            {status}
          </p>
        )}
      </div>
    </form>
  );
}
