import type { Tx } from "../../index";
import { species } from "../../schema";
import { speciesRecord } from "./row";
import { FRESH_SOURCE, FRESH_SPECIES } from "./fresh";
import { BRACKISH_SOURCE, BRACKISH_SPECIES } from "./brackish";
import { SALT_SOURCE, SALT_SPECIES } from "./salt";

/** Every catalogue record the seed offers, fresh, brackish and salt. */
export function catalogueRecords() {
  return [
    ...FRESH_SPECIES.map((r) => speciesRecord("fresh", FRESH_SOURCE, r)),
    ...BRACKISH_SPECIES.map((r) => speciesRecord("brackish", BRACKISH_SOURCE, r)),
    ...SALT_SPECIES.map((r) => speciesRecord("salt", SALT_SOURCE, r)),
  ];
}

/** Loads the starting catalogue; a species already there (by scientific name) is left as the lead edited it. */
export async function seedSpeciesCatalogue(tx: Tx) {
  await tx.insert(species).values(catalogueRecords()).onConflictDoNothing();
}
