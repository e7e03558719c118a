/** Words for the outbox's hold, shared by the forms that queue a held e-mail. */

/** "2 minutes", "45 seconds", "1 minute 30 seconds". */
export function delayWords(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  const m = Math.floor(s / 60);
  const r = s % 60;
  const part = (n: number, unit: string) => `${n} ${unit}${n === 1 ? "" : "s"}`;
  if (m === 0) return part(r, "second");
  return r ? `${part(m, "minute")} ${part(r, "second")}` : part(m, "minute");
}

/** "10:42" in the reader's clock (24-hour). */
export function clockTime(iso: string | Date): string {
  const d = typeof iso === "string" ? new Date(iso) : iso;
  return `${String(d.getHours()).padStart(2, "0")}:${String(d.getMinutes()).padStart(2, "0")}`;
}

/** The sentence a lead reads once a held e-mail is queued. */
export function leavesAtSentence(leavesAt: string | Date): string {
  return `The e-mail leaves at ${clockTime(leavesAt)}; you can take it back until then.`;
}
