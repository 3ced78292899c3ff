// Accessibility check with axe-core: fails on serious or critical violations.
import axe from 'axe-core';
import { expect, type Page } from '@playwright/test';

interface Violation {
  id: string;
  impact?: string | null;
  help: string;
  nodes: Array<{ target: unknown[] }>;
}

/**
 * Runs axe on the page as it is now. The app's Content-Security-Policy forbids inline scripts,
 * so specs using this set `bypassCSP: true` for their browser context.
 */
export async function expectAccessible(page: Page, where: string): Promise<void> {
  await page.addScriptTag({ content: axe.source });
  const violations = await page.evaluate(async () => {
    const runner = (
      window as unknown as {
        axe: { run: (context: Document) => Promise<{ violations: Violation[] }> };
      }
    ).axe;
    const result = await runner.run(document);
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      nodes: v.nodes.map((n) => ({ target: n.target })),
    }));
  });
  const serious = violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.impact}: ${v.id} — ${v.help} @ ${v.nodes.map((n) => JSON.stringify(n.target)).join(', ')}`,
    );
  expect(serious, `accessibility of ${where}`).toEqual([]);
}
