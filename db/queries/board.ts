import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { projects } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import { queryPrepared } from "./prepared";
import { cycleVerdict, loadCycleInputs, loadRecordFacts, toGateFacts } from "./gate-facts";
import { getStageDurations } from "./stage-durations";
import { nextStageNeeds } from "../../lib/stages/gates";
import { stageLateness } from "../../lib/stages/durations";
import { OVERDUE_GRACE_HOURS } from "../../lib/service/overdue";
import type { Stage } from "../../lib/stages/stages";
import type { SessionUser } from "../../server/session";

export type BoardPerson = { id: string; name: string };

/** One card on the board, ready to send as JSON. */
export type BoardCard = {
  id: string;
  title: string;
  clientName: string;
  siteTown: string;
  stage: Stage;
  position: string;
  version: number;
  stageEnteredAt: string;
  targetInstallDate: string | null;
  /** When the card was expected to leave its stage (the company's stage durations); null in service. */
  expectedBy: string | null;
  /** Whole days past expectedBy; 0 when on time. */
  lateBy: number;
  /** Messages from the client the caller hasn't read yet. */
  unreadMessages: number;
  leadId: string | null;
  leadName: string | null;
  crew: BoardPerson[];
  /** What the gate into the next stage is missing: null in the last stage, [] when ready. */
  nextNeeds: string[] | null;
  /** Days left for the batch of fish in quarantine (the soonest, if several); null when none is. */
  quarantineDaysLeft: number | null;
  /** In service: the next routine visit not yet done or skipped, and how many are overdue (no report a day after their time). */
  nextServiceVisitAt: string | null;
  overdueVisits: number;
};

export type BoardData = { cards: BoardCard[]; people: BoardPerson[] };

type Row = {
  id: string;
  title: string;
  client_name: string;
  site_town: string;
  stage: Stage;
  position: string;
  version: number;
  stage_entered_at: Date | string;
  target_install_date: string | null;
  lead_id: string | null;
  lead_name: string | null;
  crew: BoardPerson[] | null;
  unread: number;
  service: { next: string | null; overdue: number } | null;
};

/**
 * The board as the caller may see it, in column order. A fixed number of queries however many
 * cards, run side by side: the cards with their people, the gate records of all of them, the
 * cycle inputs (rules, starts, readings, doses) of the cards in cycling, and the company's expected
 * stage durations.
 */
export async function getBoard(user: Pick<SessionUser, "id" | "role">, now = new Date()): Promise<BoardData> {
  const visible = visibleProjectsWhere(user);
  const rowsQuery = queryPrepared<Row>("board-cards", sql`
    select ${projects.id} as id, ${projects.title} as title, c.name as client_name, ${projects.siteTown} as site_town,
      ${projects.stage} as stage, ${projects.position} as position, ${projects.version} as version,
      ${projects.stageEnteredAt} as stage_entered_at, ${projects.targetInstallDate}::text as target_install_date,
      ${projects.leadId} as lead_id, l.name as lead_name,
      cr.crew,
      (select count(*)::int from messages m
        where m.project_id = ${projects.id} and m.author_id = ${projects.clientId}
          and m.created_at > coalesce((select mr.read_at from message_reads mr where mr.project_id = ${projects.id} and mr.user_id = ${user.id}), '-infinity'::timestamptz)) as unread,
      case when ${projects.stage} = 'in_service' then (
        select json_build_object(
          'next', min(v.starts_at) filter (where v.starts_at >= ${now.toISOString()}::timestamptz),
          'overdue', count(*) filter (where v.starts_at < ${now.toISOString()}::timestamptz - make_interval(hours => ${OVERDUE_GRACE_HOURS}))
        ) from visits v
        where v.project_id = ${projects.id} and v.kind = 'service visit' and v.cancelled_at is null and v.completed_at is null
      ) end as service
    from ${projects}
    join users c on c.id = ${projects.clientId}
    left join users l on l.id = ${projects.leadId}
    left join (
      select pc.project_id, json_agg(json_build_object('id', u.id, 'name', u.name) order by u.name) as crew
      from project_crew pc join users u on u.id = pc.user_id group by pc.project_id
    ) cr on cr.project_id = ${projects.id}
    where ${visible}
    order by ${projects.stage}, ${projects.position} collate "C", ${projects.id}
  `);
  // The cards, their records and the cycling cards' readings are read side by side: one round trip.
  const [res, records, cycleInputs, durations] = await Promise.all([
    rowsQuery,
    loadRecordFacts({ where: visible }),
    loadCycleInputs({ where: and(visible, eq(projects.stage, "cycling"))! }),
    getStageDurations(),
  ]);
  const rows = res;
  const people = new Map<string, BoardPerson>();
  const cards = rows.map((r): BoardCard => {
    const crew = r.crew ?? [];
    for (const p of crew) people.set(p.id, p);
    if (r.lead_id && r.lead_name) people.set(r.lead_id, { id: r.lead_id, name: r.lead_name });
    const rec = records.get(r.id);
    const f = rec ? toGateFacts(rec, r.stage === "cycling" ? cycleVerdict(cycleInputs, r.id, now) : null) : null;
    return {
      id: r.id,
      title: r.title,
      clientName: r.client_name,
      siteTown: r.site_town,
      stage: r.stage,
      position: r.position,
      version: r.version,
      stageEnteredAt: new Date(r.stage_entered_at).toISOString(),
      targetInstallDate: r.target_install_date,
      ...stageLateness({ stage: r.stage, stageEnteredAt: new Date(r.stage_entered_at) }, durations, now),
      unreadMessages: r.unread ?? 0,
      leadId: r.lead_id,
      leadName: r.lead_name,
      crew,
      nextNeeds: f ? nextStageNeeds(r.stage, f) : null,
      quarantineDaysLeft: rec?.quarantine_days_left ?? null,
      nextServiceVisitAt: r.service?.next ? new Date(r.service.next).toISOString() : null,
      overdueVisits: r.service?.overdue ?? 0,
    };
  });
  return { cards, people: [...people.values()].sort((a, b) => a.name.localeCompare(b.name)) };
}
