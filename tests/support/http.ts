/** A signed-in HTTP client for the running app, using the real sign-in flow and session cookie. */
import { PASSWORD } from "./fixtures";

export const TEST_APP_URL = process.env.TEST_APP_URL ?? "http://127.0.0.1:3100";

export class Session {
  private cookies = new Map<string, string>();
  /** Sent as X-Forwarded-For, so a test can act as a caller at its own address. */
  constructor(private readonly address?: string) {}

  private extraHeaders(): Record<string, string> {
    return this.address ? { "x-forwarded-for": this.address } : {};
  }

  /** A second client holding this one's cookies as they are now (an old copy of the session). */
  copy(): Session {
    const other = new Session(this.address);
    for (const [k, v] of this.cookies) other.cookies.set(k, v);
    return other;
  }

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

  private async csrfToken(): Promise<string> {
    const csrfRes = await fetch(`${TEST_APP_URL}/api/auth/csrf`, { headers: { cookie: this.cookieHeader(), ...this.extraHeaders() } });
    this.keep(csrfRes);
    return ((await csrfRes.json()) as { csrfToken: string }).csrfToken;
  }

  /** The real sign-in flow (CSRF token, then the credentials callback); the whole answer. */
  async signInResponse(email: string, password = PASSWORD) {
    const csrfToken = await this.csrfToken();
    const res = await fetch(`${TEST_APP_URL}/api/auth/callback/credentials`, {
      method: "POST",
      redirect: "manual",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: this.cookieHeader(), ...this.extraHeaders() },
      body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
    });
    this.keep(res);
    const text = await res.text();
    let json: any = null;
    try {
      json = JSON.parse(text);
    } catch {
      json = null;
    }
    return { status: res.status, headers: res.headers, json };
  }

  async signIn(email: string, password = PASSWORD): Promise<number> {
    return (await this.signInResponse(email, password)).status;
  }

  /** Signs out the way the sign-out button does (next-auth's sign-out with its CSRF token). */
  async signOut(): Promise<number> {
    const csrfToken = await this.csrfToken();
    const res = await fetch(`${TEST_APP_URL}/api/auth/signout`, {
      method: "POST",
      redirect: "manual",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: this.cookieHeader(), ...this.extraHeaders() },
      body: new URLSearchParams({ csrfToken, json: "true" }),
    });
    this.keep(res);
    return res.status;
  }

  async request(method: string, path: string, body?: unknown, init: RequestInit = {}) {
    const headers: Record<string, string> = { cookie: this.cookieHeader(), ...this.extraHeaders(), ...(init.headers as Record<string, string>) };
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
  put(path: string, body?: unknown) {
    return this.request("PUT", path, body);
  }
}

export async function signedIn(user: { email: string }): Promise<Session> {
  const s = new Session();
  const status = await s.signIn(user.email);
  if (status !== 200) throw new Error(`Sign-in for ${user.email} answered ${status}`);
  return s;
}

export const anonymous = () => new Session();
