import { beforeAll, describe, expect, it } from "vitest";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn, type Session } from "../support/http";
import { dbDigest } from "../support/db-digest";
import { SAMPLE_BODIES, expectedRefusal, keyOf, listHandlers, urlFor, type Caller, type Handler } from "../support/routes-under-test";

// Not an object at all, so every schema refuses it (even one whose fields are all optional).
const INVALID_BODY = ["not", "an", "object"];

type Seat = Caller & { session: Session };

describe("every handler refuses in the order 401, 404, 403, 400 and changes nothing", () => {
  let handlers: Handler[];
  let seats: Seat[];
  let projectId: string;

  beforeAll(async () => {
    handlers = await listHandlers();
    const t = await makeTeam("cycling");
    projectId = t.project.id;
    const rel = (role: "lead" | "crew" | "client", assigned: boolean, owner: boolean) => ({ role, assigned, owner });
    seats = [
      { name: "anonymous", role: null, relation: null, session: anonymous() },
      { name: "client A (owner)", role: "client", relation: rel("client", false, true), session: await signedIn(t.client) },
      { name: "client B", role: "client", relation: rel("client", false, false), session: await signedIn(t.otherClient) },
      { name: "crew assigned", role: "crew", relation: rel("crew", true, false), session: await signedIn(t.crew) },
      { name: "crew not assigned", role: "crew", relation: rel("crew", false, false), session: await signedIn(t.otherCrew) },
      { name: "lead", role: "lead", relation: rel("lead", false, false), session: await signedIn(t.lead) },
    ];
  }, 120_000);

  it("has a sample body, accepted by its own schema, for every handler that reads one", () => {
    expect(handlers.length).toBeGreaterThan(40);
    for (const h of handlers.filter((x) => x.mutating && x.access.schema)) {
      const sample = SAMPLE_BODIES[keyOf(h)];
      expect(sample, `add a sample body for ${keyOf(h)} in tests/support/routes-under-test.ts`).toBeDefined();
      const parsed = h.access.schema!.safeParse(sample);
      expect(parsed.success, `${keyOf(h)}: ${JSON.stringify(parsed.error?.issues)}`).toBe(true);
    }
  });

  it("answers each caller with the refusal the permission table gives, before reading the body", async () => {
    const before = await dbDigest();
    const seen: string[] = [];
    for (const h of handlers) {
      const url = urlFor(h, projectId);
      for (const seat of seats) {
        const expected = expectedRefusal(h, seat);
        const label = `${keyOf(h)} as ${seat.name}`;
        if (!h.mutating) {
          const res = await seat.session.request(h.method, url);
          if (expected === "allowed") expect(res.status, label).toBeLessThan(500);
          else expect(res.status, label).toBe(expected);
          seen.push(`${label}: ${res.status}`);
          continue;
        }
        if (expected === "allowed") {
          // Only the bad body goes to someone allowed: the good one would really change things.
          if (!h.access.schema) continue;
          const res = await seat.session.request(h.method, url, INVALID_BODY);
          expect(res.status, `${label} with a bad body`).toBe(400);
          expect(res.json?.error, label).toBeTruthy();
          seen.push(`${label} (bad body): ${res.status}`);
          continue;
        }
        for (const [kind, body] of [
          ["good", SAMPLE_BODIES[keyOf(h)]],
          ["bad", INVALID_BODY],
        ] as const) {
          const res = await seat.session.request(h.method, url, body);
          expect(res.status, `${label} with a ${kind} body`).toBe(expected);
          seen.push(`${label} (${kind} body): ${res.status}`);
        }
      }
    }
    expect(seen.length).toBeGreaterThan(handlers.length * 4);
    expect(await dbDigest()).toEqual(before);
  }, 300_000);
});
