import { test as base } from "@playwright/test";

export * from "@playwright/test";

let testsStarted = 0;

/**
 * Playwright's test, with each test arriving from its own client address, as visitors do behind
 * the shop's proxy. Sign-in and Ask the shop limit requests per address, and every test comes from
 * this one machine: without this, a test inherits the sign-ins of the tests just before it and is
 * refused with "Too many requests". Addresses come from the IPv6 documentation range (RFC 3849),
 * one /64 network each, since sign-in counts an IPv6 client by its /64.
 */
export const test = base.extend({
  extraHTTPHeaders: async ({ extraHTTPHeaders }, provide, testInfo) => {
    testsStarted += 1;
    const address = `2001:db8:${testInfo.workerIndex.toString(16)}:${testsStarted.toString(16)}::1`;
    await provide({ ...extraHTTPHeaders, "x-forwarded-for": address });
  },
});

/**
 * For a describe block of the Counter's staff flows: they run once, at desktop width, since their
 * logic does not change with the screen; counter-phone.spec.ts scans their pages at phone width.
 */
export function staffFlowsAtDesktopWidth(): void {
  test.skip(({ isMobile }) => isMobile, "staff flows run once, in the desktop project; counter-phone.spec.ts scans these pages at phone width");
}
