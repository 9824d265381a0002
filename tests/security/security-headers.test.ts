import { describe, expect, it } from "vitest";
import { headerRules, pagePolicy, servesHttps } from "@/lib/security/security-headers.mjs";

/** What next.config's headers() answers for a build, by path pattern. */
function headersFor(phase: "development" | "production", appUrl: string) {
  const rules = headerRules({ development: phase === "development", https: servesHttps(appUrl) });
  return Object.fromEntries(rules.map((rule) => [rule.source, Object.fromEntries(rule.headers.map((header) => [header.key, header.value]))]));
}

const directive = (policy: string, name: string) => policy.split("; ").find((part) => part.startsWith(`${name} `));

describe("the headers next.config gives every response, static files and prerendered pages included", () => {
  it("forbid sniffing, framing, plugins, foreign forms and foreign scripts, with no eval in production (CSP Level 3)", async () => {
    const rules = headersFor("production", "http://localhost:3000");
    expect(rules["/:path*"]).toMatchObject({
      "X-Content-Type-Options": "nosniff",
      "Referrer-Policy": "strict-origin-when-cross-origin",
      "Permissions-Policy": expect.stringContaining("camera=()"),
    });
    expect(rules["/:path*"]).not.toHaveProperty("Strict-Transport-Security");
    const pages = rules["/((?!api/|counter/|counter$|account/|account$).*)"]!["Content-Security-Policy"]!;
    expect(directive(pages, "frame-ancestors")).toBe("frame-ancestors 'none'");
    expect(directive(pages, "object-src")).toBe("object-src 'none'");
    expect(directive(pages, "form-action")).toBe("form-action 'self'");
    expect(directive(pages, "script-src")).toBe("script-src 'self' 'unsafe-inline'");
    expect(pages).not.toContain("unsafe-eval");
    expect(rules["/api/:path*"]!["Content-Security-Policy"]).toBe("default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'");
  });

  it("add HSTS (RFC 6797) and upgrade-insecure-requests only when the app's address is https", async () => {
    const rules = headersFor("production", "https://shop.example");
    expect(rules["/:path*"]!["Strict-Transport-Security"]).toBe("max-age=31536000; includeSubDomains");
    expect(rules["/((?!api/|counter/|counter$|account/|account$).*)"]!["Content-Security-Policy"]).toContain("upgrade-insecure-requests");
  });

  it("allow eval only to the development server, which needs it to reload modules", async () => {
    const rules = headersFor("development", "http://localhost:3000");
    expect(rules["/((?!api/|counter/|counter$|account/|account$).*)"]!["Content-Security-Policy"]).toContain("'unsafe-eval'");
  });
});

describe("the nonce policy of the Counter and the account", () => {
  it("runs only scripts with the nonce and those they load, without unsafe-inline or eval", () => {
    const policy = pagePolicy({ nonce: "bm9uY2U=" });
    expect(directive(policy, "script-src")).toBe("script-src 'self' 'nonce-bm9uY2U=' 'strict-dynamic'");
    expect(directive(policy, "frame-ancestors")).toBe("frame-ancestors 'none'");
  });
});
