import { describe, expect, it } from "vitest";
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
