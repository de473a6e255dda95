import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const AXE_SOURCE = require.resolve('axe-core/axe.min.js');

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Runs axe-core in the page and returns its violations of the WCAG 2.x A and AA rules, of any impact. */
export async function accessibilityViolations(page: Page): Promise<AxeViolation[]> {
  await page.addScriptTag({ path: AXE_SOURCE });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target })) }));
  });
  return violations;
}

/** The serious and critical violations only: the bar every main page must clear. */
export async function seriousAccessibilityViolations(page: Page): Promise<AxeViolation[]> {
  return (await accessibilityViolations(page)).filter((v) => v.impact === 'serious' || v.impact === 'critical');
}
