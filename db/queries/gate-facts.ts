import "server-only";
import { and, asc, inArray, isNull, sql, type SQL, type SQLWrapper } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { ammoniaDoses, projects, waterTests } from "../schema";
import { getCompanyCycleRules } from "./cycle-state";
import { approvalMatchesSql, approvalStaleWhySql } from "./load-basis";
import { queryPrepared } from "./prepared";
import { evaluateCycle } from "../../lib/cycling/evaluate-cycle";
import type { AmmoniaDose, WaterTest } from "../../lib/cycling/readings";
import type { GateFacts } from "../../lib/stages/gates";

type Conn = Db | Tx;

/** Which projects to load for: listed ids, or a condition on projects (lets the board run its queries side by side). */
export type ProjectSet = { ids: string[] } | { where: SQL };

function idsQuery(set: ProjectSet): SQL {
  return "ids" in set ? sql`select unnest(${sql.param(set.ids)}::uuid[]) as id` : sql`select ${projects.id} as id from ${projects} where ${set.where}`;
}

/**
 * `column` among the set's projects. A condition becomes `= any(array(…))`: the few ids are found
 * first and the table is read through its project index, so the cost follows the set, not the
 * table (a semi-join let PostgreSQL scan every project's rows).
 */
function inSet(column: SQLWrapper, set: ProjectSet): SQL {
  return "ids" in set ? inArray(column as never, set.ids) : sql`${column} = any(array(select ${projects.id} from ${projects} where ${set.where}))`;
}

export type FactRow = {
  id: string;
  survey_complete: boolean | null;
  approval_current: boolean;
  approval_any: boolean;
  approval_stale_why: string | null;
  checklist_total: number;
  checklist_done: number;
  filled: boolean;
  after24h: boolean | null;
  first_batch_planned: boolean;
  first_batch_in_display: boolean;
  first_batch_days_left: number | null;
  quarantine_days_left: number | null;
  deposit_paid: boolean | null;
  deposit_required: boolean;
};

/**
 * The facts every gate reads, for many projects in one query,
 * so the board costs the same number of round trips for 5 projects or 500.
 */
export async function loadRecordFacts(set: ProjectSet, conn?: Conn): Promise<Map<string, FactRow>> {
  if ("ids" in set && !set.ids.length) return new Map();
  // Set-based: each table is read once for all the projects and joined by hash, not per project.
  const query = sql`
    with ids as (${idsQuery(set)}),
    items as (select ci.id from checklist_items ci where ci.stage = 'aquascape' and ci.retired_at is null),
    latest_ticks as (
      select distinct on (ct.project_id, ct.item_id) ct.project_id, ct.done
      from checklist_ticks ct
      where ct.project_id in (select id from ids) and ct.item_id in (select id from items)
      order by ct.project_id, ct.item_id, ct.seq desc
    ),
    ticks as (select project_id, count(*) filter (where done)::int as done from latest_ticks group by project_id),
    approvals as (
      select la.project_id, bool_or(${approvalMatchesSql("la")}) as current,
        (array_agg(${approvalStaleWhySql("la")} order by la.approved_at desc))[1] as stale_why
      from load_approvals la
      where la.project_id in (select id from ids) and la.revoked_at is null
      group by la.project_id
    ),
    leaks as (
      select lc.project_id, bool_or(lc.kind = 'filled') as filled,
        (array_agg(lc.passed order by lc.at desc, lc.id desc) filter (where lc.kind = 'after 24 hours'))[1] as after24h
      from leak_checks lc where lc.project_id in (select id from ids) group by lc.project_id
    ),
    plan as (
      select pb.project_id, pb.stocking_batch_id, pb.quarantine_started_at, pb.quarantine_days, pb.position,
        case when pb.quarantine_started_at is not null and pb.stocking_batch_id is null
          then greatest(0, ceil(extract(epoch from (pb.quarantine_started_at + pb.quarantine_days * interval '1 day' - now())) / 86400))::int end as days_left
      from plan_batches pb where pb.project_id in (select id from ids)
    ),
    first_batch as (select distinct on (project_id) * from plan order by project_id, position),
    quarantine as (select project_id, min(days_left)::int as days_left from plan where days_left is not null group by project_id),
    deposits as (select i.project_id, bool_or(i.status = 'paid') as paid from invoices i where i.kind = 'deposit' and i.project_id in (select id from ids) group by i.project_id)
    select ids.id,
      s.complete as survey_complete,
      coalesce(a.current, false) as approval_current,
      a.project_id is not null as approval_any,
      a.stale_why as approval_stale_why,
      (select count(*)::int from items) as checklist_total,
      coalesce(t.done, 0) as checklist_done,
      coalesce(l.filled, false) as filled,
      l.after24h,
      fb.project_id is not null as first_batch_planned,
      coalesce(fb.stocking_batch_id is not null, false) as first_batch_in_display,
      fb.days_left as first_batch_days_left,
      q.days_left as quarantine_days_left,
      d.paid as deposit_paid,
      coalesce(ps.deposit_bp, (select ms.deposit_bp from money_settings ms limit 1), 5000) > 0 as deposit_required
    from ids
    left join site_surveys s on s.project_id = ids.id
    left join approvals a on a.project_id = ids.id
    left join ticks t on t.project_id = ids.id
    left join leaks l on l.project_id = ids.id
    left join first_batch fb on fb.project_id = ids.id
    left join quarantine q on q.project_id = ids.id
    left join deposits d on d.project_id = ids.id
    left join payment_schedules ps on ps.project_id = ids.id
  `;
  // Inside a transaction the caller's connection must run it; otherwise it is a prepared statement.
  const rows = conn ? ((await conn.execute(query)).rows as FactRow[]) : await queryPrepared<FactRow>("gate-facts", query);
  return new Map(rows.map((r) => [r.id, r]));
}

