import { describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { db } from "@/db";

// The test database is seeded with the demo before the run; its projects are the ones whose client has a demo address.
const demo = sql`(select p.id from projects p join users c on c.id = p.client_id where c.email like '%@client.test')`;

describe("the demo data", () => {
  it("dates nothing in the future except planned visits and target dates", async () => {
    const { rows } = await db().execute<{ what: string; n: number }>(sql`
      select 'stage event' as what, count(*)::int as n from stage_events where project_id in ${demo} and at > now()
      union all select 'water test', count(*)::int from water_tests where project_id in ${demo} and (taken_at > now() or created_at > now())
      union all select 'dose', count(*)::int from ammonia_doses where project_id in ${demo} and dosed_at > now()
      union all select 'note', count(*)::int from notes where project_id in ${demo} and created_at > now()
      union all select 'message', count(*)::int from messages where project_id in ${demo} and created_at > now()
      union all select 'tick', count(*)::int from checklist_ticks where project_id in ${demo} and at > now()
      union all select 'leak check', count(*)::int from leak_checks where project_id in ${demo} and at > now()
      union all select 'fish', count(*)::int from stocking_batches where project_id in ${demo} and added_at > now()
      union all select 'survey', count(*)::int from site_surveys where project_id in ${demo} and updated_at > now()
      union all select 'approval', count(*)::int from load_approvals where project_id in ${demo} and approved_at > now()
    `);
    expect(rows.filter((r) => r.n > 0)).toEqual([]);
  });

  it("creates each project when its timeline begins, with records after it and a cycle start on its cycling event", async () => {
    const { rows } = await db().execute<{ title: string; created: string; first_event: string; early: number; cycle_ok: boolean }>(sql`
      select p.title, p.created_at::text as created, min(se.at)::text as first_event,
        (select count(*)::int from water_tests w where w.project_id = p.id and w.taken_at < p.created_at)
          + (select count(*)::int from site_surveys s where s.project_id = p.id and s.updated_at < p.created_at)
          + (select count(*)::int from load_approvals a where a.project_id = p.id and a.approved_at < p.created_at) as early,
        (p.cycle_started_at is null) = not exists (select 1 from stage_events c where c.project_id = p.id and c.to_stage = 'cycling') as cycle_ok
      from projects p join stage_events se on se.project_id = p.id
      where p.id in ${demo} group by p.id`);
    expect(rows.length).toBeGreaterThan(5);
    for (const r of rows) {
      expect(new Date(r.created).getTime(), r.title).toBe(new Date(r.first_event).getTime());
      expect(r.early, r.title).toBe(0);
      expect(r.cycle_ok, r.title).toBe(true);
    }
  });
});
