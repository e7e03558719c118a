/** Seeds the demo scenario when the database has no accounts yet; otherwise does nothing. */
import { closeDb, db } from "../db";
import { seedDemo } from "../db/seed/demo";
import { seedChecklistDefaults } from "../db/seed/checklist-defaults";

const checklist = await seedChecklistDefaults(db());
if (checklist) console.log(`seed: ${checklist} default checklist items written`);
const seeded = await seedDemo(db());
await closeDb();
console.log(seeded ? "seed: demo scenario loaded" : "seed: accounts exist, demo not loaded");
