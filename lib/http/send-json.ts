/** Client-side helper: sends JSON and returns the server's answer, or a network failure, as data. */
export type JsonResult<T> = { ok: true; status: number; data: T } | { ok: false; status: number; error: string; fields?: Record<string, string>; data?: Record<string, unknown> };

export async function sendJson<T = unknown>(url: string, method: string, body?: unknown): Promise<JsonResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, error: "No connection. Check the network and try again; nothing was saved." };
  }
  let data: ({ error?: string; fields?: Record<string, string> } & Record<string, unknown>) | null = null;
  try {
    data = await res.json();
  } catch {
    data = null;
  }
  if (res.ok) return { ok: true, status: res.status, data: data as T };
  return { ok: false, status: res.status, error: data?.error ?? `The server answered ${res.status}. Try again.`, fields: data?.fields, data: data ?? undefined };
}