export type CycleVerdict = { ready: boolean; reasons: string[] };
export type CycleInputs = Awaited<ReturnType<typeof loadCycleInputs>>;

/**
 * What the cycle gate reads for a set of projects, with four queries in all: the company's rules,
 * when each last entered cycling, and their readings and doses (voided ones left out).
 */
export async function loadCycleInputs(set: ProjectSet, conn: Conn = db()) {
  const empty = "ids" in set && !set.ids.length;
  const [rules, starts, tests, doses] = await Promise.all([
    getCompanyCycleRules(conn),
    empty
      ? []
      : conn
          .select({
            projectId: projects.id,
            // The recorded start of the current cycle; older projects fall back to their last move into cycling.
            // Qualified by hand: drizzle writes a lone "id" here, which inside the subquery would mean stage_events.id.
            at: sql<Date | null>`coalesce(${projects.cycleStartedAt}, (select max(se.at) from stage_events se where se.project_id = "projects"."id" and se.to_stage = 'cycling'))`.mapWith(
              (v: string | Date | null) => (v === null ? null : new Date(v)),
            ),
          })
          .from(projects)
          .where(inSet(projects.id, set)),
    empty ? [] : conn.select().from(waterTests).where(and(inSet(waterTests.projectId, set), isNull(waterTests.voidedAt))).orderBy(asc(waterTests.takenAt)),
    empty
      ? []
      : conn
          .select({ id: ammoniaDoses.id, projectId: ammoniaDoses.projectId, dosedAt: ammoniaDoses.dosedAt, targetMgL: ammoniaDoses.targetMgL })
          .from(ammoniaDoses)
          .where(and(inSet(ammoniaDoses.projectId, set), isNull(ammoniaDoses.voidedAt)))
          .orderBy(asc(ammoniaDoses.dosedAt)),
  ]);
  const startBy = new Map(starts.filter((s) => s.at).map((s) => [s.projectId, s.at as Date]));
  const readingsBy = new Map<string, WaterTest[]>();
  for (const t of tests) {
    const list = readingsBy.get(t.projectId) ?? [];
    list.push({ id: t.id, takenAt: t.takenAt, ammoniaMgL: t.ammoniaMgL, nitriteMgL: t.nitriteMgL, nitrateMgL: t.nitrateMgL, pH: t.pH, tempC: t.tempC, khDkh: t.khDkh });
    readingsBy.set(t.projectId, list);
  }
  const dosesBy = new Map<string, AmmoniaDose[]>();
  for (const d of doses) {
    const list = dosesBy.get(d.projectId) ?? [];
    list.push({ id: d.id, dosedAt: d.dosedAt, targetMgL: d.targetMgL });
    dosesBy.set(d.projectId, list);
  }
  return { rules, startBy, readingsBy, dosesBy };
}

/** The cycle gate for one project from loaded inputs, by the same rules as getCycleEvaluation. */
export function cycleVerdict(inputs: CycleInputs, projectId: string, now: Date): CycleVerdict {
  const e = evaluateCycle(inputs.readingsBy.get(projectId) ?? [], {
    rules: inputs.rules,
    doses: inputs.dosesBy.get(projectId) ?? [],
    now,
    cycleStartedAt: inputs.startBy.get(projectId) ?? undefined,
  });
  return { ready: e.ready, reasons: e.reasons };
}

export async function loadCycleVerdicts(ids: string[], now: Date, conn: Conn = db()): Promise<Map<string, CycleVerdict>> {
  if (!ids.length) return new Map();
  const inputs = await loadCycleInputs({ ids }, conn);
  return new Map(ids.map((id) => [id, cycleVerdict(inputs, id, now)]));
}

/** GateFacts from a loaded row and, when evaluated, the cycle verdict. */
export function toGateFacts(r: FactRow, cycle: CycleVerdict | null): GateFacts {
  return {
    survey: r.survey_complete === null ? null : { complete: r.survey_complete },
    loadApproval: r.approval_current ? "current" : r.approval_any ? "stale" : "none",
    loadApprovalStaleWhy: r.approval_current ? null : r.approval_stale_why,
    aquascapeChecklist: { total: r.checklist_total, done: r.checklist_done },
    leak: { filled: r.filled, after24hPassed: r.after24h },
    cycle,
    firstBatch: { planned: r.first_batch_planned, inDisplay: r.first_batch_in_display, quarantineDaysLeft: r.first_batch_days_left },
    deposit: r.deposit_paid === true ? "paid" : r.deposit_paid === false ? "unpaid" : r.deposit_required ? "not_invoiced" : "not_required",
  };
}

/**
 * GateFacts for the given projects. The cycle is evaluated only for `cycleIds` (the board asks for
 * cards in cycling; a move asks when its path crosses into first stocking).
 */
export async function loadGateFacts(ids: string[], opts: { cycleIds?: string[]; now?: Date; conn?: Conn } = {}): Promise<Map<string, GateFacts>> {
  const conn = opts.conn ?? db();
  const now = opts.now ?? new Date();
  const [records, cycles] = await Promise.all([loadRecordFacts({ ids }, opts.conn), loadCycleVerdicts(opts.cycleIds ?? [], now, conn)]);
  const out = new Map<string, GateFacts>();
  for (const id of ids) {
    const r = records.get(id);
    if (r) out.set(id, toGateFacts(r, cycles.get(id) ?? null));
  }
  return out;
}
