import "server-only";
import type { Tx } from "../index";
import type { Stage } from "../../lib/stages/stages";

/**
 * Queues the e-mails a stage change causes (to the client and the lead), inside the transaction
 * that makes the change, so a notice exists exactly when the change was committed.
 */
export async function queueStageChangeNotices(
  _tx: Tx,
  _change: { projectId: string; fromStage: Stage; toStage: Stage; byUserId: string; override: boolean; reason: string | null },
): Promise<void> {
  // Filled in by the project e-mail feature.
}
