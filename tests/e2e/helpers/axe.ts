import AxeBuilder from "@axe-core/playwright";
import { expect, type Page } from "@playwright/test";

/**
 * Scans the page against WCAG 2.2 AA and fails with a readable list of what is wrong. It first waits
 * for running transitions and animations to end (a colour half-way through a change of scheme is not
 * what anyone reads); endless ones, such as a loading pulse, are left running.
 *
 * It runs axe in the page itself (legacy mode) rather than finishing each scan in a new blank page:
 * the app has no frames, and a scan of a big page (a Counter table) costs about half as much. Axe's
 * `resultTypes: ["violations"]` would save more, but it makes landmark-unique report sections whose
 * names do differ, so every result is kept.
 */
export async function expectNoAxeViolations(page: Page): Promise<void> {
  await page.waitForFunction(() =>
    document.getAnimations().every((animation) => animation.playState !== "running" || animation.effect?.getTiming().iterations === Infinity),
  );
  const results = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21aa", "wcag22aa"])
    .setLegacyMode(true)
    .analyze();
  const summary = results.violations.map(
    (violation) => `${violation.id}: ${violation.help} (${violation.nodes.map((node) => node.target.join(" ")).join(", ")})`,
  );
  expect(summary).toEqual([]);
}
