import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { POST as askTheShop } from "@/app/api/v1/quote-requests/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { session, user } from "@/db/schema";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { signFormToken } from "@/lib/quotes/form-token";
import { CLIENT_ADDRESS_HEADER, clientAddress, trustedProxyHops, UNKNOWN_CLIENT } from "@/lib/security/client-address";
import { APP_ORIGIN } from "../integration/helpers/auth-session";
import { checkContract } from "../integration/helpers/contract";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

const forwarded = (value: string) => new Headers({ "x-forwarded-for": value });

describe("the client address, by TRUSTED_PROXY_HOPS (RFC 7239 §5.2: only entries your own proxies wrote can be trusted)", () => {
  it("takes the entry as many places from the right as there are proxies, whatever the client wrote to its left", () => {
    expect(clientAddress(forwarded("203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientAddress(forwarded("1.2.3.4, 203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientAddress(forwarded("anything at all, 5.6.7.8, 203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientAddress(forwarded("1.2.3.4, 198.51.100.7, 10.0.0.2"), 2)).toBe("198.51.100.7");
    const twoHeaderLines = new Headers([["x-forwarded-for", "1.2.3.4"], ["x-forwarded-for", "198.51.100.7, 10.0.0.2"]]);
    expect(clientAddress(twoHeaderLines, 2)).toBe("198.51.100.7");
  });

  it("puts every request whose address cannot be trusted in one shared bucket", () => {
    expect(clientAddress(forwarded("203.0.113.9"), 0)).toBe(UNKNOWN_CLIENT);
    expect(clientAddress(forwarded("203.0.113.9"), 2)).toBe(UNKNOWN_CLIENT);
    expect(clientAddress(new Headers(), 1)).toBe(UNKNOWN_CLIENT);
    expect(clientAddress(forwarded("not-an-address"), 1)).toBe(UNKNOWN_CLIENT);
  });

  it("counts an IPv6 client by its /64 (RFC 6177), an IPv4-mapped one as IPv4, and drops a port", () => {
    expect(clientAddress(forwarded("2001:db8:1:2:aaaa::1"), 1)).toBe("2001:db8:1:2::");
    expect(clientAddress(forwarded("2001:db8:1:2:ffff:ffff:ffff:ffff"), 1)).toBe("2001:db8:1:2::");
    expect(clientAddress(forwarded("::ffff:203.0.113.9"), 1)).toBe("203.0.113.9");
    expect(clientAddress(forwarded("203.0.113.9:51234"), 1)).toBe("203.0.113.9");
    expect(clientAddress(forwarded("[2001:db8::7]:443"), 1)).toBe("2001:db8:0:0::");
  });

  it("reads TRUSTED_PROXY_HOPS, 1 by default, and refuses a value that is not 0–10", () => {
    expect(trustedProxyHops({})).toBe(1);
    expect(trustedProxyHops({ TRUSTED_PROXY_HOPS: "0" })).toBe(0);
    expect(trustedProxyHops({ TRUSTED_PROXY_HOPS: " 2 " })).toBe(2);
    expect(() => trustedProxyHops({ TRUSTED_PROXY_HOPS: "-1" })).toThrow(/TRUSTED_PROXY_HOPS/);
    expect(() => trustedProxyHops({ TRUSTED_PROXY_HOPS: "two" })).toThrow(/TRUSTED_PROXY_HOPS/);
  });
});

describe("limits keyed on the trusted entry", () => {
  const request = { name: "Rosa Iverley", vehicle: "2019 family SUV", tires: "235/65R17", quantity: 4, source: "size-sheet", website: "" };
  let sent = 0;
  const ask = async (forwardedFor: string) => {
    sent += 1;
    const asking = new NextRequest(`${APP_ORIGIN}/api/v1/quote-requests`, {
      method: "POST",
      headers: { origin: APP_ORIGIN, "content-type": "application/json", "x-forwarded-for": forwardedFor },
      body: JSON.stringify({ ...request, email: `driver${sent}@example.test`, renderedAt: signFormToken(Date.now() - 10_000) }),
    });
    const response = await checkContract(asking, await askTheShop(asking));
    return response.status;
  };

  beforeAll(async () => {
    vi.stubEnv("DATABASE_URL", "");
    vi.stubEnv("PGLITE_DATA_DIR", "memory://");
    vi.stubEnv("DEMO_SEED", "off");
    vi.stubEnv("RESEND_BASE_URL", "");
    vi.stubEnv("RESEND_API_KEY", "");
    await seedDemoAccounts(await getDb());
  });
  afterEach(() => vi.stubEnv("TRUSTED_PROXY_HOPS", ""));
  afterAll(async () => {
    await (await getDatabaseHandle()).close();
    vi.unstubAllEnvs();
  });

  it("Ask the shop: a client that writes a new first entry each time is still one client", async () => {
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push(await ask(`10.9.${i}.1, 192.0.2.${i}, 203.0.113.50`));
    expect(statuses).toEqual([201, 201, 201, 201, 201, 429]);
    expect(await ask("203.0.113.51")).toBe(201);
  });

  it("with two proxies, the entry the outer proxy wrote is the client", async () => {
    vi.stubEnv("TRUSTED_PROXY_HOPS", "2");
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push(await ask(`spoofed-${i}, 198.51.100.60, 10.0.0.${i + 2}`));
    expect(statuses).toEqual([201, 201, 201, 201, 201, 429]);
  });

  it("with no proxy, nobody can pick a bucket: every request shares the one limit", async () => {
    vi.stubEnv("TRUSTED_PROXY_HOPS", "0");
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push(await ask(`198.18.${i}.9`));
    expect(statuses).toEqual([201, 201, 201, 201, 201, 429]);
  });

  it("the sign-in service hears the trusted entry, never the client's own, nor a header the client wrote for it", async () => {
    const response = await authPost(
      new NextRequest(`${APP_ORIGIN}/api/auth/sign-in/email`, {
        method: "POST",
        headers: {
          origin: APP_ORIGIN,
          "content-type": "application/json",
          "x-forwarded-for": "198.51.100.99, 203.0.113.61",
          [CLIENT_ADDRESS_HEADER]: "198.51.100.99",
        },
        body: JSON.stringify({ email: "customer@sidewise.test", password: "sidewise-demo" }),
      }),
    );
    expect(response.status).toBe(200);
    const db = await getDb();
    const rows = await db.select({ ipAddress: session.ipAddress }).from(session).innerJoin(user, eq(session.userId, user.id)).where(eq(user.email, "customer@sidewise.test"));
    expect(rows.map((row) => row.ipAddress)).toEqual(["203.0.113.61"]);
  });
});
