/** A signed-in HTTP client for the running app, using the real sign-in flow and session cookie. */
import { PASSWORD } from "./fixtures";

export const TEST_APP_URL = process.env.TEST_APP_URL ?? "http://127.0.0.1:3100";

export class Session {
  private cookies = new Map<string, string>();

  /** The cookies as a Cookie header, for a request built by hand (a streamed body). */
  cookieString() {
    return this.cookieHeader();
  }

  private cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keep(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const i = pair.indexOf("=");
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
  }

  async signIn(email: string, password = PASSWORD): Promise<number> {
    const csrfRes = await fetch(`${TEST_APP_URL}/api/auth/csrf`, { headers: { cookie: this.cookieHeader() } });
    this.keep(csrfRes);
    const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
    const res = await fetch(`${TEST_APP_URL}/api/auth/callback/credentials`, {
      method: "POST",
      redirect: "manual",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: this.cookieHeader() },
      body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
    });
    this.keep(res);
    return res.status;
  }

  async request(method: string, path: string, body?: unknown, init: RequestInit = {}) {
    const headers: Record<string, string> = { cookie: this.cookieHeader(), ...(init.headers as Record<string, string>) };
    let payload: BodyInit | undefined;
    if (body instanceof FormData || typeof body === "string") payload = body as BodyInit;
    else if (body !== undefined) {
      headers["content-type"] = "application/json";
      payload = JSON.stringify(body);
    }
    const res = await fetch(`${TEST_APP_URL}${path}`, { ...init, method, headers, body: payload, redirect: "manual" });
    this.keep(res);
    const text = await res.text();
    let json: unknown = null;
    try {
      json = text ? JSON.parse(text) : null;
    } catch {
      json = null;
    }
    return { status: res.status, json: json as Record<string, unknown> & any, text, headers: res.headers };
  }

  /** The response itself, for bodies that aren't text (files). */
  async raw(path: string, init: RequestInit = {}): Promise<Response> {
    const res = await fetch(`${TEST_APP_URL}${path}`, { ...init, headers: { cookie: this.cookieHeader(), ...(init.headers as Record<string, string>) }, redirect: "manual" });
    this.keep(res);
    return res;
  }

  get(path: string) {
    return this.request("GET", path);
  }
  post(path: string, body?: unknown) {
    return this.request("POST", path, body);
  }
  patch(path: string, body?: unknown) {
    return this.request("PATCH", path, body);
  }
}

export async function signedIn(user: { email: string }): Promise<Session> {
  const s = new Session();
  const status = await s.signIn(user.email);
  if (status !== 200) throw new Error(`Sign-in for ${user.email} answered ${status}`);
  return s;
}

export const anonymous = () => new Session();
