import AxeBuilder from "@axe-core/playwright";
import { expect, type Page } from "@playwright/test";

/** Scans the page against WCAG 2.2 AA and fails with a readable list of what is wrong. */
export async function expectNoAxeViolations(page: Page): Promise<void> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21aa", "wcag22aa"]).analyze();
  const summary = results.violations.map(
    (violation) => `${violation.id}: ${violation.help} (${violation.nodes.map((node) => node.target.join(" ")).join(", ")})`,
  );
  expect(summary).toEqual([]);
}
