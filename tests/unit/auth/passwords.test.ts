import bcrypt from "bcryptjs";
import { describe, expect, it } from "vitest";
import { DEFAULT_COST, hashPassword, verifyPassword } from "@/lib/auth/passwords";

// A small cost keeps the unit run quick; the stored cost is what verification uses.
const CHEAP = { log2N: 10, r: 8, p: 1 };

describe("password hashes", () => {
  it("stores the cost and a fresh salt, and verifies only the right password", async () => {
    const a = await hashPassword("tank-water-2026", CHEAP);
    const b = await hashPassword("tank-water-2026", CHEAP);
    expect(a).toMatch(/^scrypt\$10\$8\$1\$[\w-]{22}\$[\w-]{43}$/);
    expect(a).not.toBe(b);
    expect(await verifyPassword("tank-water-2026", a)).toEqual({ ok: true, needsRehash: false });
    expect(await verifyPassword("tank-water-2027", a)).toEqual({ ok: false, needsRehash: false });
  });

  it("uses N = 2^15, r = 8, p = 1 by default", async () => {
    expect(DEFAULT_COST).toEqual({ log2N: 15, r: 8, p: 1 });
    expect(await hashPassword("x")).toMatch(/^scrypt\$15\$8\$1\$/);
  });

  it("accepts an old bcrypt hash and asks for it to be replaced", async () => {
    const old = await bcrypt.hash("tank-water-2026", 4);
    expect(await verifyPassword("tank-water-2026", old)).toEqual({ ok: true, needsRehash: true });
    expect((await verifyPassword("wrong", old)).ok).toBe(false);
  });

  it("never matches a malformed or unknown hash", async () => {
    for (const stored of ["", "plain-text", "scrypt$99$8$1$aa$bb", "scrypt$10$8$1$$", "md5$abc"]) {
      expect(await verifyPassword("anything", stored)).toEqual({ ok: false, needsRehash: false });
    }
  });
});
