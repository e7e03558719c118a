import { sql } from "drizzle-orm";
import { generateNKeysBetween } from "fractional-indexing";
import type { Db } from "../index";
import { checklistItems } from "../schema";
import type { MeasureSpec } from "../schema/checklists";
import type { Stage } from "../../lib/stages/stages";

type DefaultItem = { label: string; hint?: string; needsPhoto?: boolean; measure?: MeasureSpec };

/**
 * The starting checklist, in our own words from common practice. The lead edits it on the
 * Checklists page; tolerances here are common practice, not a standard.
 */
export const DEFAULT_CHECKLIST: Partial<Record<Stage, DefaultItem[]>> = {
  stand_load_check: [
    { label: "Stand level along its length", hint: "Long spirit level on the top frame; shim under the feet, never under the tank.", measure: { unit: "mm per m", min: 0, max: 1 } },
    { label: "Stand level front to back", hint: "Same check across the depth at both ends.", measure: { unit: "mm per m", min: 0, max: 1 } },
    { label: "Stand sits on the floor with no rocking", hint: "Push each corner; a gap under any foot shows as a rock." },
    { label: "Floor matches the approved load check", hint: "Joist direction and the stand's position as on the survey." },
    { label: "Leveling mat laid on the stand top", hint: "Cut to the tank's base, flat, no creases or debris under it." },
    { label: "Tank placed on its leveling mat", hint: "Enough people to lift the glass without strain; lift, don't slide it." },
    { label: "Photo of the stand levelled, before the tank goes on", needsPhoto: true },
  ],
  aquascape: [
    { label: "Overflow and plumbing dry-fitted", hint: "Every union hand-tight, valves in the right direction, nothing glued until checked." },
    { label: "Glass and silicone seams inspected", hint: "Look along every seam with a torch for gaps, bubbles or lifted edges." },
    { label: "Rock placed on a base layer, not on bare glass edges", hint: "Heavy pieces bear on the bottom, not leaning on the panels." },
    { label: "Substrate laid to the planned depth", hint: "Check depth at the front and back with a ruler." },
    { label: "Heaters and pumps in place but unplugged", hint: "They stay unplugged until the tank is full." },
    { label: "Photo of the finished aquascape", needsPhoto: true },
  ],
  fill_leak_test: [
    { label: "All heaters and pumps unplugged during the fill" },
    { label: "Drip loop on every cord", hint: "Each cord dips below the socket so water runs off before it reaches the plug." },
    { label: "Ground-fault protection tested", hint: "Press the test button on the RCD/GFCI; it must trip. Reset it afterwards." },
    { label: "Water conditioner added for the full volume", hint: "Dose from the product's label for the net volume." },
    { label: "Leak check at fill: seams, bulkheads and floor dry", hint: "Paper towel along the base and under every fitting." },
    { label: "Leak check again after 24 hours", hint: "Same places; a slow seep can take a day to show." },
    { label: "Water temperature once heaters are on", measure: { unit: "°C", min: 18, max: 30 } },
  ],
};

/**
 * Writes the default items when the company has none yet, on any fresh database (demo or not).
 * Returns how many items were written.
 */
export async function seedChecklistDefaults(db: Db): Promise<number> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(727002)`);
    const [{ count }] = await tx.select({ count: sql<number>`count(*)::int` }).from(checklistItems);
    if (count > 0) return 0;
    let written = 0;
    for (const [stage, items] of Object.entries(DEFAULT_CHECKLIST) as [Stage, DefaultItem[]][]) {
      const keys = generateNKeysBetween(null, null, items.length);
      await tx.insert(checklistItems).values(
        items.map((item, i) => ({ stage, label: item.label, hint: item.hint ?? null, needsPhoto: item.needsPhoto ?? false, measure: item.measure ?? null, position: keys[i] })),
      );
      written += items.length;
    }
    return written;
  });
}
