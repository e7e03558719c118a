import { describe, expect, it } from "vitest";
import { groupServiceVisits } from "@/lib/service/visit-groups";
import { mayEditReport, maySignOff, reopenRefusal, signOffRefusal, type SignOffFacts } from "@/lib/service/sign-off";

const open: SignOffFacts = { cancelledAt: null, completedAt: null, visitDay: "2027-03-02", today: "2027-03-02", tasksDone: 2, clientNotes: null };
const lead = { role: "lead" as const, assigned: false };
const crew = { role: "crew" as const, assigned: true };

describe("sign-off", () => {
  it("the lead and assigned crew may sign off; other crew and clients may not", () => {
    expect(maySignOff(lead)).toBe(true);
    expect(maySignOff(crew)).toBe(true);
    expect(maySignOff({ role: "crew", assigned: false })).toBe(false);
    expect(maySignOff({ role: "client", assigned: false })).toBe(false);
    expect(signOffRefusal({ role: "client", assigned: false }, open)?.status).toBe(403);
  });
  it("an open report on its day with a task done can be signed", () => {
    expect(signOffRefusal(crew, open)).toBeNull();
    expect(signOffRefusal(crew, { ...open, today: "2027-03-09" })).toBeNull();
  });
  it("refuses a skipped visit, a signed one, a future one, and an empty one", () => {
    expect(signOffRefusal(crew, { ...open, cancelledAt: new Date() })).toMatchObject({ status: 409, message: expect.stringContaining("skipped") });
    expect(signOffRefusal(crew, { ...open, completedAt: new Date() })).toMatchObject({ status: 409, message: expect.stringContaining("already signed off") });
    expect(signOffRefusal(crew, { ...open, visitDay: "2027-03-03" })).toMatchObject({ status: 422, message: expect.stringContaining("on its day") });
    expect(signOffRefusal(crew, { ...open, tasksDone: 0 })).toMatchObject({ status: 422 });
    expect(signOffRefusal(crew, { ...open, tasksDone: 0, clientNotes: "  " })).toMatchObject({ status: 422 });
    expect(signOffRefusal(crew, { ...open, tasksDone: 0, clientNotes: "Site closed; water topped up only." })).toBeNull();
  });
  it("a signed-off report is locked until the lead reopens it", () => {
    expect(mayEditReport(crew, { completedAt: null, cancelledAt: null })).toBe(true);
    expect(mayEditReport(crew, { completedAt: new Date(), cancelledAt: null })).toBe(false);
    expect(mayEditReport(lead, { completedAt: null, cancelledAt: new Date() })).toBe(false);
    expect(mayEditReport({ role: "client", assigned: false }, { completedAt: null, cancelledAt: null })).toBe(false);
    expect(reopenRefusal(crew, { completedAt: new Date() })?.status).toBe(403);
    expect(reopenRefusal(lead, { completedAt: null })?.status).toBe(409);
    expect(reopenRefusal(lead, { completedAt: new Date() })).toBeNull();
  });
});

describe("the Service tab's groups", () => {
  const now = new Date("2027-03-10T12:00:00Z");
  const v = (startsAt: string, extra: Partial<{ completedAt: Date; cancelledAt: Date }> = {}) => ({ startsAt: new Date(startsAt), completedAt: null, cancelledAt: null, ...extra });
  it("a visit without a report is overdue a day after its start, not before", () => {
    const g = groupServiceVisits([v("2027-03-09T11:59:00Z"), v("2027-03-09T12:01:00Z"), v("2027-03-12T09:00:00Z")], now);
    expect(g.overdue.map((x) => x.startsAt.toISOString())).toEqual(["2027-03-09T11:59:00.000Z"]);
    expect(g.upcoming).toHaveLength(2);
  });
  it("done visits list newest first; skipped ones stay out of the coming list", () => {
    const g = groupServiceVisits([v("2027-02-01T09:00:00Z", { completedAt: now }), v("2027-02-15T09:00:00Z", { completedAt: now }), v("2027-03-20T09:00:00Z", { cancelledAt: now })], now);
    expect(g.past.map((x) => x.startsAt.toISOString().slice(0, 10))).toEqual(["2027-02-15", "2027-02-01"]);
    expect(g.upcoming).toHaveLength(0);
    expect(g.skipped).toHaveLength(1);
  });
});
