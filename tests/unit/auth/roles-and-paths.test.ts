import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/auth/next-path";
import { hasRole } from "@/lib/auth/roles";

describe("hasRole", () => {
  it.each([
    ["customer", "customer", true],
    ["customer", "staff", false],
    ["customer", "admin", false],
    ["staff", "customer", true],
    ["staff", "staff", true],
    ["staff", "admin", false],
    ["admin", "customer", true],
    ["admin", "staff", true],
    ["admin", "admin", true],
  ] as const)("a %s account has the %s role: %s", (role, needed, expected) => {
    expect(hasRole(role, needed)).toBe(expected);
  });

  it.each([null, undefined, "", "Admin", "superuser", "toString", "__proto__"])("grants nothing to the role %j", (role) => {
    expect(hasRole(role, "customer")).toBe(false);
  });
});

describe("safeNextPath", () => {
  it.each(["/counter", "/account", "/replace?size=285-50R20&loadIndex=112"])("keeps the path %s", (path) => {
    expect(safeNextPath(path)).toBe(path);
  });

  it.each(["//other.example", "/\\other.example", "https://other.example/", "counter", "", "/a b", undefined, ["/counter"]])(
    "sends %j to the account page instead",
    (value) => {
      expect(safeNextPath(value)).toBe("/account");
    },
  );
});
