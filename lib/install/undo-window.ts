/**
 * How long a person may take back their own entry (a tick, a water test) without asking the lead:
 * long enough to notice a mis-tap on a phone, short enough that others have not acted on it yet.
 * Our own rule.
 */
export const UNDO_WINDOW_MINUTES = 10;

/** True when `userId` made the entry and it is still inside the undo window at `now`. */
export function canUndoOwn(entry: { byUserId: string; at: Date | string }, userId: string, now: Date): boolean {
  if (entry.byUserId !== userId) return false;
  const age = now.getTime() - new Date(entry.at).getTime();
  return age >= -60_000 && age <= UNDO_WINDOW_MINUTES * 60_000;
}

/** "until 10:42" style deadline for the undo button. */
export function undoDeadline(at: Date | string): Date {
  return new Date(new Date(at).getTime() + UNDO_WINDOW_MINUTES * 60_000);
}
