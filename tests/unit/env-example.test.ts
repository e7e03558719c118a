import { readFileSync } from "node:fs";
import { describe, expect, it, vi } from "vitest";

const read = (p: string) => readFileSync(new URL(`../../${p}`, import.meta.url), "utf8");

describe(".env.example", () => {
  it("lists every variable env.ts reads, and nothing else", () => {
    const read_ = [...read("env.ts").matchAll(/^ {2}([A-Z][A-Z0-9_]+):/gm)].map((m) => m[1]).sort();
    const listed = [...read(".env.example").matchAll(/^(?:# )?([A-Z][A-Z0-9_]+)=/gm)].map((m) => m[1]).sort();
    expect(read_.length).toBeGreaterThan(15);
    expect(listed).toEqual(read_);
  });

  it("holds values env.ts accepts", async () => {
    const values = Object.fromEntries([...read(".env.example").matchAll(/^([A-Z][A-Z0-9_]+)=(.*)$/gm)].map((m) => [m[1], m[2]]));
    vi.resetModules();
    const saved = process.env;
    process.env = { ...values } as NodeJS.ProcessEnv;
    try {
      const { env } = await import("../../env");
      expect(env().DATABASE_POOL_MAX).toBe(10);
      expect(env().SIGN_IN_LIMIT_PER_ACCOUNT).toBe(5);
    } finally {
      process.env = saved;
    }
  });
});
