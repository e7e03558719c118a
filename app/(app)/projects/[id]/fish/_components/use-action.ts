"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import type { z } from "zod";
import { sendJson } from "@/lib/http/send-json";
import type { FormStatus } from "@/components/ui/submit-row";

/**
 * A small form's round trip: the same zod schema checks the values here and on the server; field
 * messages from either land in `fields`, and the page refreshes on success.
 */
export function useAction<S extends z.ZodType>(schema: S, url: string, okText: string) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<FormStatus>(null);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [refusal, setRefusal] = useState<{ status: number; data?: Record<string, unknown> } | null>(null);
  async function run(values: unknown): Promise<boolean> {
    const parsed = schema.safeParse(values);
    if (!parsed.success) {
      const f: Record<string, string> = {};
      for (const i of parsed.error.issues) f[i.path.join(".") || "_"] ??= i.message;
      setFields(f);
      setStatus({ ok: false, text: "Some fields need attention." });
      return false;
    }
    setBusy(true);
    setStatus(null);
    const result = await sendJson(url, "POST", values);
    setBusy(false);
    if (!result.ok) {
      setFields(result.fields ?? {});
      setStatus({ ok: false, text: result.error });
      setRefusal({ status: result.status, data: result.data });
      return false;
    }
    setFields({});
    setRefusal(null);
    setStatus({ ok: true, text: okText });
    router.refresh();
    return true;
  }
  return { run, busy, status, fields, refusal };
}
