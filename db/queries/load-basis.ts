import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { FLOOR_BASIS_FIELDS } from "../../lib/survey/floor-basis";

/*
 * Whether a load approval still stands, in SQL, so the board's set-based gate query, the approval
 * view and the approve route all ask the same question. An approval stands while the design, the
 * floor inputs and the company's building code are what it screened, and no re-screen under changed
 * rules has set a reason it no longer stands. `la` is the load_approvals alias in the query.
 */

/** The floor basis as lib/survey/floor-basis builds it, from the project's survey and the company row. */
export function currentFloorBasisSql(la: string): SQL {
  const pairs = FLOOR_BASIS_FIELDS.map((f) => `'${f}', s.data->'${f}'`).join(", ");
  return sql.raw(
    `(select jsonb_strip_nulls(jsonb_build_object(${pairs}, 'floorCode', coalesce((select c.floor_code from company c where c.id = 1), 'us-irc'))) from site_surveys s where s.project_id = ${la}.project_id)`,
  );
}

function currentDesignSql(la: string): SQL {
  return sql.raw(`(select d.data from tank_designs d where d.project_id = ${la}.project_id)`);
}

/** True when the approval matches the project as it is now (revocation not considered). */
export function approvalMatchesSql(la: string): SQL {
  return sql`coalesce(${sql.raw(la)}.design_snapshot = ${currentDesignSql(la)} and ${sql.raw(la)}.stale_reason is null and (${sql.raw(la)}.floor_basis is null or ${sql.raw(la)}.floor_basis = ${currentFloorBasisSql(la)}), false)`;
}

/** Why an approval no longer matches: 'design', 'floor', or the stored re-screen reason; null when it does. */
export function approvalStaleWhySql(la: string): SQL {
  const a = sql.raw(la);
  return sql`case
    when ${currentDesignSql(la)} is null or ${a}.design_snapshot <> ${currentDesignSql(la)} then 'design'
    when ${a}.stale_reason is not null then ${a}.stale_reason
    when ${a}.floor_basis is not null and ${a}.floor_basis is distinct from ${currentFloorBasisSql(la)} then 'floor'
  end`;
}
