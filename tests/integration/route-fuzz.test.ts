import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db";
import { checklistItems, company } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn, type Session } from "../support/http";
import { dbDigest } from "../support/db-digest";
import { SAMPLE_BODIES, keyOf, listHandlers, urlFor, type Handler } from "../support/routes-under-test";

/** Values no field should store: each must be refused (4xx) and leave the database as it was. */
const HOSTILE: unknown[] = [
  "\u0000",
  "before\u0000after",
  "lone \ud800 high",
  "lone \udfff low",
  "x".repeat(1024 * 1024),
  "y".repeat(60_000),
];
/** Dates nobody means; hostile in a date field, ordinary text anywhere else. */
const BAD_DATES: unknown[] = ["0001-01-01T00:00:00Z", "+275760-09-13T00:00:00.000Z", "9999-12-31", "1970-01-01T00:00:00Z", true, 0];
const isDateKey = (key: string) => /(At|Date)$/.test(key);
/** Values of the wrong kind or size: anything but a 5xx will do (some fields take them). */
const ODD: unknown[] = [1e308, -1e308, 2 ** 64, -0, 0.1 + 0.2, true, false, null, [], {}, [[[]]], { $gt: "" }, "NaN", "1e999"];

describe("hostile and odd input to every mutating handler", () => {
  let handlers: Handler[];
  let projectId: string;
  let lead: Session;
  let started: Date;
  let companyRules: Record<string, unknown>;

  beforeAll(async () => {
    started = new Date();
    [{ rules: companyRules }] = await db().select({ rules: company.cycleRules }).from(company).where(eq(company.id, 1));
    handlers = (await listHandlers()).filter((h) => h.mutating && h.access.schema && SAMPLE_BODIES[keyOf(h)]);
    const t = await makeTeam("cycling");
    projectId = t.project.id;
    lead = await signedIn(t.lead);
  }, 120_000);

  // Some odd values are valid, so a few writes go through; the company-wide ones are put back so
  // the other tests find the settings and checklist they expect.
  afterAll(async () => {
    await db().update(company).set({ cycleRules: companyRules }).where(eq(company.id, 1));
    await db().update(checklistItems).set({ retiredAt: new Date() }).where(and(gt(checklistItems.createdAt, started), isNull(checklistItems.retiredAt)));
  });

  it("never answers 5xx, and a refused request changes nothing", async () => {
    expect(handlers.length).toBeGreaterThan(25);
    for (const h of handlers) {
      const sample = SAMPLE_BODIES[keyOf(h)] as Record<string, unknown>;
      const keys = Object.keys(sample);
      const session = h.access.kind === "public" ? anonymous() : lead;
      const url = urlFor(h, projectId);
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom(...keys, "unexpected"),
          fc.oneof(
            fc.constantFrom(...HOSTILE).map((v) => ({ v, date: false, hostile: true })),
            fc.constantFrom(...BAD_DATES).map((v) => ({ v, date: true, hostile: false })),
            fc.constantFrom(...ODD).map((v) => ({ v, date: false, hostile: false })),
          ),
          async (key, pick) => {
            const { v } = pick;
            const hostile = pick.hostile || (pick.date && isDateKey(key));
            const before = await dbDigest();
            const body = { ...sample, [key]: v };
            const res = await session.request(h.method, url, body);
            const label = `${keyOf(h)} with ${key} = ${JSON.stringify(v).slice(0, 40)}`;
            expect(res.status, `${label}: ${res.text.slice(0, 200)}`).toBeLessThan(500);
            // A hostile value in a field the schema reads is always refused; an unknown key is dropped.
            if (hostile && key !== "unexpected") expect(res.status, label).toBeGreaterThanOrEqual(400);
            if (res.status >= 400) expect(await dbDigest(), label).toEqual(before);
          },
        ),
        { numRuns: 12, seed: 20261202 },
      );
    }
  }, 600_000);
});
