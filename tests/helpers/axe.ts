// Runs axe-core (WCAG 2.0/2.1 A and AA rules plus best practice) in a page, after scrolling it
// top to bottom so every part has rendered.
import fs from 'node:fs';

import type { Page } from 'playwright-core';

const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

export type AxeViolation = { id: string; impact: string | null; help: string; nodes: { target: string[]; html: string }[] };

export async function audit(page: Page): Promise<AxeViolation[]> {
  await page.evaluate(async () => {
    const step = Math.max(200, window.innerHeight - 100);
    const scrollers = [
      document.scrollingElement,
      ...Array.from(document.querySelectorAll<HTMLElement>('*')).filter(
        (el) => el.scrollHeight > el.clientHeight + 20 && getComputedStyle(el).overflowY !== 'visible',
      ),
    ];
    for (const el of scrollers) {
      if (!el) continue;
      for (let y = 0; y <= el.scrollHeight; y += step) {
        el.scrollTop = y;
        await new Promise((resolve) => setTimeout(resolve, 30));
      }
      el.scrollTop = 0;
    }
  });
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ content: AXE_SOURCE });
  return page.evaluate(async () => {
    const result = await (
      window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> } }
    ).axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] },
    });
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      nodes: v.nodes.map((n) => ({ target: n.target, html: n.html.slice(0, 160) })),
    }));
  });
}

export function describeViolations(screen: string, violations: AxeViolation[]): string {
  return violations
    .map(
      (v) =>
        `${screen}: [${v.impact}] ${v.id} — ${v.help} (${v.nodes.length}): ${v.nodes
          .slice(0, 3)
          .map((n) => n.target.join(' '))
          .join(' | ')}`,
    )
    .join('\n');
}
