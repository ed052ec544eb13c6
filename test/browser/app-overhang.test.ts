/**
 * Overhang wording (the quarry-bench-overhang demo, a cantilever): the verdict, the checks and
 * span sections of the worksheet, their charts and the summary report speak of the overhang,
 * never of a "span" for it, and never of "sliding at the abutments" (an overhang has one root
 * and no arch). Source of the rule: the trade's own words (an overhang is not a span).
 */
import { describe, expect, it } from 'vitest';
import { openApp, unstick, waitForResults, appSession, showReport } from './app-page';

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
  return [...text.matchAll(/.{0,50}\b(mid-?spans?|spans?|abutments?)\b.{0,30}/gi)].map((m) => m[0]);
}

describe('app: an overhang is called an overhang', () => {
  it('quarry bench: verdict, checks, span section, their charts and the summary report say overhang, never span or abutment', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await unstick(page);
    await page.locator('project-bar #preset').selectOption('quarry-bench-overhang');
    await waitForResults(page);
    await showReport(page);
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

  it('quarry bench: the input help texts, the strength chain, the support needed and the full report with its appendix say overhang, never span, abutment or midspan', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await unstick(page);
    await page.locator('project-bar #preset').selectOption('quarry-bench-overhang');
    await waitForResults(page);
    // The support needed is a second search: wait for its answer.
    await expect.poll(() => page.evaluate(deepText('section:has(#support-h)'), 'section:has(#support-h)'), { timeout: 60_000 }).toContain('with this support');
    await showReport(page);
    await page.locator('report-view [data-role="with-trace"]').check();
    await page.locator('report-view [data-role="report"] section.lr-section-trace').waitFor({ timeout: 60_000 });
    const parts = {
      opening: 'section:has(#opening-h)',
      strata: 'section:has(#strata-h)',
      strength: 'section:has(#strength-h)',
      support: 'section:has(#support-h)',
      report: 'article.lamina-report',
    };
    const texts: Record<string, string> = {};
    for (const [name, sel] of Object.entries(parts)) {
      texts[name] = await page.evaluate(deepText(sel), sel);
      expect(spanWords(texts[name]), `${name} says span/abutment/midspan`).toEqual([]);
    }
    // The help texts name the overhang; the support and the report appendix are there and say so.
    expect(texts.opening).toContain('along the overhang, compression positive');
    expect(texts.strength).toContain('less than the overhang');
    expect(texts.support).toContain('Largest overhang with this support');
    for (const heading of ['Appendix A', 'Appendix B', 'Appendix C']) expect(texts.report).toContain(heading);
    expect(texts.report).toContain('Overhang search');
    expect(errors).toEqual([]);
    await context.close();
  }, 240_000);

  it('quarry bench with Q ratings: the empirical cross-check gives a roof width, says it is no limit on the overhang, and names no span', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await unstick(page);
    await page.locator('project-bar #preset').selectOption('quarry-bench-overhang');
    await waitForResults(page);
    // ratings from DESIGN.md's example of `empirical.q`
    await page.evaluate(() => {
      const p = structuredClone(window.__lamina!.state().project);
      p.empirical = { q: { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1, esr: 1.6 } };
      window.__lamina!.store.replace(p, 'Q ratings');
    });
    await waitForResults(page);
    const view = () => page.evaluate(deepText('.not-counted.empirical'), '.not-counted.empirical');
    await expect.poll(view, { timeout: 30_000 }).toContain('Largest unsupported roof width');
    const text = await view();
    expect(text).toContain('(no limit on an overhang)');
    expect(text).toContain('not the reach of an overhang');
    expect(spanWords(text)).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  });
});
