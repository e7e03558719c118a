import { afterAll } from "vitest";
import { closeDb } from "@/db";

afterAll(async () => {
  await closeDb();
});
