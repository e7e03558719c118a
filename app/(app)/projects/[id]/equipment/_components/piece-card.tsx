import type { PieceDue } from "@/lib/service/equipment-due";
import { equipmentCautions } from "@/lib/service/equipment-due";
import type { EquipmentRow } from "@/db/queries/equipment";
import { PieceActions } from "./piece-actions";
import { dateWords } from "@/lib/service/local-dates";

export type PieceLine = {
  piece: EquipmentRow & { retiredByName: string | null };
  due: PieceDue;
  lastServicedOn: string | null;
  services: { servicedOn: string; note: string | null; byName: string; visitId: string | null }[];
};

const DUE_TONE: Record<string, string> = {
  overdue: "text-danger font-semibold",
  "due today": "text-caution font-semibold",
  "due soon": "text-caution font-semibold",
  later: "text-ink",
};

const SOURCE_WORDS = { piece: "its own interval", company: "the company's interval", "common practice": "common practice" } as const;

/** One piece on the register: its next service and warranty in words, cautions and (for the team) its actions. */
export function PieceCard({ projectId, line, today, canEdit, internal, kindIntervals }: { projectId: string; line: PieceLine; today: string; canEdit: boolean; internal: boolean; kindIntervals: Record<string, number | null> }) {
  const { piece, due } = line;
  return (
    <li id={`piece-${piece.id}`} className="flex scroll-mt-20 flex-col gap-2 rounded-2xl border border-line bg-card p-4" data-testid="equipment-piece">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h4 className="font-semibold">{piece.kind}</h4>
        {piece.makeModel && <span className="text-sm text-muted">{piece.makeModel}</span>}
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Next service</dt>
        <dd className={due.dueState ? DUE_TONE[due.dueState] : "text-muted"}>
          {due.dueOn ? `${dateWords(due.dueOn)} · ` : ""}
          {due.dueWords}
          {due.interval && <span className="font-normal text-muted"> (every {due.interval.days} days, {SOURCE_WORDS[due.interval.source]})</span>}
        </dd>
        <dt className="text-muted">Last serviced</dt>
        <dd>{line.lastServicedOn ? dateWords(line.lastServicedOn) : "not yet"}</dd>
        {piece.installedOn && (
          <>
            <dt className="text-muted">Installed</dt>
            <dd>{dateWords(piece.installedOn)}</dd>
          </>
        )}
        <dt className="text-muted">Warranty</dt>
        <dd className={due.warrantyState === "ending soon" || due.warrantyState === "ends today" ? "font-semibold text-caution" : ""}>
          {piece.warrantyUntil ? `until ${dateWords(piece.warrantyUntil)} · ${due.warrantyWords}` : "not recorded"}
        </dd>
        {internal && piece.notes && (
          <>
            <dt className="text-muted">Notes</dt>
            <dd>{piece.notes}</dd>
          </>
        )}
      </dl>
      {internal && (
        <details className="text-sm">
          <summary className="cursor-pointer text-muted">Cautions for this kind</summary>
          <ul className="mt-1 list-disc pl-5 text-ink/80">
            {equipmentCautions(piece.kind).map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </details>
      )}
      {internal && line.services.length > 0 && (
        <ul className="text-xs text-muted">
          {line.services.map((s, i) => (
            <li key={i}>
              {dateWords(s.servicedOn)}: {s.note ?? "serviced"} ({s.byName}
              {s.visitId ? ", on a visit" : ""})
            </li>
          ))}
        </ul>
      )}
      {canEdit && (
        <PieceActions
          projectId={projectId}
          today={today}
          kindIntervals={kindIntervals}
          piece={{ id: piece.id, kind: piece.kind, makeModel: piece.makeModel, installedOn: piece.installedOn, warrantyUntil: piece.warrantyUntil, serviceIntervalDays: piece.serviceIntervalDays, notes: piece.notes }}
        />
      )}
    </li>
  );
}
