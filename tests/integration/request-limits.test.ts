import { describe, expect, it } from "vitest";
import { makeTeam } from "../support/fixtures";
import { TEST_APP_URL, anonymous, signedIn } from "../support/http";
import { dbDigest } from "../support/db-digest";

const MB = 1024 * 1024;

/** A body that arrives in pieces with no declared length, as a client streaming it would send. */
function streamed(totalBytes: number, chunk = 256 * 1024): ReadableStream<Uint8Array> {
  let sent = 0;
  const piece = new Uint8Array(chunk).fill(0x20);
  return new ReadableStream({
    pull(controller) {
      if (sent >= totalBytes) return controller.close();
      controller.enqueue(piece);
      sent += chunk;
    },
  });
}

describe("what a request may send", () => {
  it("refuses a 30 MB body by its declared length and answers others meanwhile", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    const before = await dbDigest();
    const big = new Uint8Array(30 * MB).fill(0x20);
    const [huge, ping, board] = await Promise.all([
      lead.request("POST", `/api/projects/${t.project.id}/messages`, new TextDecoder().decode(big), { headers: { "content-type": "application/json" } }),
      fetch(`${TEST_APP_URL}/api/ping`),
      lead.get("/api/projects"),
    ]);
    expect(huge.status).toBe(413);
    expect(huge.json.error).toMatch(/too large/);
    expect(ping.status).toBe(200);
    expect(board.status).toBe(200);
    // Refused before the session is even read: an anonymous flood costs only its headers.
    const anon = await anonymous().request("POST", `/api/projects/${t.project.id}/messages`, new TextDecoder().decode(big), { headers: { "content-type": "application/json" } });
    expect(anon.status).toBe(413);
    expect(await dbDigest()).toEqual(before);
  });

  it("stops reading a streamed body at the limit when no length is declared", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    const send = fetch(`${TEST_APP_URL}/api/projects/${t.project.id}/messages`, {
      method: "POST",
      headers: { "content-type": "application/json", cookie: lead.cookieString() },
      body: streamed(30 * MB),
      duplex: "half",
    } as RequestInit);
    const [res, ping] = await Promise.all([send, fetch(`${TEST_APP_URL}/api/ping`)]);
    expect(res.status).toBe(413);
    expect(ping.status).toBe(200);
  });

  it("accepts only JSON for writes, and refuses another site's origin", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    const before = await dbDigest();
    const url = `/api/projects/${t.project.id}/messages`;
    const plain = await lead.request("POST", url, JSON.stringify({ body: "hello" }), { headers: { "content-type": "text/plain" } });
    expect(plain.status).toBe(415);
    const form = await lead.request("POST", url, "body=hello", { headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(form.status).toBe(415);
    const foreign = await lead.request("POST", url, { body: "hello" }, { headers: { origin: "https://elsewhere.example" } });
    expect(foreign.status).toBe(403);
    const crossSite = await lead.request("POST", url, { body: "hello" }, { headers: { "sec-fetch-site": "cross-site" } });
    expect(crossSite.status).toBe(403);
    expect(await dbDigest()).toEqual(before);
    const own = await lead.request("POST", url, { body: "hello" }, { headers: { origin: new URL(TEST_APP_URL).origin } });
    expect(own.status).toBe(201);
  });
});
