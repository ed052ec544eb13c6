/**
 * Overhang wording (the quarry-bench-overhang demo, a cantilever): the verdict, the checks and
 * span sections of the worksheet, their charts and the summary report speak of the overhang,
 * never of a "span" for it, and never of "sliding at the abutments" (an overhang has one root
 * and no arch). Source of the rule: the trade's own words (an overhang is not a span).
 */
import { describe, expect, it } from 'vitest';
import { openApp, unstick, waitForResults, appSession } from './app-page';

const session = appSession();

/** Text of an element and every shadow root below it, SVG text included. */
function deepText(selector: string) {
  return (sel: string) => {
    const find = (root: Document | ShadowRoot): Element | null => {
      const hit = root.querySelector(sel);
      if (hit) return hit;
      for (const el of root.querySelectorAll('*')) if (el.shadowRoot) { const f = find(el.shadowRoot); if (f) return f; }
      return null;
    };
    const start = find(document);
    if (!start) return `(no ${sel})`;
    const out: string[] = [];
    const walk = (root: Node) => {
      const tw = document.createTreeWalker(root, NodeFilter.SHOW_TEXT | NodeFilter.SHOW_ELEMENT);
      for (let n: Node | null = tw.currentNode; n; n = tw.nextNode()) {
        if (n.nodeType === Node.TEXT_NODE) {
          const tag = n.parentElement?.tagName;
          if (tag !== 'STYLE' && tag !== 'SCRIPT' && tag !== 'OPTION') out.push(n.textContent ?? '');
        } else if ((n as Element).shadowRoot) walk((n as Element).shadowRoot!);
      }
    };
    walk(start);
    return out.join(' ').replace(/\s+/g, ' ');
  };
}

function spanWords(text: string): string[] {
  return [...text.matchAll(/.{0,50}\b(spans?|abutments?)\b.{0,30}/gi)].map((m) => m[0]);
}

describe('app: an overhang is called an overhang', () => {
  it('quarry bench: verdict, checks, span section, their charts and the summary report say overhang, never span or abutment', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await unstick(page);
    await page.locator('project-bar #preset').selectOption('quarry-bench-overhang');
    await waitForResults(page);
    await page.locator('report-view [data-role="with-trace"]').uncheck();
    await page.locator('report-view [data-role="report"] section.lr-section-checks').waitFor({ timeout: 20_000 });
    await expect.poll(() => page.locator('report-view [data-role="report"] section.lr-section-trace').count()).toBe(0);
    const parts = {
      verdict: 'verdict-line',
      checks: 'section:has(#checks-h)',
      span: 'section:has(#span-h)',
      report: 'article.lamina-report',
    };
    for (const [name, sel] of Object.entries(parts)) {
      const text = await page.evaluate(deepText(sel), sel);
      expect(text, name).toContain('overhang');
      expect(spanWords(text), `${name} says span/abutment`).toEqual([]);
    }
    expect(errors).toEqual([]);
    await context.close();
  });
});
