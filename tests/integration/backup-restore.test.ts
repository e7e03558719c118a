import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { Client } from "pg";
import { makeTeam } from "../support/fixtures";
import { tableSums, type Manifest } from "../../scripts/backup/shared";

// A cluster of its own for the restore, on a port next to the slot's test cluster.
const slot = Number(process.env.TEST_SLOT ?? 0);
const PORT = 54369 + slot;
const NAME = `restore-${slot}`;
const TSX = ["--conditions=react-server", "--import", "tsx"];
const sh = (script: string) => execFileSync("bash", ["-c", `source scripts/lib/common.sh; ${script}`], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] });

afterAll(() => {
  sh(`d=$(pg_data_dir ${NAME}); b=$(pg_bin_dir); [ -f "$d/PG_VERSION" ] && as_pg "$b/pg_ctl" -D "$d" -m fast -w stop >/dev/null 2>&1; rm -rf "$d"`);
});

// initdb, pg_dump and pg_restore take a while on a loaded machine (a limit, not a timing).
describe("backup and restore", { timeout: 300_000 }, () => {
  it("restores a backup into a fresh cluster with every row, and finds every listed object", async () => {
    const team = await makeTeam("cycling");
    const folder = mkdtempSync(join(tmpdir(), "tankwright-backup-"));
    try {
      const backup = spawnSync("node", [...TSX, "scripts/backup.ts", folder], { encoding: "utf8" });
      expect(backup.stderr).toBe("");
      expect(backup.status).toBe(0);
      const manifest = JSON.parse(readFileSync(join(folder, "manifest.json"), "utf8")) as Manifest;
      const users = manifest.tables.find((t) => t.table === "public.users");
      expect(users?.rows).toBeGreaterThan(5);
      expect(manifest.tables.find((t) => t.table === "public.projects")?.rows).toBeGreaterThan(0);
      expect(JSON.parse(readFileSync(join(folder, "objects.json"), "utf8")).objects.length).toBe(manifest.objects.count);

      // A brand-new cluster (initdb, as the postgres user when we are root) and an empty database.
      sh(`d=$(pg_data_dir ${NAME}); rm -rf "$d"; pg_up ${NAME} ${PORT} fast && pg_createdb ${PORT} restored`);
      const target = `postgres://tankwright@127.0.0.1:${PORT}/restored`;
      const restore = spawnSync("node", [...TSX, "scripts/restore.ts", folder], { encoding: "utf8", env: { ...process.env, DATABASE_URL: target } });
      expect(restore.stderr).toBe("");
      expect(restore.status).toBe(0);
      expect(restore.stdout).toMatch(/all \d+ rows match the backup/);

      // Independently of the restore's own check: the restored tables read exactly as the backup's snapshot.
      const client = new Client({ connectionString: target });
      await client.connect();
      try {
        expect(await tableSums(client)).toEqual(manifest.tables);
        const { rows } = await client.query("select title from projects where id = $1", [team.project.id]);
        expect(rows).toEqual([{ title: team.project.title }]);
      } finally {
        await client.end();
      }

      // Restoring again over data is refused unless asked for.
      const again = spawnSync("node", [...TSX, "scripts/restore.ts", folder], { encoding: "utf8", env: { ...process.env, DATABASE_URL: target } });
      expect(again.status).toBe(1);
      expect(again.stderr).toMatch(/already has tables/);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
