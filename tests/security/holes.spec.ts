import { request as httpRequest } from "node:http";
import { expect, test } from "@playwright/test";
import { client, freshAddress } from "./http";

// Each hole the hardening closed, shown closed from outside: over HTTP, against the production build.
const inbox = `${process.env.E2E_FAKE_RESEND_URL ?? "http://127.0.0.1:3226"}/emails`;
const FOREIGN = "http://localhost:1";

async function resetTokenFor(address: string): Promise<string | undefined> {
  const { data } = (await (await fetch(inbox)).json()) as { data: { to: string; text?: string }[] };
  return data.flatMap((email) => (email.to === address ? [/\/api\/auth\/reset-password\/([\w-]+)/.exec(email.text ?? "")?.[1]] : [])).find(Boolean);
}

test("staff never see a reset link in the Outbox, so they cannot take over the admin's account", async ({ baseURL }) => {
  const stranger = await client(baseURL!);
  expect((await stranger.post("/api/auth/request-password-reset", { data: { email: "admin@sidewise.test", redirectTo: "/reset-password" } })).status()).toBe(200);
  await expect.poll(() => resetTokenFor("admin@sidewise.test"), { message: "the reset e-mail reaches the local service" }).toBeTruthy();
  const token = (await resetTokenFor("admin@sidewise.test"))!;

  const staff = await client(baseURL!, "staff@sidewise.test");
  const outbox = await (await staff.get("/counter/outbox")).text();
  expect(outbox).toContain("Reset your Sidewise password");
  expect(outbox).toContain("link hidden");
  expect(outbox).not.toContain(token);
  const customer = await client(baseURL!, "customer@sidewise.test");
  const refused = await (await customer.get("/counter/outbox")).text();
  expect(refused).toContain("403 · Not for this account");
  expect(refused).not.toContain(token);
});

test("state-changing requests from another origin, or with another content type, are refused", async ({ baseURL }) => {
  const staff = await client(baseURL!, "staff@sidewise.test");
  const item = { sku: "HOLE-1", brand: "No Such Brand", line: "None", designation: "205/55R16", loadIndex: 91, speedSymbol: "V", priceCents: 100, quantity: 1 };
  const foreign = await staff.post("/api/v1/catalog", { headers: { origin: FOREIGN }, data: item });
  expect([foreign.status(), (await foreign.json()).error.code]).toEqual([403, "forbidden"]);
  const viaReferer = await staff.delete("/api/v1/fit-cards/NNNNNNNNNNNNNNNNNNNNNNNN", { headers: { origin: "", referer: `${FOREIGN}/page` } });
  expect(viaReferer.status()).toBe(403);
  const asText = await staff.post("/api/v1/catalog", { headers: { "content-type": "text/plain" }, data: JSON.stringify(item) });
  expect([asText.status(), (await asText.json()).error.code]).toEqual([415, "unsupported_media_type"]);
  const withCharset = await staff.post("/api/v1/catalog", { headers: { "content-type": "application/json; charset=utf-8" }, data: JSON.stringify(item) });
  expect(withCharset.status()).toBe(422);
  const action = await staff.post("/counter/team", { headers: { origin: FOREIGN, "next-action": "7f".padEnd(42, "0"), "content-type": "text/plain" }, data: "[]" });
  expect(action.status()).toBe(403);
});

test("NUL bytes and broken encodings get a clear 400 or the 404 page, never 500", async ({ baseURL }) => {
  const anyone = await client(baseURL!);
  const nul = await anyone.post("/api/v1/quote-requests", { data: { name: "Ro\u0000sa", email: "rosa@example.test", vehicle: "SUV", tires: "235/65R17", source: "finder", website: "" } });
  expect(await nul.json()).toEqual({ error: { code: "invalid_parameter", message: 'The field "name" is invalid: Remove the control characters (such as NUL) from this text.', field: "name" } });
  const search = await anyone.get("/api/v1/alternatives?size=285-50R20&loadIndex=119&brand=%00");
  expect([search.status(), (await search.json()).error.field]).toEqual([400, "brand"]);
  for (const page of ["/s/%FF", "/size/%", "/learn/%ED%A0%80", "/s/%FF/opengraph-image"]) expect((await anyone.get(page)).status(), page).toBe(404);
  const api = await anyone.get("/api/v1/fit-cards/%FF");
  expect([api.status(), (await api.json()).error.code]).toEqual([400, "invalid_parameter"]);
});

