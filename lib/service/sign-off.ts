/**
 * Who may sign off a visit report, when, and what locks it. Pure rules; the route feeds them the
 * caller's relation to the project and the visit's facts.
 */

export type SignOffFacts = {
  cancelledAt: Date | null;
  completedAt: Date | null;
  /** The visit's local calendar day and today's, in the company's zone ("YYYY-MM-DD" sorts as dates). */
  visitDay: string;
  today: string;
  tasksDone: number;
  clientNotes: string | null;
};

export type Signer = { role: "lead" | "crew" | "client"; assigned: boolean };

/** The lead, or crew assigned to the project. Clients read reports; they never sign them. */
export function maySignOff(who: Signer): boolean {
  return who.role === "lead" || (who.role === "crew" && who.assigned);
}

/** Fill in or change the report: the same people, and only while it is not signed off. */
export function mayEditReport(who: Signer, facts: Pick<SignOffFacts, "completedAt" | "cancelledAt">): boolean {
  return maySignOff(who) && facts.completedAt == null && facts.cancelledAt == null;
}

export type SignOffRefusal = { status: 403 | 409 | 422; message: string };

/** Why the report can't be signed off now, or null when it can. */
export function signOffRefusal(who: Signer, facts: SignOffFacts): SignOffRefusal | null {
  if (!maySignOff(who)) return { status: 403, message: "Only the lead or the crew on this tank can sign off a visit." };
  if (facts.cancelledAt) return { status: 409, message: "This visit was skipped, so there is nothing to sign off." };
  if (facts.completedAt) return { status: 409, message: "This report is already signed off. The lead can reopen it with a reason." };
  if (facts.visitDay > facts.today) return { status: 422, message: "A visit can be signed off on its day or after, not before." };
  if (facts.tasksDone === 0 && !facts.clientNotes?.trim()) {
    return { status: 422, message: "Tick the tasks done, or write a note for the client saying why none were, before signing off." };
  }
  return null;
}

/** Reopening is the lead's, for a signed-off report, with a reason kept on it. */
export function reopenRefusal(who: Signer, facts: Pick<SignOffFacts, "completedAt">): SignOffRefusal | null {
  if (who.role !== "lead") return { status: 403, message: "Only the lead can reopen a signed-off report." };
  if (!facts.completedAt) return { status: 409, message: "This report isn't signed off, so it is already open." };
  return null;
}
