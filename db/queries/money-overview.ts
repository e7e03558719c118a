import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import { db } from "../index";
import { invoices, projects, users } from "../schema";

export type MoneyProjectRow = {
  id: string;
  title: string;
  stage: string;
  client_name: string;
  quote_version: number | null;
  quote_total: number | null;
  quote_accepted: boolean;
  accepted_total: number | null;
  invoiced: number;
  paid: number;
  open: number;
  overdue: number;
};

/** Per project: the current quote, what was accepted, invoiced, paid, open and overdue (today's date in UTC). */
export async function getMoneyOverview(today: string): Promise<MoneyProjectRow[]> {
  const res = await db().execute(sql`
    select p.id, p.title, p.stage, u.name as client_name,
      q.version as quote_version, q.total_minor::float8 as quote_total,
      (qa.id is not null) as quote_accepted,
      (select q2.total_minor::float8 from quote_acceptances a2 join quotes q2 on q2.id = a2.quote_id
        where a2.project_id = p.id order by a2.accepted_at desc limit 1) as accepted_total,
      coalesce(sum(i.total_minor), 0)::float8 as invoiced,
      coalesce(sum(i.total_minor) filter (where i.status = 'paid'), 0)::float8 as paid,
      coalesce(sum(i.total_minor) filter (where i.status = 'open'), 0)::float8 as open,
      coalesce(sum(i.total_minor) filter (where i.status = 'open' and i.due_on < ${today}::date), 0)::float8 as overdue
    from projects p
    join users u on u.id = p.client_id
    left join quotes q on q.project_id = p.id and q.status = 'current'
    left join quote_acceptances qa on qa.quote_id = q.id
    left join invoices i on i.project_id = p.id
    group by p.id, u.name, q.id, qa.id
    order by p.title
  `);
  return res.rows as MoneyProjectRow[];
}

/** Unpaid invoices across projects, oldest due first. */
export async function listOpenInvoices() {
  return db()
    .select({ id: invoices.id, number: invoices.number, kind: invoices.kind, period: invoices.period, totalMinor: invoices.totalMinor, currency: invoices.currency, dueOn: invoices.dueOn, projectId: projects.id, projectTitle: projects.title, clientName: users.name })
    .from(invoices)
    .innerJoin(projects, eq(projects.id, invoices.projectId))
    .innerJoin(users, eq(users.id, projects.clientId))
    .where(eq(invoices.status, "open"))
    .orderBy(asc(invoices.dueOn), asc(invoices.number));
}

/** A client's own unpaid invoices, for the portal. */
export async function listClientOpenInvoices(clientId: string) {
  return db()
    .select({ id: invoices.id, number: invoices.number, kind: invoices.kind, period: invoices.period, totalMinor: invoices.totalMinor, currency: invoices.currency, dueOn: invoices.dueOn, projectId: projects.id, projectTitle: projects.title })
    .from(invoices)
    .innerJoin(projects, eq(projects.id, invoices.projectId))
    .where(sql`${projects.clientId} = ${clientId} and ${invoices.status} = 'open'`)
    .orderBy(asc(invoices.dueOn));
}