/** A raw request, so that the Content-Length can say what the body does not, or be left out. */
function rawPost(baseURL: string, path: string, headers: Record<string, string>, send: (write: (chunk: Buffer) => boolean) => void): Promise<number> {
  return new Promise((resolve, reject) => {
    const url = new URL(path, baseURL);
    const outgoing = httpRequest(url, { method: "POST", headers: { origin: baseURL, "content-type": "application/json", "x-forwarded-for": freshAddress(), ...headers } }, (response) => {
      resolve(response.statusCode ?? 0);
      response.resume();
      outgoing.destroy();
    });
    outgoing.on("error", (error) => (error.message.includes("socket hang up") || error.message.includes("EPIPE") ? undefined : reject(error)));
    send((chunk) => outgoing.write(chunk));
  });
}

test("an oversize body is refused by its length, or once it passes 64 KB, without being read whole", async ({ baseURL }) => {
  const declared = await rawPost(baseURL!, "/api/v1/quote-requests", { "content-length": String(100 * 1024 * 1024) }, (write) => write(Buffer.from("{")));
  expect(declared).toBe(413);
  // Without a length (chunked): 1 MB offered, refused once it passes 64 KB.
  const streamed = await rawPost(baseURL!, "/api/v1/quote-requests", { "transfer-encoding": "chunked" }, (write) => write(Buffer.alloc(1024 * 1024, 0x20)));
  expect(streamed).toBe(413);
});

test("limits count the entry the proxy wrote, not the ones the client wrote to its left", async ({ baseURL }) => {
  const anyone = await client(baseURL!);
  const trusted = freshAddress();
  const statuses = [];
  for (let i = 0; i < 6; i++) {
    const response = await anyone.post("/api/v1/quote-requests", { headers: { "x-forwarded-for": `192.0.2.${i}, ${trusted}` }, data: { name: "" } });
    statuses.push(response.status());
  }
  expect(statuses).toEqual([400, 400, 400, 400, 400, 429]);
});

test("Ask the shop takes only a form token this server signed, and only after 3 s", async ({ baseURL }) => {
  const anyone = await client(baseURL!);
  const { renderedAt } = await (await anyone.get("/api/v1/quote-requests/form-token")).json();
  const request = { name: "Tova Reyes", email: `tova.${Date.now()}@example.test`, vehicle: "2019 family SUV", tires: "235/65R17", source: "finder", website: "" };
  const send = (token: string) => anyone.post("/api/v1/quote-requests", { headers: { "x-forwarded-for": freshAddress() }, data: { ...request, renderedAt: token } });
  expect((await send(renderedAt)).status()).toBe(400);
  expect((await send(`${Date.now() - 60_000}.${renderedAt.split(".")[1]}`)).status()).toBe(400);
  await expect.poll(() => Date.now() - Number(renderedAt.split(".")[0]), { message: "the token is 3 s old" }).toBeGreaterThanOrEqual(3000);
  expect((await send(renderedAt)).status()).toBe(201);
});

test("five failed sign-ins for one account, from five addresses, make the sixth wait", async ({ baseURL }) => {
  const address = `throttled.${Date.now()}@example.test`;
  const anyone = await client(baseURL!);
  expect((await anyone.post("/api/auth/sign-up/email", { data: { name: "Throttled", email: address, password: "the-right-password" } })).status()).toBe(200);
  for (let i = 0; i < 5; i++) {
    const wrong = await anyone.post("/api/auth/sign-in/email", { headers: { "x-forwarded-for": freshAddress() }, data: { email: address, password: `wrong-${i}` } });
    expect(wrong.status()).toBe(401);
  }
  const waiting = await anyone.post("/api/auth/sign-in/email", { headers: { "x-forwarded-for": freshAddress() }, data: { email: address, password: "the-right-password" } });
  expect(waiting.status()).toBe(429);
  expect(Number(waiting.headers()["retry-after"])).toBeGreaterThan(0);
});
