import "server-only";
import { and, eq, sql, type SQL } from "drizzle-orm";
import { projects } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import { queryPrepared } from "./prepared";
import { cycleVerdict, loadCycleInputs, loadRecordFacts, toGateFacts } from "./gate-facts";
import { getStageDurations } from "./stage-durations";
import { nextStageNeeds } from "../../lib/stages/gates";
import { stageLateness } from "../../lib/stages/durations";
import { OVERDUE_GRACE_HOURS } from "../../lib/service/overdue";
import type { Stage } from "../../lib/stages/stages";
import { attentionSince, needsAttention } from "../../lib/stages/in-service-attention";
import type { SessionUser } from "../../server/session";
import { addTime, timed, timedSync } from "../../server/timing";

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

/**
 * The cards the caller may see (in service: only the tanks that need attention), the people on
 * them, and how many more tanks in service there are (in the paged list, not on the board).
 */
export type BoardData = { cards: BoardCard[]; people: BoardPerson[]; inServiceRest: number };

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
  in_service_total: number;
};

/**
 * The board's candidates: every active install, and of the tanks in service only those that may need
 * attention (lib/stages/in-service-attention decides; this is its cheap superset in SQL).
 */
export function boardCandidatesWhere(since: Date, overdueBefore: Date): SQL {
  return sql`(${projects.stage} <> 'in_service' or ${projects.stageEnteredAt} >= ${since.toISOString()}::timestamptz
    or ${projects.id} in (select v.project_id from visits v where v.kind = 'service visit' and v.cancelled_at is null
      and v.completed_at is null and v.starts_at < ${overdueBefore.toISOString()}::timestamptz))`;
}

/**
 * The board as the caller may see it, in column order. A fixed number of queries however many
 * cards, run side by side: the cards with their people, the gate records of all of them, the
 * cycle inputs (rules, starts, readings, doses) of the cards in cycling, and the company's expected
 * stage durations.
 */
export async function getBoard(user: Pick<SessionUser, "id" | "role">, now = new Date()): Promise<BoardData> {
  const visible = visibleProjectsWhere(user);
  const overdueBefore = new Date(now.getTime() - OVERDUE_GRACE_HOURS * 3_600_000);
  const onBoard = and(visible, boardCandidatesWhere(attentionSince(now), overdueBefore))!;
  // The in-service count rides on the cards query (a one-row total, cards joined to it), so the
  // board keeps its fixed number of queries and still answers when no card is on it.
  const rowsQuery = () => queryPrepared<Row>("board-cards", sql`
    select t.in_service_total, b.* from (
      select count(*)::int as in_service_total from ${projects} where ${visible} and ${projects.stage} = 'in_service'
    ) t left join (
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
          'overdue', count(*) filter (where v.starts_at < ${overdueBefore.toISOString()}::timestamptz)
        ) from visits v
        where v.project_id = ${projects.id} and v.kind = 'service visit' and v.cancelled_at is null and v.completed_at is null
      ) end as service
    from ${projects}
    join users c on c.id = ${projects.clientId}
    left join users l on l.id = ${projects.leadId}
    left join (
      -- Grouped once for the board's cards only (not per card, and not for the whole portfolio).
      select pc.project_id, json_agg(json_build_object('id', u.id, 'name', u.name) order by u.name) as crew
      from project_crew pc join users u on u.id = pc.user_id
      where pc.project_id in (select ${projects.id} from ${projects} where ${onBoard})
      group by pc.project_id
    ) cr on cr.project_id = ${projects.id}
    where ${onBoard}
    ) b on true
    order by b.stage, b.position collate "C", b.id
  `);
  // The cards, their records and the cycling cards' readings are read side by side: one round trip.
  const [res, records, cycleInputs, durations] = await Promise.all([
    timed("q_cards", rowsQuery),
    timed("q_gate_facts", () => loadRecordFacts({ where: onBoard })),
    timed("q_cycle_inputs_x4", () => loadCycleInputs({ where: and(visible, eq(projects.stage, "cycling"))! })),
    timed("q_durations", () => getStageDurations()),
  ]);
  return timedSync("cards_built", () => assemble(res, records, cycleInputs, durations, now));
}

function assemble(
  res: Row[],
  records: Awaited<ReturnType<typeof loadRecordFacts>>,
  cycleInputs: Awaited<ReturnType<typeof loadCycleInputs>>,
  durations: Awaited<ReturnType<typeof getStageDurations>>,
  now: Date,
): BoardData {
  const inServiceTotal = res[0]?.in_service_total ?? 0;
  const rows = res.filter((r) => r.id !== null && (r.stage !== "in_service" || needsAttention({ handedOverAt: r.stage_entered_at, overdueVisits: r.service?.overdue ?? 0 }, now)));
  const people = new Map<string, BoardPerson>();
  let gateMs = 0;
  const cards = rows.map((r): BoardCard => {
    const crew = r.crew ?? [];
    for (const p of crew) people.set(p.id, p);
    if (r.lead_id && r.lead_name) people.set(r.lead_id, { id: r.lead_id, name: r.lead_name });
    const rec = records.get(r.id);
    const gateStart = performance.now();
    const f = rec ? toGateFacts(rec, r.stage === "cycling" ? cycleVerdict(cycleInputs, r.id, now) : null) : null;
    const nextNeeds = f ? nextStageNeeds(r.stage, f) : null;
    gateMs += performance.now() - gateStart;
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
      nextNeeds,
      quarantineDaysLeft: rec?.quarantine_days_left ?? null,
      nextServiceVisitAt: r.service?.next ? new Date(r.service.next).toISOString() : null,
      overdueVisits: r.service?.overdue ?? 0,
    };
  });
  addTime("gates", gateMs);
  const shownInService = cards.filter((c) => c.stage === "in_service").length;
  return { cards, people: [...people.values()].sort((a, b) => a.name.localeCompare(b.name)), inServiceRest: Math.max(0, inServiceTotal - shownInService) };
}
