import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db";
import { checklistItems, company } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn, type Session } from "../support/http";
import { dbDigest } from "../support/db-digest";
import { SAMPLE_BODIES, keyOf, listHandlers, urlFor, type Handler } from "../support/routes-under-test";

const MB = 1024 * 1024;
/** Text no field may store, and values of another type than the field's: always refused. */
const BAD_TEXT: unknown[] = ["\u0000", "before\u0000after", "lone \ud800 high", "lone \udfff low", "x".repeat(MB), "y".repeat(60_000)];
const NOT_A_STRING: unknown[] = [1e308, true, [], {}, { $gt: "" }];
const NOT_A_NUMBER: unknown[] = ["twelve", "1e999", true, [], {}, "\u0000"];
// A form's select posts "true" or "false", which some schemas read as the booleans they spell;
// anything else that isn't a boolean must be refused.
const NOT_A_BOOLEAN: unknown[] = ["yes", 1, 0, [], {}, "\u0000"];
/** Dates nobody means, in a date field. */
const BAD_DATES: unknown[] = ["0001-01-01T00:00:00Z", "+275760-09-13T00:00:00.000Z", "9999-12-31", "1970-01-01T00:00:00Z", true, 0, "1"];
/** Numbers at the edges: refused or, where a field has no upper bound, harmless; never a 5xx. */
const EDGE_NUMBERS: unknown[] = [1e308, -1e308, 2 ** 64, -0, Number.MIN_VALUE];

type Pick = { value: unknown; mustRefuse: boolean };

function picksFor(key: string, sample: unknown): Pick[] {
  const refuse = (values: unknown[]) => values.map((value) => ({ value, mustRefuse: true }));
  if (/(At|Date|On)$/.test(key)) return refuse(BAD_DATES);
  if (typeof sample === "string") return [...refuse(BAD_TEXT), ...refuse(NOT_A_STRING)];
  if (typeof sample === "number") return [...refuse(NOT_A_NUMBER), ...EDGE_NUMBERS.map((value) => ({ value, mustRefuse: false }))];
  if (typeof sample === "boolean") return refuse(NOT_A_BOOLEAN);
  // Objects, arrays and nulls: any of these may be the wrong shape; none may break the server.
  return [...BAD_TEXT, ...NOT_A_NUMBER].map((value) => ({ value, mustRefuse: false }));
}

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
      const picks = keys.flatMap((key) => picksFor(key, sample[key]).map((p) => ({ key, ...p })));
      await fc.assert(
        fc.asyncProperty(fc.constantFrom(...picks), async ({ key, value, mustRefuse }) => {
          const before = await dbDigest();
          const res = await session.request(h.method, url, { ...sample, [key]: value });
          const label = `${keyOf(h)} with ${key} = ${JSON.stringify(value).slice(0, 40)}`;
          expect(res.status, `${label}: ${res.text.slice(0, 200)}`).toBeLessThan(500);
          if (mustRefuse) expect(res.status, label).toBeGreaterThanOrEqual(400);
          if (res.status >= 400) expect(await dbDigest(), label).toEqual(before);
        }),
        { numRuns: 12, seed: 20261202 },
      );
    }
  }, 600_000);
});
