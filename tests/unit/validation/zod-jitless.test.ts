import { describe, expect, it } from "vitest";
import "@/components/ui/zod-without-eval";
import { z } from "zod";

describe("zod in the browser parses without compiling", () => {
  it("sets jitless where zod reads its settings, without importing zod", () => {
    // z.config() with nothing to change answers the settings zod parses with.
    expect(z.config().jitless).toBe(true);
    expect(z.object({ a: z.string() }).safeParse({ a: "x" }).success).toBe(true);
  });
});
