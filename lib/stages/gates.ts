import { STAGES, STAGE_LABELS, stageIndex, type Stage } from "./stages";

/** What a project's own records say, as far as the gates between stages care. */
export type GateFacts = {
  /** null: no survey started yet. */
  survey: { complete: boolean } | null;
  /** "current": approved for the design as it is now; "stale": only for an earlier design. */
  loadApproval: "current" | "stale" | "none";
  /** The company's live aquascape checklist items, and how many of them are done for this project. */
  aquascapeChecklist: { total: number; done: number };
  /** The fill was recorded; the newest 24-hour check passed (null when there is none yet). */
  leak: { filled: boolean; after24hPassed: boolean | null };
  /** The cycle gate's verdict, or null when it wasn't evaluated for this project. */
  cycle: { ready: boolean; reasons: string[] } | null;
  stockingBatches: number;
  /**
   * The deposit: "paid"; "unpaid" (invoiced, not yet paid); "not_invoiced" (no quote accepted yet);
   * "not_required" (the project's schedule asks no deposit).
   */
  deposit: "paid" | "unpaid" | "not_invoiced" | "not_required";
};

export type GateResult = { open: boolean; reasons: string[] };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The reasons the gate *into* `stage` is closed; empty when it is open. */
export function reasonsInto(stage: Stage, facts: GateFacts): string[] {
  switch (stage) {
    case "site_survey":
      return [];
    case "stand_load_check":
      if (!facts.survey) return ["The site survey isn't complete: it hasn't been started yet."];
      return facts.survey.complete ? [] : ["The site survey isn't complete: finish its required fields and mark it complete."];
    case "aquascape": {
      const out: string[] = [];
      if (facts.loadApproval === "stale") out.push("The load check was approved for an earlier design; approve it again.");
      else if (facts.loadApproval === "none") out.push("The load check hasn't been approved by the lead.");
      if (facts.deposit === "unpaid") out.push("The deposit isn't paid yet: glass is ordered and install day booked once it is.");
      else if (facts.deposit === "not_invoiced") out.push("The deposit isn't paid yet: the client hasn't accepted a quote.");
      return out;
    }
    case "fill_leak_test": {
      const { total, done } = facts.aquascapeChecklist;
      if (total === 0) return ["The aquascape checklist has no items yet; the lead adds them under Checklists."];
      const left = total - done;
      return left > 0 ? [`The aquascape checklist isn't done: ${plural(left, "item is", "items are")} left of ${total}.`] : [];
    }
    case "cycling": {
      const out: string[] = [];
      if (!facts.leak.filled) out.push("The fill hasn't been recorded.");
      if (facts.leak.after24hPassed === null) out.push("The leak check 24 hours after filling hasn't been recorded.");
      else if (!facts.leak.after24hPassed) out.push("The latest leak check 24 hours after filling didn't pass; fix the leak and check again.");
      return out;
    }
    case "first_stocking":
      if (!facts.cycle) return ["The cycle hasn't been evaluated yet."];
      return facts.cycle.ready ? [] : facts.cycle.reasons.length ? facts.cycle.reasons : ["The cycle isn't finished yet."];
    case "in_service":
      return facts.stockingBatches > 0 ? [] : ["No fish have been recorded yet; record the first batch."];
  }
}

/**
 * Whether a project may go from `from` to `to`. Going forward past several stages must pass every
 * gate in between; staying put or going back never meets a gate (going back needs a reason instead).
 */
export function checkGate({ from, to, facts }: { from: Stage; to: Stage; facts: GateFacts }): GateResult {
  const a = stageIndex(from);
  const b = stageIndex(to);
  const reasons: string[] = [];
  for (let i = a + 1; i <= b; i++) {
    const stage = STAGES[i];
    const r = reasonsInto(stage, facts);
    if (r.length && b - a > 1) reasons.push(...r.map((x) => `Into ${STAGE_LABELS[stage]}: ${x}`));
    else reasons.push(...r);
  }
  return { open: reasons.length === 0, reasons };
}

/** What the stage after `stage` still needs: null at the last stage, [] when ready to move. */
export function nextStageNeeds(stage: Stage, facts: GateFacts): string[] | null {
  const i = stageIndex(stage);
  if (i >= STAGES.length - 1) return null;
  return reasonsInto(STAGES[i + 1], facts);
}

export type MoveDirection = "same" | "forward" | "backward";

export function moveDirection(from: Stage, to: Stage): MoveDirection {
  const d = stageIndex(to) - stageIndex(from);
  return d === 0 ? "same" : d > 0 ? "forward" : "backward";
}

/** Whether any gate between `from` and `to` depends on the cycle (so it must be evaluated). */
export function needsCycleFacts(from: Stage, to: Stage): boolean {
  return stageIndex(from) < stageIndex("first_stocking") && stageIndex(to) >= stageIndex("first_stocking");
}
