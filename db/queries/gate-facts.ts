import "server-only";
import { and, asc, desc, eq, inArray, isNull, sql, type SQL, type SQLWrapper } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { ammoniaDoses, projects, stageEvents, waterTests } from "../schema";
import { getCompanyCycleRules } from "./cycle-state";
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

function inSet(column: SQLWrapper, set: ProjectSet): SQL {
  return "ids" in set ? inArray(column as never, set.ids) : sql`${column} in (select ${projects.id} from ${projects} where ${set.where})`;
}

export type FactRow = {
  id: string;
  survey_complete: boolean | null;
  approval_current: boolean;
  approval_any: boolean;
  checklist_total: number;
  checklist_done: number;
  filled: boolean;
  after24h: boolean | null;
  batches: number;
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
      select la.project_id, bool_or(td.data is not null and la.design_snapshot = td.data) as current
      from load_approvals la left join tank_designs td on td.project_id = la.project_id
      where la.project_id in (select id from ids) and la.revoked_at is null
      group by la.project_id
    ),
    leaks as (
      select lc.project_id, bool_or(lc.kind = 'filled') as filled,
        (array_agg(lc.passed order by lc.at desc, lc.id desc) filter (where lc.kind = 'after 24 hours'))[1] as after24h
      from leak_checks lc where lc.project_id in (select id from ids) group by lc.project_id
    ),
    batches as (select sb.project_id, count(*)::int as n from stocking_batches sb where sb.project_id in (select id from ids) group by sb.project_id),
    deposits as (select i.project_id, bool_or(i.status = 'paid') as paid from invoices i where i.kind = 'deposit' and i.project_id in (select id from ids) group by i.project_id)
    select ids.id,
      s.complete as survey_complete,
      coalesce(a.current, false) as approval_current,
      a.project_id is not null as approval_any,
      (select count(*)::int from items) as checklist_total,
      coalesce(t.done, 0) as checklist_done,
      coalesce(l.filled, false) as filled,
      l.after24h,
      coalesce(b.n, 0) as batches,
      d.paid as deposit_paid,
      coalesce(ps.deposit_bp, (select ms.deposit_bp from money_settings ms limit 1), 5000) > 0 as deposit_required
    from ids
    left join site_surveys s on s.project_id = ids.id
    left join approvals a on a.project_id = ids.id
    left join ticks t on t.project_id = ids.id
    left join leaks l on l.project_id = ids.id
    left join batches b on b.project_id = ids.id
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
          .selectDistinctOn([stageEvents.projectId], { projectId: stageEvents.projectId, at: stageEvents.at })
          .from(stageEvents)
          .where(and(inSet(stageEvents.projectId, set), eq(stageEvents.toStage, "cycling")))
          .orderBy(stageEvents.projectId, desc(stageEvents.at)),
    empty ? [] : conn.select().from(waterTests).where(and(inSet(waterTests.projectId, set), isNull(waterTests.voidedAt))).orderBy(asc(waterTests.takenAt)),
    empty
      ? []
      : conn
          .select({ id: ammoniaDoses.id, projectId: ammoniaDoses.projectId, dosedAt: ammoniaDoses.dosedAt, targetMgL: ammoniaDoses.targetMgL })
          .from(ammoniaDoses)
          .where(and(inSet(ammoniaDoses.projectId, set), isNull(ammoniaDoses.voidedAt)))
          .orderBy(asc(ammoniaDoses.dosedAt)),
  ]);
  const startBy = new Map(starts.map((s) => [s.projectId, s.at]));
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
    aquascapeChecklist: { total: r.checklist_total, done: r.checklist_done },
    leak: { filled: r.filled, after24hPassed: r.after24h },
    cycle,
    stockingBatches: r.batches,
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
